import type { StateNode } from "../tool.js";
import type { InspectTool } from "./inspect-tool.js";
import { pointing } from "./pointing.js";

export const idle: StateNode<InspectTool> = {
  name: "idle",
  down(tool, e) {
    tool.grab = e.point;
    tool.transition(pointing);
  },
};
