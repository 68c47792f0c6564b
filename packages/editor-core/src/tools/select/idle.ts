import type { StateNode } from "../tool.js";
import type { SelectTool } from "./select-tool.js";
import { hitTest } from "../../geometry/hit-test.js";
import { pointing } from "./pointing.js";

export const idle: StateNode<SelectTool> = {
  name: "idle",
  down(tool, e) {
    const { store, levelId, toleranceM } = tool.env;
    tool.origin = e.point;
    tool.hit = hitTest(store.plan, levelId, e.point, toleranceM);
    tool.transition(pointing);
    pointing.down?.(tool, e);
  },
  move(tool, e) {
    const hit = hitTest(tool.env.store.plan, tool.env.levelId, e.point, tool.env.toleranceM);
    tool.overlay = hit ? { hint: "Drag to move; Shift-click to add to the selection" } : {};
  },
  key(tool, k) {
    if (k.key === "Escape" && tool.env.store.selection.length) { tool.env.store.select([]); return true; }
    return false;
  },
};
