import type { StateNode } from "../tool.js";
import type { VentTool } from "./vent-tool.js";
import { VENT_HINT } from "./vent-tool.js";
import { roomAt } from "../../geometry/hit-test.js";
import { addVent } from "../../commands/marks.js";
import { snapFor } from "../snap-env.js";

export const idle: StateNode<VentTool> = {
  name: "idle",
  move(tool, e) {
    const inRoom = roomAt(tool.env.store.plan, tool.env.levelId, e.point);
    tool.overlay = { hint: inRoom ? VENT_HINT : "A grille goes inside a room", snap: snapFor(tool.env, e) };
  },
  down(tool, e) {
    const { store, levelId } = tool.env;
    const p = snapFor(tool.env, e).point;
    const room = roomAt(store.plan, levelId, p);
    if (!room) { tool.overlay = { hint: "A grille goes inside a room" }; return; }
    const id = store.ids.next("vent");
    if (store.run(addVent(id, room, p))) { store.select([id]); tool.env.done?.(); }
  },
};
