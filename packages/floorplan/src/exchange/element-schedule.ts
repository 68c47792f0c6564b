import { buildContext } from "../builder/context.js";
import { openingsByPiece } from "../builder/walls.js";
import { leakAreasM2 } from "../builder/wall-parts.js";
import { constructionRatings } from "../catalogue/ratings.js";
import type { Catalogue } from "../catalogue/types.js";
import { elementsOfType, levelsByElevation } from "../document/elements.js";
import { OUTDOORS_ID } from "../document/ids.js";
import type { Leaks, Opening, Plan } from "../document/schema.js";
import { polygonAreaM2 } from "../geometry/polygon.js";
import { planWallPieces } from "../geometry/walls.js";
import { pieceResolved } from "./plan-thickness.js";

/** One line of the element schedule: what the crew orders and fits, with its quantities in m and m². */
export interface ScheduleRow {
  kind: "wall" | "free-wall" | "door" | "window" | "penetration" | "floor" | "ceiling" | "vent" | "duct";
  id: string;
  name: string;
  levelId: string;
  level: string;
  /** The spaces either side (walls, floors) or the space it serves (vents). */
  between: string;
  lengthM: number | null;
  widthM: number | null;
  heightM: number | null;
  thicknessM: number | null;
  /** Walls: length × height; openings: width × height; floors and ceilings: plan area. */
  grossAreaM2: number | null;
  /** Walls: gross less the openings in them; otherwise the gross area. */
  netAreaM2: number | null;
  constructionId: string;
  construction: string;
  stc: number | null;
  rw: number | null;
  /** The recorded leaks in words. */
  leak: string;
  /** Open area of the leaks, grille or penetration, m². */
  openAreaM2: number | null;
}

function leakWords(o: Opening, leaks: Leaks | undefined): string {
  if (!leaks) return "";
  const words = [
    o.type === "door" && leaks.undercutMm > 0 ? `undercut ${leaks.undercutMm} mm` : "",
    leaks.perimeterGapMm > 0 ? `perimeter gap ${leaks.perimeterGapMm} mm` : "",
    leaks.sealsCracked ? "seals cracked" : "",
  ].filter(Boolean);
  return words.join("; ");
}

/**
 * The plan's element schedule: every wall piece (length, height, gross and net area), free wall,
 * door, window, penetration, floor and ceiling (plan area), vent (open area) and duct (length),
 * with its construction, STC and Rw from the catalogue and its leaks (m, m²). Levels in
 * elevation order, then by kind and id.
 */
