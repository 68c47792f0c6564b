import type { Plan, Point } from "@hushmark/floorplan";
import { wallPieceById, wallPiecesOf } from "../../geometry/pieces.js";
import type { Hit } from "../../geometry/hit-test.js";
import { closestOnSegment } from "../../geometry/vec.js";
import { hostOf } from "../../geometry/hosts.js";

/**
 * What a click on a hit selects: a room's wall line selects the wall piece there (the part of the
 * edge shared with one neighbour, or unshared), so its construction can be set; else the element.
 */
export function selectionFor(plan: Plan, hit: Hit, p: Point): string {
  if (!hit.edgeRef) return hit.elementId;
  const host = hostOf(plan, hit.edgeRef);
  if (!host) return hit.elementId;
  const alongM = closestOnSegment(p, host.start, host.end).t * host.lengthM;
  const piece = wallPiecesOf(plan).find((pc) => pc.sides.some((s) => s.edgeRef === hit.edgeRef && s.fromM - 1e-6 <= alongM && alongM <= s.toM + 1e-6));
  return piece?.id ?? hit.elementId;
}

/** The elements a drag of this selection moves: a wall piece moves the rooms it belongs to. */
export function movableIds(plan: Plan, selection: readonly string[]): string[] {
  const out = new Set<string>();
  for (const id of selection) {
    if (id in plan.elements) { out.add(id); continue; }
    const piece = wallPieceById(plan, id);
    for (const s of piece?.sides ?? []) out.add(s.roomId);
  }
  return [...out];
}
