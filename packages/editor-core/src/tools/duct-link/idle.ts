import type { StateNode } from "../tool.js";
import type { DuctLinkTool } from "./duct-link-tool.js";
import { ventNear } from "./pick.js";
import { secondGrille } from "./second-grille.js";

export const idle: StateNode<DuctLinkTool> = {
  name: "idle",
  down(tool, e) {
    const id = ventNear(tool.env.store.plan, e.point, tool.env.toleranceM);
    if (!id) { tool.overlay = { hint: "Start on a grille (draw one with Vent first)" }; return; }
    tool.first = id;
    tool.overlay = { hint: "Now click the grille at the other end", picked: id };
    tool.transition(secondGrille);
  },
};
