import type { StateNode } from "../tool.js";
import type { InspectTool } from "./inspect-tool.js";
import { hitTest } from "../../geometry/hit-test.js";
import { selectionFor } from "../select/select-target.js";
import { dist } from "../../geometry/vec.js";
import { dragging } from "./dragging.js";
import { idle } from "./idle.js";

export const pointing: StateNode<InspectTool> = {
  name: "pointing",
  move(tool, e) {
    if (dist(e.point, tool.grab) < tool.env.toleranceM / 2) return;
    tool.transition(dragging);
    tool.move(e);
  },
  up(tool, e) {
    const { store, levelId, toleranceM } = tool.env;
    const hit = hitTest(store.plan, levelId, e.point, toleranceM);
    store.select(hit ? [selectionFor(store.plan, hit, e.point)] : []);
    tool.transition(idle);
  },
};
