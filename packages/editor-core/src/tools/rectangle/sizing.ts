import type { StateNode } from "../tool.js";
import type { RectangleTool } from "./rectangle-tool.js";
import { snapFor } from "../snap-env.js";
import { parseLength, parseLengthPair } from "../../units/length.js";
import { idle } from "./idle.js";

/**
 * The rectangle follows the pointer (dragging, or between the two clicks). Release after a drag
 * or the second click finishes it; Enter after typing a size finishes it at exactly that size,
 * in the direction the pointer was heading.
 */
export const sizing: StateNode<RectangleTool> = {
  name: "sizing",
  move(tool, e) {
    const snap = snapFor(tool.env, e);
    tool.corner = snap.point;
    tool.overlay.snap = snap;
    tool.showRect();
  },
  up(tool, e) {
    if (Math.abs(tool.corner.x - tool.anchor.x) < 0.05 && Math.abs(tool.corner.y - tool.anchor.y) < 0.05) return;
    sizing.move?.(tool, e);
    if (tool.finish()) tool.reset();
  },
  down(tool, e) {
    sizing.move?.(tool, e);
    if (tool.finish()) tool.reset();
  },
  key(tool, k) {
    if (k.key === "Escape") { tool.reset(); return true; }
    const r = tool.typed.key(k);
    if (r === "typed") { tool.showRect(); return true; }
    if (r !== "enter") return false;
    const pair = parseLengthPair(tool.typed.text, tool.env.unit);
    const single = pair ? null : parseLength(tool.typed.text, tool.env.unit);
    if (!pair && single === null) { tool.overlay.hint = `Could not read "${tool.typed.text}" as a size`; tool.typed.clear(); return true; }
    const sx = tool.corner.x >= tool.anchor.x ? 1 : -1;
    const sy = tool.corner.y >= tool.anchor.y ? 1 : -1;
    const [w, d] = pair ?? [single!, Math.abs(tool.corner.y - tool.anchor.y) || single!];
    tool.corner = { x: tool.anchor.x + sx * w, y: tool.anchor.y + sy * d };
    tool.typed.clear();
    if (tool.finish()) tool.reset();
    else tool.transition(idle);
    return true;
  },
};
