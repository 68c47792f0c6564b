import { polygonCentroid, type Plan } from "@hushmark/floorplan";
import { levelOf } from "@hushmark/editor-core";
import { wallBands, openingSpan } from "../../editor/model/wall-geometry";

export interface Anchor {
  x: number;
  y: number;
  levelId: string | null;
}

/** Where on the plan (metres) a numbered marker for an analysed element goes: wall parts, openings, vents, ducts and floors. */
export function elementAnchor(plan: Plan, elementId: string): Anchor | null {
  if (elementId.includes("^")) {
    const room = elementId.split("^").map((id) => plan.elements[id]).find((e) => e?.type === "room");
    if (room?.type !== "room") return null;
    const c = polygonCentroid(room.outline);
    return { x: c.x, y: c.y, levelId: room.levelId };
  }
  const band = wallBands(plan).find((b) => b.id === elementId);
  if (band) return { x: (band.start.x + band.end.x) / 2, y: (band.start.y + band.end.y) / 2, levelId: band.levelId };
  const el = plan.elements[elementId];
  if (!el) return null;
  if (el.type === "door" || el.type === "window" || el.type === "penetration") {
    const span = openingSpan(plan, el);
    return span ? { x: (span.start.x + span.end.x) / 2, y: (span.start.y + span.end.y) / 2, levelId: span.levelId } : null;
  }
  if (el.type === "vent") {
    return { x: el.position.x, y: el.position.y, levelId: levelOf(plan, el.id) ?? null };
  }
  if (el.type === "duct") {
    const a = plan.elements[el.fromVentId], b = plan.elements[el.toVentId];
    if (a?.type !== "vent" || b?.type !== "vent") return null;
    return { ...elementAnchor(plan, a.id)!, x: (a.position.x + b.position.x) / 2, y: (a.position.y + b.position.y) / 2 };
  }
  return null;
}

/** A plain name for an analysed element, for a client: the door “Studio door”, the wall between Café and Studio. */
export function elementWords(plan: Plan, elementId: string): string {
  const name = (id: string) => {
    const e = plan.elements[id];
    return e && "name" in e && typeof e.name === "string" && e.name ? e.name : null;
  };
  if (elementId.includes("^")) {
    const rooms = elementId.split("^").map(name).filter((n): n is string => n !== null);
    return rooms.length === 2 ? `the ceiling or floor between ${rooms[0]} and ${rooms[1]}` : rooms.length === 1 ? `the ceiling or floor of ${rooms[0]}` : "a ceiling or floor";
  }
  const band = wallBands(plan).find((b) => b.id === elementId);
  if (band) {
    const rooms = band.roomIds.map(name).filter((n): n is string => n !== null);
    return rooms.length === 2 ? `the wall between ${rooms[0]} and ${rooms[1]}` : rooms.length === 1 ? `a wall of ${rooms[0]}` : "a wall";
  }
  const el = plan.elements[elementId];
  if (!el) return "an element no longer on the plan";
  const own = name(elementId);
  const kind = el.type === "penetration" ? "gap" : el.type;
  return own ? `the ${kind} “${own}”` : `a ${kind}`;
}
