import { elementsOfType } from "@hushmark/floorplan";
import type { StateNode } from "../tool.js";
import type { CornersTool } from "./corners-tool.js";
import { CORNERS_HINT } from "./corners-tool.js";
import { closestOnSegment, dist } from "../../geometry/vec.js";
import { splitEdge, deleteVertex } from "../../commands/rooms.js";
import { dragging } from "./dragging.js";

function cornerNear(tool: CornersTool, p: { x: number; y: number }) {
  const { store, levelId, toleranceM } = tool.env;
  let best: { elementId: string; vertexId: string; d: number } | null = null;
  for (const el of [...elementsOfType(store.plan, "room"), ...elementsOfType(store.plan, "void")]) {
    if (el.levelId !== levelId) continue;
    for (const v of el.outline) {
      const d = dist(v, p);
      if (d <= toleranceM && (!best || d < best.d)) best = { elementId: el.id, vertexId: v.id, d };
    }
  }
  return best;
}

function edgeNear(tool: CornersTool, p: { x: number; y: number }) {
  const { store, levelId, toleranceM } = tool.env;
  let best: { elementId: string; vertexId: string; at: { x: number; y: number }; d: number } | null = null;
  for (const el of [...elementsOfType(store.plan, "room"), ...elementsOfType(store.plan, "void")]) {
    if (el.levelId !== levelId) continue;
    el.outline.forEach((a, i) => {
      const b = el.outline[(i + 1) % el.outline.length]!;
      const c = closestOnSegment(p, a, b);
      if (c.distance <= toleranceM && c.t > 0.01 && c.t < 0.99 && (!best || c.distance < best.d)) best = { elementId: el.id, vertexId: a.id, at: c.point, d: c.distance };
    });
  }
  return best as { elementId: string; vertexId: string; at: { x: number; y: number }; d: number } | null;
}

export const idle: StateNode<CornersTool> = {
  name: "idle",
  move(tool, e) {
    tool.overlay = { hint: cornerNear(tool, e.point) ? "Drag to move this corner" : edgeNear(tool, e.point) ? "Click to add a corner here" : CORNERS_HINT };
  },
  down(tool, e) {
    const corner = cornerNear(tool, e.point);
    if (corner) {
      tool.target = { elementId: corner.elementId, vertexId: corner.vertexId };
      tool.origin = e.point;
      tool.env.store.select([corner.elementId]);
      tool.transition(dragging);
      return;
    }
    const edge = edgeNear(tool, e.point);
    if (!edge) return;
    const { store } = tool.env;
    const el = store.plan.elements[edge.elementId];
    const taken = new Set(el && "outline" in el ? el.outline.map((v) => v.id) : []);
    let n = taken.size + 1;
    while (taken.has(`${edge.elementId}-v${n}`)) n++;
    const vertexId = `${edge.elementId}-v${n}`;
    store.run(splitEdge(edge.elementId, edge.vertexId, edge.at, vertexId));
    tool.target = { elementId: edge.elementId, vertexId };
    store.select([edge.elementId]);
  },
  key(tool, k) {
    if ((k.key === "Delete" || k.key === "Backspace") && tool.target) {
      tool.env.store.run(deleteVertex(tool.target.elementId, tool.target.vertexId));
      tool.target = null;
      return true;
    }
    return false;
  },
};
