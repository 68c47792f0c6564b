import type { StateNode } from "../tool.js";
import type { CornersTool } from "./corners-tool.js";
import { moveVertex } from "../../commands/rooms.js";
import { snapFor } from "../snap-env.js";
import { idle } from "./idle.js";

export const dragging: StateNode<CornersTool> = {
  name: "dragging",
  enter(tool) {
    tool.env.store.begin();
  },
  move(tool, e) {
    const t = tool.target;
    if (!t) return;
    const snap = snapFor(tool.env, e, undefined, new Set([`${t.elementId}:${t.vertexId}`]));
    tool.env.store.preview(moveVertex(t.elementId, t.vertexId, snap.point));
    tool.overlay = { ...tool.overlay, snap };
  },
  up(tool) {
    tool.env.store.commit();
    tool.overlay = {};
    tool.transition(idle);
  },
  key(tool, k) {
    if (k.key !== "Escape") return false;
    tool.reset();
    return true;
  },
  cancel(tool) {
    tool.reset();
  },
};
