import type { StateNode } from "../tool.js";
import type { RectangleTool } from "./rectangle-tool.js";
import { snapFor } from "../snap-env.js";
import { pointing } from "./pointing.js";

export const idle: StateNode<RectangleTool> = {
  name: "idle",
  move(tool, e) {
    tool.overlay = { hint: tool.overlay.hint, snap: snapFor(tool.env, e) };
  },
  down(tool, e) {
    tool.anchor = snapFor(tool.env, e).point;
    tool.corner = tool.anchor;
    tool.transition(pointing);
  },
};
