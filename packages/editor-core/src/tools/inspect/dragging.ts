import type { StateNode } from "../tool.js";
import type { InspectTool } from "./inspect-tool.js";
import { sub } from "../../geometry/vec.js";
import { idle } from "./idle.js";

export const dragging: StateNode<InspectTool> = {
  name: "dragging",
  move(tool, e) {
    tool.env.pan?.(sub(e.point, tool.grab));
  },
  up(tool) {
    tool.transition(idle);
  },
};
