import { edgeRefParts } from "../document/ids.js";
import type { FreeWall, Opening, Plan, Point } from "../document/schema.js";
import { pointAlong, projectionAlongM } from "./segments.js";
import { roomEdges, type WallPiece } from "./walls.js";

/** Where an opening sits: the wall piece (or free wall) hosting it and its span along it, m. */
export type OpeningPlacement =
  | { ok: true; hostId: string; fromM: number; toM: number; start: Point; end: Point }
  | { ok: false; reason: "no-wall" | "outside-wall" | "wider-than-wall"; hostLengthM?: number };

// Piece lists are built once per derivation and never changed, so an index per list is safe.
const byEdgeCache = new WeakMap<readonly WallPiece[], Map<string, WallPiece[]>>();

function piecesOnEdge(pieces: readonly WallPiece[], ref: string): readonly WallPiece[] {
  let index = byEdgeCache.get(pieces);
  if (!index) {
    index = new Map();
    for (const p of pieces) {
      for (const s of p.sides) {
        const list = index.get(s.edgeRef) ?? [];
        list.push(p);
        index.set(s.edgeRef, list);
      }
    }
    byEdgeCache.set(pieces, index);
  }
  return index.get(ref) ?? [];
}

/** Places an opening on its host edge or free wall and finds the wall piece holding it (m, within `toleranceM`). */
export function openingPlacement(
  plan: Plan,
  pieces: readonly WallPiece[],
  opening: Opening,
  toleranceM: number,
): OpeningPlacement {
  const host = plan.elements[opening.wallRef];
  if (host && host.type === "wall") return onFreeWall(host, opening, toleranceM);
  const parts = edgeRefParts(opening.wallRef);
  const room = parts ? plan.elements[parts.roomId] : undefined;
  if (!parts || !room || room.type !== "room") return { ok: false, reason: "no-wall" };
  const edge = roomEdges(room).find((e) => e.vertexId === parts.vertexId);
  if (!edge) return { ok: false, reason: "no-wall" };
  const from = opening.offsetM;
  const to = opening.offsetM + opening.widthM;
  if (opening.widthM > edge.lengthM + toleranceM) return { ok: false, reason: "wider-than-wall", hostLengthM: edge.lengthM };
  if (from < -toleranceM || to > edge.lengthM + toleranceM) return { ok: false, reason: "outside-wall", hostLengthM: edge.lengthM };
  const centre = (from + to) / 2;
  const piece = piecesOnEdge(pieces, edge.ref).find((p) => p.sides.some((s) => s.edgeRef === edge.ref && s.fromM - 1e-9 <= centre && centre <= s.toM + 1e-9));
  if (!piece) return { ok: false, reason: "no-wall" };
  const side = piece.sides.find((s) => s.edgeRef === edge.ref)!;
  if (opening.widthM > side.toM - side.fromM + toleranceM) return { ok: false, reason: "wider-than-wall", hostLengthM: side.toM - side.fromM };
  if (from < side.fromM - toleranceM || to > side.toM + toleranceM) return { ok: false, reason: "outside-wall", hostLengthM: side.toM - side.fromM };
  const start = pointAlong(edge.start, edge.end, from);
  const end = pointAlong(edge.start, edge.end, to);
  const a = projectionAlongM(start, piece.start, piece.end);
  const b = projectionAlongM(end, piece.start, piece.end);
  return { ok: true, hostId: piece.id, fromM: Math.min(a, b), toM: Math.max(a, b), start, end };
}

function onFreeWall(wall: FreeWall, opening: Opening, toleranceM: number): OpeningPlacement {
  const lengthM = Math.hypot(wall.end.x - wall.start.x, wall.end.y - wall.start.y);
  const from = opening.offsetM, to = opening.offsetM + opening.widthM;
  if (opening.widthM > lengthM + toleranceM) return { ok: false, reason: "wider-than-wall", hostLengthM: lengthM };
  if (from < -toleranceM || to > lengthM + toleranceM) return { ok: false, reason: "outside-wall", hostLengthM: lengthM };
  return { ok: true, hostId: wall.id, fromM: from, toM: to, start: pointAlong(wall.start, wall.end, from), end: pointAlong(wall.start, wall.end, to) };
}
