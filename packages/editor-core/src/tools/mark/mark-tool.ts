import { StateTool, type ToolEnv } from "../tool.js";
import { idle } from "./idle.js";

/** Pin (a measurement place) or note: one click places it, its text is set in the details panel. */
export class MarkTool extends StateTool<MarkTool> {
  readonly id: "pin" | "note";
  constructor(env: ToolEnv, kind: "pin" | "note") {
    super(env, idle);
    this.id = kind;
    this.overlay = { hint: kind === "pin" ? "Click where you measured" : "Click where the note belongs" };
  }
  reset(): void {
    this.transition(idle);
  }
}
