import type { StateNode } from "../tool.js";
import type { MarkTool } from "./mark-tool.js";
import { addNote, addPin } from "../../commands/marks.js";
import { roomAt } from "../../geometry/hit-test.js";

export const idle: StateNode<MarkTool> = {
  name: "idle",
  down(tool, e) {
    const { store, levelId } = tool.env;
    const id = store.ids.next(tool.id);
    const count = Object.values(store.plan.elements).filter((x) => x.type === tool.id).length + 1;
    const cmd = tool.id === "pin"
      ? addPin(id, levelId, e.point, `M${count}`, roomAt(store.plan, levelId, e.point) ?? undefined)
      : addNote(id, levelId, e.point, "");
    if (store.run(cmd)) { store.select([id]); tool.env.done?.(); }
  },
};
