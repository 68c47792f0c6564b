import type { StateNode } from "../tool.js";
import type { DuctLinkTool } from "./duct-link-tool.js";
import { ventNear } from "./pick.js";
import { addDuct } from "../../commands/marks.js";

export const secondGrille: StateNode<DuctLinkTool> = {
  name: "second-grille",
  down(tool, e) {
    const { store } = tool.env;
    const id = ventNear(store.plan, e.point, tool.env.toleranceM);
    if (!id || id === tool.first) { tool.overlay = { ...tool.overlay, hint: "Click a different grille, or Escape" }; return; }
    const duct = store.ids.next("duct");
    if (store.run(addDuct(duct, tool.first!, id))) store.select([duct]);
    tool.reset();
    tool.env.done?.();
  },
  key(tool, k) {
    if (k.key !== "Escape") return false;
    tool.reset();
    return true;
  },
};
