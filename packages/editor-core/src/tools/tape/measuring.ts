import type { StateNode } from "../tool.js";
import type { TapeTool } from "./tape-tool.js";
import { snapFor } from "../snap-env.js";
import { dist } from "../../geometry/vec.js";
import { idle } from "./idle.js";

export const measuring: StateNode<TapeTool> = {
  name: "measuring",
  move(tool, e) {
    const snap = snapFor(tool.env, e, tool.start);
    tool.show(snap.point);
    tool.overlay.snap = snap;
  },
  up(tool, e) {
    // Dragging measures too: release ends it unless it was a click in place.
    const p = snapFor(tool.env, e, tool.start).point;
    if (dist(p, tool.start) > tool.env.toleranceM) { tool.show(p); tool.transition(idle); }
  },
  down(tool, e) {
    tool.show(snapFor(tool.env, e, tool.start).point);
    tool.transition(idle);
  },
  key(tool, k) {
    if (k.key !== "Escape") return false;
    tool.reset();
    return true;
  },
};
