import type { StateNode } from "../tool.js";
import type { PanTool } from "./pan-tool.js";
import { dragging } from "./dragging.js";

export const idle: StateNode<PanTool> = {
  name: "idle",
  down(tool, e) {
    tool.grab = e.point;
    tool.transition(dragging);
  },
};