export function elementSchedule(plan: Plan, catalogue: Catalogue): ScheduleRow[] {
  const pieces = planWallPieces(plan);
  const ctx = buildContext(plan, catalogue, pieces);
  const byPiece = openingsByPiece(ctx);
  const levels = levelsByElevation(plan);
  const levelName = (id: string) => levels.find((l) => l.id === id)?.name ?? id;
  const spaceName = (id: string): string => {
    if (id === OUTDOORS_ID) return "outdoors";
    const el = plan.elements[id];
    return el && "name" in el && typeof el.name === "string" && el.name ? el.name : id;
  };
  const rated = (constructionId: string) => {
    const c = catalogue.constructions[constructionId];
    if (!c) return { construction: "(not in the catalogue)", stc: null, rw: null };
    const r = constructionRatings(c);
    return { construction: c.name, stc: r.stc, rw: r.rw };
  };
  const rows: ScheduleRow[] = [];
  const blank = { lengthM: null, widthM: null, heightM: null, thicknessM: null, grossAreaM2: null, netAreaM2: null, leak: "", openAreaM2: null };
  const hostLevel = new Map<string, string>();
  for (const piece of pieces) {
    const s = pieceResolved(plan, piece);
    const grossM2 = piece.lengthM * s.heightM;
    const openings = byPiece.get(piece.id) ?? [];
    let holesM2 = 0;
    for (const { opening: o } of openings) {
      holesM2 += o.type === "penetration" ? o.openAreaM2 : o.widthM * o.heightM;
      hostLevel.set(o.id, piece.levelId);
    }
    const faces = piece.kind === "shared" ? spaceName(piece.sides[1]!.roomId) : (() => {
      const f = plan.wallSettings[piece.id]?.faces ?? plan.defaults.exteriorFaces;
      return f.kind === "none" ? "(not analysed)" : f.kind === "outdoors" ? "outdoors" : spaceName(f.neighbourId);
    })();
    rows.push({
      ...blank, kind: "wall", id: piece.id, name: `Wall of ${spaceName(piece.sides[0]!.roomId)}`, levelId: piece.levelId, level: levelName(piece.levelId),
      between: `${spaceName(piece.sides[0]!.roomId)} / ${faces}`, lengthM: piece.lengthM, heightM: s.heightM, thicknessM: s.thicknessM,
      grossAreaM2: grossM2, netAreaM2: Math.max(grossM2 - holesM2, 0), constructionId: s.constructionId, ...rated(s.constructionId),
    });
  }
  for (const w of elementsOfType(plan, "wall")) {
    const lengthM = Math.hypot(w.end.x - w.start.x, w.end.y - w.start.y);
    const heightM = w.heightM ?? (plan.elements[w.levelId]?.type === "level" ? (plan.elements[w.levelId] as { heightM?: number }).heightM ?? 0 : 0);
    rows.push({ ...blank, kind: "free-wall", id: w.id, name: "Free-standing wall", levelId: w.levelId, level: levelName(w.levelId), between: "", lengthM, heightM, thicknessM: w.thicknessM, grossAreaM2: lengthM * heightM, netAreaM2: lengthM * heightM, constructionId: w.constructionId, ...rated(w.constructionId) });
  }
  const openings: Opening[] = [...elementsOfType(plan, "door"), ...elementsOfType(plan, "window"), ...elementsOfType(plan, "penetration")];
  for (const o of openings) {
    const levelId = hostLevel.get(o.id) ?? "";
    if (o.type === "penetration") {
      rows.push({ ...blank, kind: "penetration", id: o.id, name: o.name ?? o.what, levelId, level: levelName(levelId), between: o.wallRef, widthM: o.widthM, constructionId: "", construction: o.what, stc: null, rw: null, leak: "open through the wall", openAreaM2: o.openAreaM2 });
      continue;
    }
    const { undercutM2, perimeterM2 } = leakAreasM2(o, o.leaks);
    const areaM2 = o.widthM * o.heightM;
    rows.push({
      ...blank, kind: o.type, id: o.id, name: o.name ?? (o.type === "door" ? "Door" : "Window"), levelId, level: levelName(levelId), between: o.wallRef,
      widthM: o.widthM, heightM: o.heightM, grossAreaM2: areaM2, netAreaM2: areaM2, constructionId: o.constructionId, ...rated(o.constructionId),
      leak: leakWords(o, o.leaks), openAreaM2: undercutM2 + perimeterM2 > 0 ? undercutM2 + perimeterM2 : null,
    });
  }
  for (const room of elementsOfType(plan, "room")) {
    const areaM2 = polygonAreaM2(room.outline);
    const floorId = room.floor?.constructionId ?? plan.defaults.floorConstructionId;
    const covering = room.floor?.coveringId ? catalogue.coverings[room.floor.coveringId]?.name ?? room.floor.coveringId : "";
    rows.push({ ...blank, kind: "floor", id: `${room.id}.floor`, name: `Floor of ${room.name}`, levelId: room.levelId, level: levelName(room.levelId), between: room.name, grossAreaM2: areaM2, netAreaM2: areaM2, constructionId: floorId, ...rated(floorId), leak: covering ? `covering: ${covering}` : "" });
    if (room.ceiling) {
      rows.push({ ...blank, kind: "ceiling", id: `${room.id}.ceiling`, name: `Ceiling of ${room.name}`, levelId: room.levelId, level: levelName(room.levelId), between: room.name, grossAreaM2: areaM2, netAreaM2: areaM2, constructionId: room.ceiling.constructionId, ...rated(room.ceiling.constructionId) });
    }
  }
  for (const v of elementsOfType(plan, "vent")) {
    const space = plan.elements[v.spaceId];
    const levelId = space && (space.type === "room" || space.type === "void") ? space.levelId : "";
    rows.push({ ...blank, kind: "vent", id: v.id, name: v.name ?? "Grille", levelId, level: levelName(levelId), between: spaceName(v.spaceId), constructionId: "", construction: `${v.mount} grille`, stc: null, rw: null, leak: "open grille", openAreaM2: v.openAreaM2 });
  }
  for (const d of elementsOfType(plan, "duct")) {
    const a = plan.elements[d.fromVentId], b = plan.elements[d.toVentId];
    const levelId = a?.type === "vent" ? (plan.elements[a.spaceId] as { levelId?: string } | undefined)?.levelId ?? "" : "";
    const ends = [a, b].map((v) => (v?.type === "vent" ? spaceName(v.spaceId) : "?")).join(" / ");
    rows.push({ ...blank, kind: "duct", id: d.id, name: d.name ?? "Duct", levelId, level: levelName(levelId), between: ends, lengthM: d.lengthM, constructionId: d.silencerId ?? "", construction: `${d.lining} duct${d.bends ? `, ${d.bends} bends` : ""}${d.silencerId ? `, silencer ${catalogue.silencers[d.silencerId]?.name ?? d.silencerId}` : ""}`, stc: null, rw: null, openAreaM2: d.crossSectionM2 ?? null });
  }
  const levelRank = new Map(levels.map((l, i) => [l.id, i]));
  const kindRank = ["wall", "free-wall", "door", "window", "penetration", "floor", "ceiling", "vent", "duct"];
  return rows.sort((p, q) => (levelRank.get(p.levelId) ?? 99) - (levelRank.get(q.levelId) ?? 99) || kindRank.indexOf(p.kind) - kindRank.indexOf(q.kind) || (p.id < q.id ? -1 : p.id > q.id ? 1 : 0));
}
