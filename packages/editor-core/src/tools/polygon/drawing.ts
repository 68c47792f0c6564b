import type { StateNode } from "../tool.js";
import type { PolygonTool } from "./polygon-tool.js";
import { snapFor } from "../snap-env.js";
import { dist } from "../../geometry/vec.js";
import { pointAtLength, typedSegment } from "../chain.js";

export const drawing: StateNode<PolygonTool> = {
  name: "drawing",
  move(tool, e) {
    const snap = snapFor(tool.env, e, tool.points.at(-1));
    tool.cursor = snap.point;
    tool.overlay.snap = snap;
    tool.show();
  },
  down(tool, e) {
    const first = tool.points[0]!;
    const snap = snapFor(tool.env, e, tool.points.at(-1));
    if (tool.points.length >= 3 && dist(snap.point, first) <= tool.env.toleranceM) { tool.close(); return; }
    if (dist(snap.point, tool.points.at(-1)!) < 1e-6) return;
    tool.points.push(snap.point);
    tool.cursor = snap.point;
    tool.show();
  },
  key(tool, k) {
    if (k.key === "Escape") { tool.reset(); return true; }
    if (k.key === "Enter" && !tool.typed.text) { if (!tool.close()) tool.reset(); return true; }
    if (k.key === "Backspace" && !tool.typed.text) {
      tool.points.pop();
      if (tool.points.length === 0) tool.reset();
      else tool.show();
      return true;
    }
    const r = tool.typed.key(k);
    if (r === "typed") { tool.show(); return true; }
    if (r !== "enter") return false;
    const m = typedSegment(tool.typed.text, tool.env.unit);
    tool.typed.clear();
    if (m === null) { tool.show(); return true; }
    const p = pointAtLength(tool.points.at(-1)!, tool.cursor, m);
    tool.points.push({ x: Math.round(p.x * 1000) / 1000, y: Math.round(p.y * 1000) / 1000 });
    tool.cursor = tool.points.at(-1)!;
    tool.show();
    return true;
  },
};
