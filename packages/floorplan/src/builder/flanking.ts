import type { Construction } from "../catalogue/types.js";
import { polygonAreaM2 } from "../geometry/polygon.js";
import { armsInline, wallJunctions, type Junction } from "../geometry/junctions.js";
import type { WallPiece } from "../geometry/walls.js";
import { constructionOf, pieceSettings, type BuildContext } from "./context.js";
import type { LinkInput, LinkTrace } from "./types.js";
import { linkTauSM2 } from "./transmitting-area.js";

/**
 * Flanking paths weaker than the separating wall's own transmission by more than this in every
 * band are left out: together (at most three per wall) they would change the result by under
 * 0.15 dB, and they make up most of a large building's links.
 */
export const FLANKING_PRUNE_DB = 20;

function weakerInEveryBand(link: LinkInput, directTauS: readonly number[], marginDb: number): boolean {
  const f = linkTauSM2(link);
  const k = 10 ** (-marginDb / 10);
  for (let b = 0; b < directTauS.length; b++) if (f[b]! > directTauS[b]! * k) return false;
  return true;
}

function element(ref: string, c: Construction, areaM2: number) {
  return { ref, tl_db: c.tlDb, area_m2: areaM2, mass_kg_m2: Math.max(c.surfaceDensityKgM2, 0.1) };
}

/**
 * Flanking links by the simplified ISO 12354-1 model (Ff paths only): at each end of a shared
 * wall, the walls of the two rooms that continue straight through the junction (a façade or a
 * corridor wall running past the party wall); and along its foot, the two rooms' floors when
 * they are one construction. K_ij comes from the engine's junction formulas (cross or T).
 */
export function buildFlankingLinks(ctx: BuildContext, pruneDb = FLANKING_PRUNE_DB): { links: LinkInput[]; traces: LinkTrace[] } {
  const links: LinkInput[] = [];
  const traces: LinkTrace[] = [];
  const junctions = wallJunctions(ctx.pieces, ctx.plan.defaults.wallToleranceM);
  const at = new Map<string, { start?: Junction; end?: Junction }>();
  for (const j of junctions) {
    for (const arm of j.arms) {
      const ends = at.get(arm.pieceId) ?? {};
      ends[arm.end] = j;
      at.set(arm.pieceId, ends);
    }
  }
  const pieceById = new Map(ctx.pieces.map((p) => [p.id, p]));
  const hasRoom = (p: WallPiece, roomId: string) => p.sides[0]?.roomId === roomId || p.sides[1]?.roomId === roomId;

  for (const s of ctx.pieces) {
    if (s.kind !== "shared") continue;
    const [a, b] = [s.sides[0]!.roomId, s.sides[1]!.roomId];
    const sep = pieceSettings(ctx, s);
    const separatingM2 = s.lengthM * sep.heightM;
    if (separatingM2 <= 0) continue;
    // The wall alone, without its openings: openings only make flanking relatively weaker.
    const directTauS = sep.construction.tlDb.map((tl) => separatingM2 * 10 ** (-tl / 10));
    const keep = (link: LinkInput) => !Number.isFinite(pruneDb) || !weakerInEveryBand(link, directTauS, pruneDb);
    for (const end of ["start", "end"] as const) {
      const j = at.get(s.id)?.[end];
      if (!j) continue;
      // wallJunctions already counted the distinct directions (four or more: a cross).
      const kind = j.kind === "cross" ? "cross" : "t";
      for (const armI of j.arms) {
        const pi = pieceById.get(armI.pieceId)!;
        if (pi === s || !hasRoom(pi, a) || hasRoom(pi, b)) continue;
        for (const armJ of j.arms) {
          const pj = pieceById.get(armJ.pieceId)!;
          if (pj === s || pj === pi || !hasRoom(pj, b) || hasRoom(pj, a) || !armsInline(armI, armJ)) continue;
          const si = pieceSettings(ctx, pi), sj = pieceSettings(ctx, pj);
          const linkId = `flank:${s.id}@${end}:${pi.id}~${pj.id}`;
          const link: LinkInput = {
            id: linkId, type: "flanking", path: "Ff", between: [a, b], ref: s.id,
            name: `Flanking along the walls either side of ${s.id}`, junction: kind,
            element_i: element(pi.id, si.construction, pi.lengthM * si.heightM),
            element_j: element(pj.id, sj.construction, pj.lengthM * sj.heightM),
            mass_perpendicular_kg_m2: Math.max(sep.construction.surfaceDensityKgM2, 0.1),
            coupling_length_m: Math.min(si.heightM, sj.heightM, sep.heightM),
            separating_area_m2: separatingM2,
          };
          if (!keep(link)) continue;
          links.push(link);
          traces.push({ linkId, kind: "flanking", refs: [pi.id, s.id, pj.id], levelId: s.levelId, polyline: [midpoint(pi), j.point, midpoint(pj)], spaces: [a, b] });
        }
      }
    }
    const ra = ctx.rooms.get(a)!, rb = ctx.rooms.get(b)!;
    const fa = ra.floor?.constructionId ?? ctx.plan.defaults.floorConstructionId;
    const fb = rb.floor?.constructionId ?? ctx.plan.defaults.floorConstructionId;
    if (fa === fb) {
      const c = constructionOf(ctx, fa);
      const linkId = `flank:${s.id}@floor`;
      const link: LinkInput = {
        id: linkId, type: "flanking", path: "Ff", between: [a, b], ref: s.id, name: `Flanking through the floor under ${s.id}`, junction: "t",
        element_i: element(ra.id, c, polygonAreaM2(ra.outline)), element_j: element(rb.id, c, polygonAreaM2(rb.outline)),
        mass_perpendicular_kg_m2: Math.max(sep.construction.surfaceDensityKgM2, 0.1), coupling_length_m: s.lengthM, separating_area_m2: separatingM2,
      };
      if (!keep(link)) continue;
      links.push(link);
      traces.push({ linkId, kind: "flanking", refs: [ra.id, s.id, rb.id], levelId: s.levelId, polyline: [s.start, s.end], spaces: [a, b] });
    }
  }
  return { links, traces };
}

function midpoint(p: WallPiece) {
  return { x: (p.start.x + p.end.x) / 2, y: (p.start.y + p.end.y) / 2 };
}
