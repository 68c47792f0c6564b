import type { Point } from "@hushmark/floorplan";
import { StateTool, type ToolEnv } from "../tool.js";
import { idle } from "./idle.js";

export const CORNERS_HINT = "Drag a corner to move it; click a wall line to add a corner; Delete removes the last corner touched";

/** Edits room and void outlines: drag corners, split edges by clicking on them. */
export class CornersTool extends StateTool<CornersTool> {
  readonly id = "corners" as const;
  target: { elementId: string; vertexId: string } | null = null;
  origin: Point = { x: 0, y: 0 };
  constructor(env: ToolEnv) {
    super(env, idle);
    this.overlay = { hint: CORNERS_HINT };
  }
  reset(): void {
    this.env.store.rollback();
    this.overlay = { hint: CORNERS_HINT };
    this.transition(idle);
  }
}
