import { elementsOfType, openingPlacement, type Opening, type Plan, type Point } from "@hushmark/floorplan";
import { hostOf, wallPiecesOf } from "@hushmark/editor-core";

/** A wall band to draw: a centreline with a real thickness (m). */
export interface WallBand {
  id: string;
  levelId: string;
  start: Point;
  end: Point;
  thicknessM: number;
  kind: "shared" | "exterior" | "free";
  /** The rooms whose outlines make this band (empty for a free wall). */
  roomIds: string[];
}

const bandsCache = new WeakMap<object, WallBand[]>();

/** Every wall on the plan as a band: room-outline pieces with their settings' thickness, and free walls. */
export function wallBands(plan: Plan): WallBand[] {
  const hit = bandsCache.get(plan.elements);
  if (hit && bandsCache.get(plan.wallSettings) === hit) return hit;
  const out: WallBand[] = [];
  for (const piece of wallPiecesOf(plan)) {
    const setting = plan.wallSettings[piece.id];
    out.push({ id: piece.id, levelId: piece.levelId, start: piece.start, end: piece.end, thicknessM: setting?.thicknessM ?? plan.defaults.wallThicknessM, kind: piece.kind, roomIds: piece.sides.map((side) => side.roomId) });
  }
  for (const w of elementsOfType(plan, "wall")) out.push({ id: w.id, levelId: w.levelId, start: w.start, end: w.end, thicknessM: w.thicknessM, kind: "free", roomIds: [] });
  bandsCache.set(plan.elements, out);
  bandsCache.set(plan.wallSettings, out);
  return out;
}

/** Where to draw an opening: its span on the wall line, the wall's direction and its room-side normal (m). */
export interface OpeningSpan {
  start: Point;
  end: Point;
  along: Point;
  normal: Point;
  thicknessM: number;
  levelId: string;
}

export function openingSpan(plan: Plan, opening: Opening): OpeningSpan | null {
  const host = hostOf(plan, opening.wallRef);
  if (!host || host.lengthM === 0) return null;
  const along = { x: (host.end.x - host.start.x) / host.lengthM, y: (host.end.y - host.start.y) / host.lengthM };
  const at = (m: number) => ({ x: host.start.x + along.x * m, y: host.start.y + along.y * m });
  return {
    start: at(opening.offsetM),
    end: at(opening.offsetM + opening.widthM),
    along,
    // Left of the edge's direction; for a counter-clockwise room outline that is inside the room.
    normal: { x: -along.y, y: along.x },
    thicknessM: edgeThickness(plan).get(opening.wallRef) ?? host.thicknessM,
    levelId: host.levelId,
  };
}

/** Whether the plan model can place an opening (off its wall, wider than it). */
export function openingFits(plan: Plan, opening: Opening): boolean {
  return openingPlacement(plan, wallPiecesOf(plan), opening, plan.defaults.wallToleranceM).ok;
}

const thicknessCache = new WeakMap<object, Map<string, number>>();

/**
 * Thickness set on the wall pieces along each room edge, by edge ref (m). Read from the wall
 * settings alone (cached on them), so placing an opening never has to derive every wall piece.
 */
function edgeThickness(plan: Plan): Map<string, number> {
  const hit = thicknessCache.get(plan.wallSettings);
  if (hit) return hit;
  const out = new Map<string, number>();
  for (const [pieceId, setting] of Object.entries(plan.wallSettings)) {
    if (setting.thicknessM === undefined) continue;
    for (const part of pieceId.split("|")) if (part.includes(":")) out.set(part, setting.thicknessM);
  }
  thicknessCache.set(plan.wallSettings, out);
  return out;
}

/** One room's outline edges as bands, for drawing a room while it is dragged (before wall pieces are worked out again). */
export function roomOutlineBands(plan: Plan, roomId: string): WallBand[] {
  const room = plan.elements[roomId];
  if (room?.type !== "room") return [];
  const t = edgeThickness(plan);
  return room.outline.map((a, i) => {
    const b = room.outline[(i + 1) % room.outline.length]!;
    const ref = `${room.id}:${a.id}`;
    return { id: ref, levelId: room.levelId, start: a, end: b, thicknessM: t.get(ref) ?? plan.defaults.wallThicknessM, kind: "exterior", roomIds: [room.id] };
  });
}
