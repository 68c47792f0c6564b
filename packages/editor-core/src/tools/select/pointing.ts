import type { StateNode } from "../tool.js";
import type { SelectTool } from "./select-tool.js";
import { selectionFor, movableIds } from "./select-target.js";
import { dist } from "../../geometry/vec.js";
import { dragging } from "./dragging.js";
import { boxing } from "./boxing.js";
import { idle } from "./idle.js";

/** Down but not yet moved far enough to be a drag: a click selects on release. */
export const pointing: StateNode<SelectTool> = {
  name: "pointing",
  down(tool, e) {
    const { store } = tool.env;
    const hit = tool.hit;
    if (!hit) {
      if (!e.shift) store.select([]);
      return;
    }
    const target = selectionFor(store.plan, hit, e.point);
    if (e.shift) store.toggleSelected(target);
    else if (!store.selection.includes(target)) store.select([target]);
    tool.moving = movableIds(store.plan, store.selection);
  },
  move(tool, e) {
    // A few pixels of jitter on a tablet is still a click.
    if (dist(e.point, tool.origin) < tool.env.toleranceM / 2) return;
    if (tool.hit && tool.moving.length) tool.transition(dragging);
    else if (!tool.hit) tool.transition(boxing);
    else return;
    tool.move(e);
  },
  up(tool) {
    tool.transition(idle);
  },
  cancel(tool) {
    tool.reset();
  },
};
