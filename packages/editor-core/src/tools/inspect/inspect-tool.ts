import type { Point } from "@hushmark/floorplan";
import { StateTool, type ToolEnv } from "../tool.js";
import { idle } from "./idle.js";

/**
 * For read-only views (the marked-up plan): a click selects what is under it, a drag pans.
 * It never changes the plan.
 */
export class InspectTool extends StateTool<InspectTool> {
  readonly id = "pan" as const;
  grab: Point = { x: 0, y: 0 };
  constructor(env: ToolEnv) {
    super(env, idle);
  }
  reset(): void {
    this.transition(idle);
  }
}
