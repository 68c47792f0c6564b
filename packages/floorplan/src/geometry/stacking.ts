import { elementsOfType, levelsByElevation } from "../document/elements.js";
import type { Level, Plan, Room, Void } from "../document/schema.js";
import { polygonOverlapM2 } from "./overlap.js";
import { boundsM, polygonAreaM2, type Bounds } from "./polygon.js";

/** A room above another on the next level up, with the floor area they share, m². */
export interface StackedPair {
  id: string;
  upperRoomId: string;
  lowerRoomId: string;
  overlapM2: number;
}

/** Minimum shared floor area for a floor link, m²; slivers from drawing slop are ignored. */
export const MIN_OVERLAP_M2 = 0.05;

function bboxOverlap(p: Bounds, q: Bounds): boolean {
  return p.minX < q.maxX && q.minX < p.maxX && p.minY < q.maxY && q.minY < p.maxY;
}

/** Room pairs on adjacent levels whose outlines overlap in plan, with the overlap area, m². */
export function stackedRooms(plan: Plan): StackedPair[] {
  const levels = levelsByElevation(plan);
  const rooms = elementsOfType(plan, "room");
  const out: StackedPair[] = [];
  for (let k = 0; k + 1 < levels.length; k++) {
    // Bounds once per room, lower rooms sorted on x so each upper room scans only its stretch.
    const lower = rooms.filter((r) => r.levelId === levels[k]!.id).map((r) => ({ r, b: boundsM(r.outline) })).sort((p, q) => p.b.minX - q.b.minX);
    const upper = rooms.filter((r) => r.levelId === levels[k + 1]!.id);
    for (const u of upper) {
      const bu = boundsM(u.outline);
      for (const { r: l, b: bl } of lower) {
        if (bl.minX >= bu.maxX) break;
        if (!bboxOverlap(bu, bl)) continue;
        const overlapM2 = polygonOverlapM2(u.outline, l.outline);
        if (overlapM2 >= MIN_OVERLAP_M2) out.push({ id: `${u.id}^${l.id}`, upperRoomId: u.id, lowerRoomId: l.id, overlapM2 });
      }
    }
  }
  return out;
}

/** Rooms of the void's level that the void spans, with their overlap and covered fraction, m² (`rooms` saves re-reading the plan in loops). */
export function roomsCoveredByVoid(plan: Plan, v: Void, rooms: readonly Room[] = elementsOfType(plan, "room")): Array<{ roomId: string; overlapM2: number; fraction: number }> {
  const out: Array<{ roomId: string; overlapM2: number; fraction: number }> = [];
  for (const room of rooms) {
    if (room.levelId !== v.levelId || !bboxOverlap(boundsM(room.outline), boundsM(v.outline))) continue;
    const overlapM2 = polygonOverlapM2(room.outline, v.outline);
    if (overlapM2 < MIN_OVERLAP_M2) continue;
    const roomArea = polygonAreaM2(room.outline);
    out.push({ roomId: room.id, overlapM2, fraction: roomArea > 0 ? overlapM2 / roomArea : 0 });
  }
  return out;
}

/** Rooms on the level above a ceiling void or attic that overlap it, m² (`rooms` and `levels` save re-reading the plan in loops). */
export function roomsAboveVoid(
  plan: Plan,
  v: Void,
  rooms: readonly Room[] = elementsOfType(plan, "room"),
  levels: readonly Level[] = levelsByElevation(plan),
): Array<{ roomId: string; overlapM2: number }> {
  const k = levels.findIndex((l) => l.id === v.levelId);
  const above = levels[k + 1];
  if (k < 0 || !above || v.kind === "crawlspace") return [];
  const out: Array<{ roomId: string; overlapM2: number }> = [];
  for (const room of rooms) {
    if (room.levelId !== above.id || !bboxOverlap(boundsM(room.outline), boundsM(v.outline))) continue;
    const overlapM2 = polygonOverlapM2(room.outline, v.outline);
    if (overlapM2 >= MIN_OVERLAP_M2) out.push({ roomId: room.id, overlapM2 });
  }
  return out;
}
