import { StateTool, type ToolEnv } from "../tool.js";
import { idle } from "./idle.js";

export const VENT_HINT = "Click inside a room to put a grille there";

/** A supply or extract grille in the room under the pointer. */
export class VentTool extends StateTool<VentTool> {
  readonly id = "vent" as const;
  constructor(env: ToolEnv) {
    super(env, idle);
    this.overlay = { hint: VENT_HINT };
  }
  reset(): void {
    this.overlay = { hint: VENT_HINT };
    this.transition(idle);
  }
}
