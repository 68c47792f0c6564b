import { useState, useSyncExternalStore } from "react";
import type { Point } from "@hushmark/floorplan";

/** What the two points picked on the canvas are for. */
export type PickKind = "calibrate" | "square" | "move";

export interface PickState {
  kind: PickKind;
  underlayId: string;
  /** Plan points (m) picked so far; two finish the step. */
  points: readonly Point[];
}

/** The Sketch's underlay step in progress, shared by the menu that starts it and the canvas layer that takes the clicks. */
export class UnderlayUi {
  private current: PickState | null = null;
  private listeners = new Set<() => void>();

  get pick(): PickState | null {
    return this.current;
  }

  start(kind: PickKind, underlayId: string): void {
    this.set({ kind, underlayId, points: [] });
  }

  /** Adds a picked point; at most two are kept. */
  add(p: Point): void {
    if (!this.current || this.current.points.length >= 2) return;
    this.set({ ...this.current, points: [...this.current.points, p] });
  }

  cancel(): void {
    this.set(null);
  }

  subscribe = (listener: () => void): (() => void) => {
    this.listeners.add(listener);
    return () => this.listeners.delete(listener);
  };

  private set(next: PickState | null): void {
    this.current = next;
    for (const l of this.listeners) l();
  }
}

export function useUnderlayUi(): UnderlayUi {
  const [ui] = useState(() => new UnderlayUi());
  return ui;
}

export function usePick(ui: UnderlayUi): PickState | null {
  return useSyncExternalStore(ui.subscribe, () => ui.pick);
}
