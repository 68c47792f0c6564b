import type { Point } from "@hushmark/floorplan";
import { StateTool, type ToolEnv } from "../tool.js";
import { idle } from "./idle.js";

/**
 * Drags the view. The grab point is kept under the pointer: each move pans by how far the
 * pointer has drifted from it in plan space, which after the pan is zero again.
 */
export class PanTool extends StateTool<PanTool> {
  readonly id = "pan" as const;
  grab: Point | null = null;
  constructor(env: ToolEnv) {
    super(env, idle);
    this.overlay = { hint: "Drag to move the view" };
  }
  reset(): void {
    this.grab = null;
    this.transition(idle);
  }
}
