import { StateTool, type ToolEnv } from "../tool.js";
import { idle } from "./idle.js";

export const DUCT_HINT = "Click the first grille, then the grille at the other end of the duct";

/** Links two grilles by a duct: pick one, then the other. */
export class DuctLinkTool extends StateTool<DuctLinkTool> {
  readonly id = "duct-link" as const;
  first: string | null = null;
  constructor(env: ToolEnv) {
    super(env, idle);
    this.overlay = { hint: DUCT_HINT };
  }
  reset(): void {
    this.first = null;
    this.overlay = { hint: DUCT_HINT };
    this.transition(idle);
  }
}
