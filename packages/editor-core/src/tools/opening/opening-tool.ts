import { StateTool, type ToolEnv } from "../tool.js";
import { OPENING_DEFAULTS, type OpeningKind } from "../../commands/openings.js";
import { idle } from "./idle.js";

const HINTS: Record<OpeningKind, string> = {
  door: "Click a wall to put a door there",
  window: "Click a wall to put a window there",
  penetration: "Click a wall where sound leaks through (outlet box, pipe, crack)",
};

/** Door, window or gap: hover shows where it would go on the nearest wall, a click puts it there. */
export class OpeningTool extends StateTool<OpeningTool> {
  readonly id: "door" | "window" | "gap";
  readonly hintText: string;
  readonly widthM: number;

  constructor(env: ToolEnv, readonly kind: OpeningKind) {
    super(env, idle);
    this.id = kind === "penetration" ? "gap" : kind;
    this.hintText = HINTS[kind];
    this.widthM = OPENING_DEFAULTS[kind].widthM;
    this.overlay = { hint: this.hintText };
  }

  reset(): void {
    this.overlay = { hint: this.hintText };
    this.transition(idle);
  }
}
