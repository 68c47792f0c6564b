import type { StateNode } from "../tool.js";
import type { WallTool } from "./wall-tool.js";
import { snapFor } from "../snap-env.js";
import { drawing } from "./drawing.js";

export const idle: StateNode<WallTool> = {
  name: "idle",
  move(tool, e) {
    tool.overlay = { hint: tool.overlay.hint, snap: snapFor(tool.env, e) };
  },
  down(tool, e) {
    tool.start = snapFor(tool.env, e).point;
    tool.cursor = tool.start;
    tool.transition(drawing);
    tool.show();
  },
};
