import type { StateNode } from "../tool.js";
import type { RectangleTool } from "./rectangle-tool.js";
import { snapFor } from "../snap-env.js";
import { dist } from "../../geometry/vec.js";
import { sizing } from "./sizing.js";

/** The first corner is down; moving drags the rectangle out, releasing in place waits for a second click. */
export const pointing: StateNode<RectangleTool> = {
  name: "pointing",
  move(tool, e) {
    const snap = snapFor(tool.env, e);
    if (dist(snap.point, tool.anchor) < 1e-9) return;
    tool.corner = snap.point;
    tool.overlay.snap = snap;
    tool.transition(sizing);
    tool.showRect();
  },
  up(tool) {
    tool.transition(sizing);
  },
};
