import type { Point } from "@hushmark/floorplan";
import type { EditorStore } from "../store/store.js";
import type { SnapResult } from "../geometry/snap.js";
import type { DisplayUnit } from "../units/length.js";

export type ToolId =
  | "select" | "room-rectangle" | "room-polygon" | "corners" | "wall" | "door" | "window" | "gap"
  | "vent" | "duct-link" | "void" | "pin" | "note" | "tape" | "pan";

/** A pointer event already turned into plan coordinates (m). */
export interface PointerInput {
  point: Point;
  shift?: boolean;
  alt?: boolean;
  /** Ctrl or Cmd. */
  mod?: boolean;
  pointerType?: "mouse" | "pen" | "touch";
}

export interface KeyInput {
  key: string;
  shift?: boolean;
  mod?: boolean;
}

/** What a tool needs from the editor around it; the canvas keeps `toleranceM` in step with the zoom. */
export interface ToolEnv {
  store: EditorStore;
  levelId: string;
  unit: DisplayUnit;
  gridM: number;
  toleranceM: number;
  /** Shift the view by a plan-space delta (m) — the pan tool's only effect. */
  pan?: (delta: Point) => void;
  /** A tool that places one thing asks to hand back to Select. */
  done?: () => void;
}

/** What to draw for the tool in progress: snap marker, rubber band, dimensions, typed text. */
export interface ToolOverlay {
  snap?: SnapResult;
  /** An open or closed outline being drawn (m). */
  path?: Point[];
  closed?: boolean;
  /** Dimension labels to show on segments. */
  dims?: Array<{ start: Point; end: Point; text: string }>;
  marquee?: { a: Point; b: Point };
  /** The opening that would be placed: its wall line span. */
  ghost?: { start: Point; end: Point; kind: string };
  /** A highlighted element (the first grille of a duct link). */
  picked?: string;
  /** The length being typed, as typed. */
  typed?: string;
  /** One short line of guidance for the status line. */
  hint?: string;
}

export interface Tool {
  readonly id: ToolId;
  readonly stateName: string;
  readonly overlay: ToolOverlay;
  down(e: PointerInput): void;
  move(e: PointerInput): void;
  up(e: PointerInput): void;
  /** Answers true when the tool used the key (so the editor does not also act on it). */
  key(k: KeyInput): boolean;
  /** Escape or switching tools: rolls back anything half-done. */
  cancel(): void;
}

/** One state of a tool's machine; a file per state keeps each one small. */
export interface StateNode<T> {
  readonly name: string;
  enter?(tool: T): void;
  down?(tool: T, e: PointerInput): void;
  move?(tool: T, e: PointerInput): void;
  up?(tool: T, e: PointerInput): void;
  key?(tool: T, k: KeyInput): boolean;
  cancel?(tool: T): void;
}

/** The machine runner shared by all tools: forwards events to the current state. */
export abstract class StateTool<T extends StateTool<T>> implements Tool {
  abstract readonly id: ToolId;
  overlay: ToolOverlay = {};
  protected state: StateNode<T>;

  constructor(readonly env: ToolEnv, initial: StateNode<T>) {
    this.state = initial;
  }

  get stateName(): string {
    return this.state.name;
  }

  private get self(): T {
    return this as unknown as T;
  }

  transition(next: StateNode<T>): void {
    this.state = next;
    next.enter?.(this.self);
  }

  down(e: PointerInput): void { this.state.down?.(this.self, e); }
  move(e: PointerInput): void { this.state.move?.(this.self, e); }
  up(e: PointerInput): void { this.state.up?.(this.self, e); }
  key(k: KeyInput): boolean { return this.state.key?.(this.self, k) ?? false; }

  cancel(): void {
    if (this.state.cancel) this.state.cancel(this.self);
    else this.reset();
  }

  /** Drops any drag preview and returns to the first state. */
  abstract reset(): void;
}
