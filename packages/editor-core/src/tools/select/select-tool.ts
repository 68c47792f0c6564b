import type { Point } from "@hushmark/floorplan";
import { StateTool, type ToolEnv } from "../tool.js";
import type { Hit } from "../../geometry/hit-test.js";
import { idle } from "./idle.js";

/** Select and move: click picks, Shift-click adds, drag moves, drag on empty space draws a box. */
export class SelectTool extends StateTool<SelectTool> {
  readonly id = "select" as const;
  /** Where the pointer went down, and what was under it. */
  origin: Point = { x: 0, y: 0 };
  hit: Hit | null = null;
  /** What the drag moves (the selection at pointer-down). */
  moving: string[] = [];

  constructor(env: ToolEnv) {
    super(env, idle);
  }

  reset(): void {
    this.env.store.rollback();
    this.overlay = {};
    this.hit = null;
    this.moving = [];
    this.transition(idle);
  }
}
