import { elementsOfType, pointInPolygon, polygonAreaM2, type Plan, type Point } from "@hushmark/floorplan";
import { hostOf, wallHosts } from "./hosts.js";
import { closestOnSegment, dist } from "./vec.js";

/** What is under the pointer. `edgeRef` is set when a room's wall line was hit. */
export interface Hit {
  elementId: string;
  type: string;
  edgeRef?: string;
  /** For a vertex hit: the room and vertex id. */
  vertexId?: string;
  point?: Point;
}

/**
 * Everything under a point on one level, most specific first: marks and vents, openings, corners,
 * wall lines, then rooms (smallest first) and voids. `toleranceM` is the touch radius in metres.
 */
export function hitTestAll(plan: Plan, levelId: string, p: Point, toleranceM: number): Hit[] {
  const hits: Array<Hit & { rank: number; d: number }> = [];
  for (const el of [...elementsOfType(plan, "pin"), ...elementsOfType(plan, "note")]) {
    if (el.levelId !== levelId) continue;
    const d = dist(el.position, p);
    if (d <= toleranceM * 1.5) hits.push({ elementId: el.id, type: el.type, rank: 0, d });
  }
  for (const v of elementsOfType(plan, "vent")) {
    const d = dist(v.position, p);
    if (d <= toleranceM * 1.5 && ventLevel(plan, v.spaceId) === levelId) hits.push({ elementId: v.id, type: "vent", rank: 0, d });
  }
  for (const o of [...elementsOfType(plan, "door"), ...elementsOfType(plan, "window"), ...elementsOfType(plan, "penetration")]) {
    const host = hostOf(plan, o.wallRef);
    if (!host || host.levelId !== levelId || host.lengthM === 0) continue;
    const c = closestOnSegment(p, host.start, host.end);
    const along = c.t * host.lengthM;
    const slack = Math.max(toleranceM, 0.02);
    if (c.distance <= host.thicknessM / 2 + toleranceM && along >= o.offsetM - slack && along <= o.offsetM + o.widthM + slack) {
      hits.push({ elementId: o.id, type: o.type, rank: 1, d: c.distance });
    }
  }
  for (const room of elementsOfType(plan, "room")) {
    if (room.levelId !== levelId) continue;
    for (const v of room.outline) {
      const d = dist(v, p);
      if (d <= toleranceM) hits.push({ elementId: room.id, type: "room", vertexId: v.id, point: { x: v.x, y: v.y }, rank: 2, d });
    }
  }
  for (const h of wallHosts(plan)) {
    if (h.levelId !== levelId) continue;
    const c = closestOnSegment(p, h.start, h.end);
    if (c.distance <= h.thicknessM / 2 + toleranceM) {
      hits.push({ elementId: h.ownerId, type: h.ref === h.ownerId ? "wall" : "room", edgeRef: h.ref === h.ownerId ? undefined : h.ref, point: c.point, rank: 3, d: c.distance });
    }
  }
  for (const room of elementsOfType(plan, "room")) {
    if (room.levelId !== levelId || room.outline.length < 3) continue;
    if (pointInPolygon(p, room.outline)) hits.push({ elementId: room.id, type: "room", rank: 4, d: polygonAreaM2(room.outline) });
  }
  for (const v of elementsOfType(plan, "void")) {
    if (v.levelId !== levelId || v.outline.length < 3) continue;
    const onOutline = v.outline.some((a, i) => closestOnSegment(p, a, v.outline[(i + 1) % v.outline.length]!).distance <= toleranceM);
    if (onOutline) hits.push({ elementId: v.id, type: "void", rank: 5, d: 0 });
  }
  hits.sort((a, b) => a.rank - b.rank || a.d - b.d);
  return hits.map(({ rank: _r, d: _d, ...hit }) => hit);
}

/** The topmost thing under a point, or null. */
export function hitTest(plan: Plan, levelId: string, p: Point, toleranceM: number): Hit | null {
  return hitTestAll(plan, levelId, p, toleranceM)[0] ?? null;
}

/** The room (or void, or neighbour) a grille at this point would open into: the smallest room containing it. */
export function roomAt(plan: Plan, levelId: string, p: Point): string | null {
  let best: { id: string; area: number } | null = null;
  for (const room of elementsOfType(plan, "room")) {
    if (room.levelId !== levelId || room.outline.length < 3 || !pointInPolygon(p, room.outline)) continue;
    const area = polygonAreaM2(room.outline);
    if (!best || area < best.area) best = { id: room.id, area };
  }
  return best?.id ?? null;
}

function ventLevel(plan: Plan, spaceId: string): string | undefined {
  const el = plan.elements[spaceId];
  return el && "levelId" in el ? el.levelId : undefined;
}
