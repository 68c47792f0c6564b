import type { StateNode } from "../tool.js";
import type { OpeningTool } from "./opening-tool.js";
import { addOpening, openingSpot } from "../../commands/openings.js";
import { pointAlong } from "@hushmark/floorplan";

/** A single state: placing is one click, so there is nothing to drag. */
export const idle: StateNode<OpeningTool> = {
  name: "idle",
  move(tool, e) {
    const spot = openingSpot(tool.env.store.plan, tool.env.levelId, e.point, tool.widthM, tool.env.toleranceM * 2);
    tool.overlay = spot
      ? { hint: tool.hintText, ghost: { start: pointAlong(spot.host.start, spot.host.end, spot.offsetM), end: pointAlong(spot.host.start, spot.host.end, spot.offsetM + tool.widthM), kind: tool.kind } }
      : { hint: `${tool.hintText} — move onto a wall` };
  },
  down(tool, e) {
    const { store, levelId, toleranceM } = tool.env;
    const spot = openingSpot(store.plan, levelId, e.point, tool.widthM, toleranceM * 2);
    if (!spot) { tool.overlay = { hint: `${tool.hintText} — that is not on a wall` }; return; }
    const id = store.ids.next(tool.kind === "penetration" ? "gap" : tool.kind);
    if (store.run(addOpening(tool.kind, id, spot.host.ref, spot.offsetM))) {
      store.select([id]);
      tool.env.done?.();
    }
  },
};
