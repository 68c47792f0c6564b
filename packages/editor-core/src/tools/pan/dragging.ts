import type { StateNode } from "../tool.js";
import type { PanTool } from "./pan-tool.js";
import { sub } from "../../geometry/vec.js";

export const dragging: StateNode<PanTool> = {
  name: "dragging",
  move(tool, e) {
    if (tool.grab) tool.env.pan?.(sub(e.point, tool.grab));
  },
  up(tool) {
    tool.reset();
  },
};
