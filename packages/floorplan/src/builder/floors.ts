import { elementsOfType } from "../document/elements.js";
import type { Room, Void } from "../document/schema.js";
import { polygonOverlapM2 } from "../geometry/overlap.js";
import { polygonCentroid } from "../geometry/polygon.js";
import { roomsAboveVoid, roomsCoveredByVoid, stackedRooms, MIN_OVERLAP_M2 } from "../geometry/stacking.js";
import { constructionOf, spaceName, type BuildContext } from "./context.js";
import type { LinkInput, LinkTrace } from "./types.js";

/** A room counts as under a void when the void spans at least this share of it; its ceiling then leads into the void. */
export const VOID_COVER_FRACTION = 0.5;

function floorLink(ctx: BuildContext, upper: Room, lowerId: string, areaM2: number, ref: string, centre: { x: number; y: number }, levelId: string): { link: LinkInput; trace: LinkTrace } {
  const c = constructionOf(ctx, upper.floor?.constructionId ?? ctx.plan.defaults.floorConstructionId);
  const covering = upper.floor?.coveringId ? ctx.catalogue.coverings[upper.floor.coveringId] : undefined;
  const linkId = `floor:${ref}`;
  const link: LinkInput = {
    id: linkId, type: "floor", between: [upper.id, lowerId], ref, name: `Floor of ${upper.name} over ${spaceName(ctx, lowerId)}`,
    area_m2: areaM2, tl_db: c.tlDb,
    ...(c.impactLnDb ? { impact: { ln_db: c.impactLnDb, ...(covering ? { delta_l_db: covering.deltaLDb } : {}) } } : {}),
    ...(c.source.kind === "estimate" ? { estimate: true } : {}),
  };
  return { link, trace: { linkId, kind: "floor", refs: [ref, upper.id, lowerId], levelId, polyline: [centre], spaces: [upper.id, lowerId] } };
}

function ceilingLink(ctx: BuildContext, v: Void, room: Room, areaM2: number): { link: LinkInput; trace: LinkTrace } {
  if (v.kind === "crawlspace") {
    // Under the room: its own floor (and covering) separates it from the crawlspace.
    const r = floorLink(ctx, room, v.id, areaM2, `${room.id}^${v.id}`, polygonCentroid(room.outline), room.levelId);
    return r;
  }
  const c = constructionOf(ctx, room.ceiling?.constructionId ?? ctx.plan.defaults.ceilingConstructionId);
  const ref = `${v.id}^${room.id}`;
  const linkId = `ceiling:${ref}`;
  const between: [string, string] = [v.id, room.id];
  const link: LinkInput = {
    id: linkId, type: "floor", between, ref, name: `Ceiling of ${room.name} to ${v.name}`,
    area_m2: areaM2, tl_db: c.tlDb, ...(c.source.kind === "estimate" ? { estimate: true } : {}),
  };
  return { link, trace: { linkId, kind: "ceiling", refs: [ref, room.id, v.id], levelId: room.levelId, polyline: [polygonCentroid(room.outline)], spaces: between } };
}

/**
 * Floor links between stacked rooms (the upper room's floor construction and covering, over the
 * area they share) and ceiling links between voids and the rooms they span. A room mostly under
 * a ceiling void reaches the room above through the void, not directly.
 */
export function buildFloorLinks(ctx: BuildContext): { links: LinkInput[]; traces: LinkTrace[] } {
  const links: LinkInput[] = [];
  const traces: LinkTrace[] = [];
  const viaVoid = new Set<string>();
  const rooms = [...ctx.rooms.values()];
  for (const v of elementsOfType(ctx.plan, "void")) {
    for (const { roomId, overlapM2, fraction } of roomsCoveredByVoid(ctx.plan, v, rooms)) {
      const room = ctx.rooms.get(roomId)!;
      const r = ceilingLink(ctx, v, room, overlapM2);
      links.push(r.link);
      traces.push(r.trace);
      if (v.kind !== "crawlspace" && fraction >= VOID_COVER_FRACTION) viaVoid.add(roomId);
    }
    for (const { roomId, overlapM2 } of roomsAboveVoid(ctx.plan, v, rooms, ctx.levels)) {
      const upper = ctx.rooms.get(roomId)!;
      const r = floorLink(ctx, upper, v.id, overlapM2, `${upper.id}^${v.id}`, polygonCentroid(upper.outline), upper.levelId);
      links.push(r.link);
      traces.push(r.trace);
    }
  }
  for (const pair of stackedRooms(ctx.plan)) {
    if (viaVoid.has(pair.lowerRoomId)) continue;
    const upper = ctx.rooms.get(pair.upperRoomId)!;
    const lower = ctx.rooms.get(pair.lowerRoomId)!;
    const centre = polygonCentroid(lower.outline);
    const r = floorLink(ctx, upper, lower.id, pair.overlapM2, pair.id, centre, upper.levelId);
    links.push(r.link);
    traces.push(r.trace);
  }
  return { links, traces };
}

/** Overlap of two outlines, re-exported for callers that weigh floors (m²). */
export function floorOverlapM2(a: Room, b: Room): number {
  const area = polygonOverlapM2(a.outline, b.outline);
  return area >= MIN_OVERLAP_M2 ? area : 0;
}
