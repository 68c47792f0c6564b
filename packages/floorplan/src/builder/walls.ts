import type { Part } from "@hushmark/acoustics";
import { elementsOfType } from "../document/elements.js";
import { OUTDOORS_ID } from "../document/ids.js";
import type { Opening, Point } from "../document/schema.js";
import { openingPlacement } from "../geometry/openings.js";
import { collinearOverlap } from "../geometry/segments.js";
import type { WallPiece } from "../geometry/walls.js";
import { pieceSettings, spaceName, type BuildContext } from "./context.js";
import type { LinkInput, LinkTrace } from "./types.js";
import { openingParts, tlPart } from "./wall-parts.js";


/** Openings grouped by the wall piece they sit on (free-wall openings go to the piece under them). */
export function openingsByPiece(ctx: BuildContext): Map<string, Array<{ opening: Opening; centre: Point }>> {
  const out = new Map<string, Array<{ opening: Opening; centre: Point }>>();
  const tol = ctx.plan.defaults.wallToleranceM;
  const all: Opening[] = [...elementsOfType(ctx.plan, "door"), ...elementsOfType(ctx.plan, "window"), ...elementsOfType(ctx.plan, "penetration")];
  for (const o of all) {
    const place = openingPlacement(ctx.plan, ctx.pieces, o, tol);
    if (!place.ok) continue;
    let hostId: string | undefined = place.hostId;
    if (ctx.plan.elements[hostId]?.type === "wall") {
      // A free-standing wall separates spaces only where it lies along a room boundary.
      hostId = ctx.pieces.find((p) => collinearOverlap(p.start, p.end, place.start, place.end, tol)?.lengthM !== undefined)?.id;
    }
    if (!hostId) continue;
    const list = out.get(hostId) ?? [];
    list.push({ opening: o, centre: { x: (place.start.x + place.end.x) / 2, y: (place.start.y + place.end.y) / 2 } });
    out.set(hostId, list);
  }
  return out;
}

/** The space beyond an unshared wall piece, or null when it faces nothing to analyse. */
export function exteriorSpace(ctx: BuildContext, piece: WallPiece): string | null {
  const faces = ctx.plan.wallSettings[piece.id]?.faces ?? ctx.plan.defaults.exteriorFaces;
  if (faces.kind === "none") return null;
  return faces.kind === "outdoors" ? OUTDOORS_ID : faces.neighbourId;
}

/** Partition links for every wall piece: the wall's net area plus its openings and leaks as parts. */
export function buildWallLinks(ctx: BuildContext): { links: LinkInput[]; traces: LinkTrace[] } {
  const byPiece = openingsByPiece(ctx);
  const links: LinkInput[] = [];
  const traces: LinkTrace[] = [];
  for (const piece of ctx.pieces) {
    const a = piece.sides[0]!.roomId;
    const b = piece.kind === "shared" ? piece.sides[1]!.roomId : exteriorSpace(ctx, piece);
    if (!b) continue;
    const { construction, heightM } = pieceSettings(ctx, piece);
    const grossM2 = piece.lengthM * heightM;
    if (grossM2 <= 0) continue;
    const openings = byPiece.get(piece.id) ?? [];
    const parts: Part[] = [];
    let holesM2 = 0;
    const points: Record<string, Point> = { [piece.id]: { x: (piece.start.x + piece.end.x) / 2, y: (piece.start.y + piece.end.y) / 2 } };
    for (const { opening: o, centre } of openings) {
      points[o.id] = centre;
      const c = o.type === "penetration" ? undefined : ctx.catalogue.constructions[o.constructionId];
      const op = openingParts(o, c);
      parts.push(...op.parts);
      holesM2 += op.holeM2;
    }
    const netM2 = Math.max(grossM2 - holesM2, 0);
    if (netM2 > 0) parts.unshift(tlPart(`${piece.id}:wall`, piece.id, "wall", construction.name, netM2, construction));
    if (parts.length === 0) continue;
    const linkId = `wall:${piece.id}`;
    links.push({ id: linkId, type: "partition", between: [a, b], ref: piece.id, name: `Wall between ${spaceName(ctx, a)} and ${spaceName(ctx, b)}`, parts, length_m: piece.lengthM });
    traces.push({
      linkId, kind: piece.kind === "shared" ? "wall" : "exterior-wall", refs: [piece.id, ...openings.map((o) => o.opening.id)],
      levelId: piece.levelId, polyline: [piece.start, piece.end], spaces: [a, b], points,
    });
  }
  return { links, traces };
}
