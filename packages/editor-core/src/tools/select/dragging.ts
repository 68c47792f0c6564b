import type { StateNode } from "../tool.js";
import type { SelectTool } from "./select-tool.js";
import { moveElements } from "../../commands/edit.js";
import { sub } from "../../geometry/vec.js";
import { idle } from "./idle.js";

/** Moving the selection: each move previews from the plan at pointer-down; release records one step. */
export const dragging: StateNode<SelectTool> = {
  name: "dragging",
  enter(tool) {
    tool.env.store.begin();
  },
  move(tool, e) {
    const { store, gridM } = tool.env;
    let delta = sub(e.point, tool.origin);
    if (gridM > 0 && !e.alt) delta = { x: Math.round(delta.x / gridM) * gridM, y: Math.round(delta.y / gridM) * gridM };
    if (e.shift) delta = Math.abs(delta.x) >= Math.abs(delta.y) ? { x: delta.x, y: 0 } : { x: 0, y: delta.y };
    store.preview(moveElements(tool.moving, delta, store.inTransaction ? baseOf(tool) : store.plan));
    tool.overlay = { hint: "Release to place; Escape puts it back" };
  },
  up(tool) {
    tool.env.store.commit();
    tool.overlay = {};
    tool.transition(idle);
  },
  key(tool, k) {
    if (k.key !== "Escape") return false;
    tool.reset();
    return true;
  },
  cancel(tool) {
    tool.reset();
  },
};

// Openings slide along their wall as it was at pointer-down, not as the preview has it.
function baseOf(tool: SelectTool) {
  return tool.env.store.transactionBase ?? tool.env.store.plan;
}
