import type { StateNode } from "../tool.js";
import type { PolygonTool } from "./polygon-tool.js";
import { snapFor } from "../snap-env.js";
import { drawing } from "./drawing.js";

export const idle: StateNode<PolygonTool> = {
  name: "idle",
  move(tool, e) {
    tool.overlay = { hint: tool.overlay.hint, snap: snapFor(tool.env, e) };
  },
  down(tool, e) {
    const p = snapFor(tool.env, e).point;
    tool.points = [p];
    tool.cursor = p;
    tool.transition(drawing);
    tool.show();
  },
};
