import type { StateNode } from "../tool.js";
import type { WallTool } from "./wall-tool.js";
import { snapFor } from "../snap-env.js";
import { dist, roundPoint } from "../../geometry/vec.js";
import { pointAtLength, typedSegment } from "../chain.js";

export const drawing: StateNode<WallTool> = {
  name: "drawing",
  move(tool, e) {
    const snap = snapFor(tool.env, e, tool.start);
    tool.cursor = snap.point;
    tool.overlay.snap = snap;
    tool.show();
  },
  down(tool, e) {
    const p = snapFor(tool.env, e, tool.start).point;
    if (dist(p, tool.start) < 0.05) { tool.reset(); return; }
    tool.place(p);
  },
  key(tool, k) {
    if (k.key === "Escape" || (k.key === "Enter" && !tool.typed.text)) { tool.reset(); return true; }
    const r = tool.typed.key(k);
    if (r === "typed") { tool.show(); return true; }
    if (r !== "enter") return false;
    const m = typedSegment(tool.typed.text, tool.env.unit);
    tool.typed.clear();
    if (m === null) { tool.show(); return true; }
    tool.place(roundPoint(pointAtLength(tool.start, tool.cursor, m)));
    return true;
  },
};
