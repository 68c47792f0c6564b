import type { StateNode } from "../tool.js";
import type { SelectTool } from "./select-tool.js";
import { boundsOfMany } from "../../geometry/bounds.js";
import { levelOf } from "../../geometry/hosts.js";
import { idle } from "./idle.js";

/** Dragging on empty space: everything wholly inside the box is selected on release. */
export const boxing: StateNode<SelectTool> = {
  name: "boxing",
  move(tool, e) {
    tool.overlay = { marquee: { a: tool.origin, b: e.point } };
  },
  up(tool, e) {
    const { store, levelId } = tool.env;
    const minX = Math.min(tool.origin.x, e.point.x), maxX = Math.max(tool.origin.x, e.point.x);
    const minY = Math.min(tool.origin.y, e.point.y), maxY = Math.max(tool.origin.y, e.point.y);
    const inside: string[] = [];
    for (const el of Object.values(store.plan.elements)) {
      if (el.type === "level" || el.type === "neighbour" || levelOf(store.plan, el.id) !== levelId) continue;
      const b = boundsOfMany(store.plan, [el.id]);
      if (b && b.minX >= minX && b.maxX <= maxX && b.minY >= minY && b.maxY <= maxY) inside.push(el.id);
    }
    store.select(e.shift ? [...store.selection, ...inside] : inside);
    tool.overlay = {};
    tool.transition(idle);
  },
  cancel(tool) {
    tool.reset();
  },
};
