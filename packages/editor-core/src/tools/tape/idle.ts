import type { StateNode } from "../tool.js";
import type { TapeTool } from "./tape-tool.js";
import { snapFor } from "../snap-env.js";
import { measuring } from "./measuring.js";

export const idle: StateNode<TapeTool> = {
  name: "idle",
  move(tool, e) {
    tool.overlay = { ...tool.overlay, snap: snapFor(tool.env, e) };
  },
  down(tool, e) {
    tool.start = snapFor(tool.env, e).point;
    tool.show(tool.start);
    tool.transition(measuring);
  },
};
