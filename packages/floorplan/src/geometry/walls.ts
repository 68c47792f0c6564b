import { edgeRef } from "../document/ids.js";
import { elementsOfType } from "../document/elements.js";
import type { Plan, Point, Room } from "../document/schema.js";
import { boundsM } from "./polygon.js";
import { collinearOverlap, pointAlong, uncoveredIntervals } from "./segments.js";

/** One edge of a room outline, from vertex `vertexId` to the next vertex. */
export interface RoomEdge {
  ref: string;
  roomId: string;
  vertexId: string;
  levelId: string;
  start: Point;
  end: Point;
  lengthM: number;
}

/** Which part of a room edge a wall piece occupies, m from the edge's start vertex. */
export interface WallSide {
  roomId: string;
  edgeRef: string;
  fromM: number;
  toM: number;
}

/**
 * A wall piece derived from room outlines: `shared` between two rooms (id `edgeA|edgeB`, refs
 * sorted) or `exterior` on one room's edge that nothing else shares (id `edge|k`, k counting
 * the unshared stretches of that edge from its start).
 */
export interface WallPiece {
  id: string;
  levelId: string;
  kind: "shared" | "exterior";
  start: Point;
  end: Point;
  lengthM: number;
  sides: WallSide[];
}

/** The edges of a room outline, skipping zero-length ones, m. */
export function roomEdges(room: Room): RoomEdge[] {
  const out: RoomEdge[] = [];
  const n = room.outline.length;
  for (let i = 0; i < n; i++) {
    const a = room.outline[i]!;
    const b = room.outline[(i + 1) % n]!;
    const lengthM = Math.hypot(b.x - a.x, b.y - a.y);
    if (lengthM === 0) continue;
    out.push({
      ref: edgeRef(room.id, a.id),
      roomId: room.id,
      vertexId: a.id,
      levelId: room.levelId,
      start: { x: a.x, y: a.y },
      end: { x: b.x, y: b.y },
      lengthM,
    });
  }
  return out;
}

interface IndexedEdge {
  edge: RoomEdge;
  minX: number;
  maxX: number;
  minY: number;
  maxY: number;
}

/**
 * Splits every room outline into wall pieces: stretches shared with another room's edge on the
 * same level (collinear within `toleranceM`, partial overlaps and T-junctions included) and the
 * unshared rest (m).
 */
export function wallPieces(rooms: readonly Room[], toleranceM: number): WallPiece[] {
  const byLevel = new Map<string, IndexedEdge[]>();
  for (const room of [...rooms].sort((a, b) => (a.id < b.id ? -1 : 1))) {
    for (const edge of roomEdges(room)) {
      const b = boundsM([edge.start, edge.end]);
      const list = byLevel.get(edge.levelId) ?? [];
      list.push({ edge, ...b });
      byLevel.set(edge.levelId, list);
    }
  }
  const pieces: WallPiece[] = [];
  for (const levelId of [...byLevel.keys()].sort()) {
    const edges = byLevel.get(levelId)!;
    const covered = new Map<string, Array<[number, number]>>();
    const sweep = [...edges].sort((p, q) => p.minX - q.minX);
    for (let i = 0; i < sweep.length; i++) {
      const p = sweep[i]!;
      for (let j = i + 1; j < sweep.length; j++) {
        const q = sweep[j]!;
        if (q.minX > p.maxX + toleranceM) break;
        if (q.edge.roomId === p.edge.roomId) continue;
        if (q.minY > p.maxY + toleranceM || q.maxY < p.minY - toleranceM) continue;
        const [a, b] = p.edge.ref < q.edge.ref ? [p.edge, q.edge] : [q.edge, p.edge];
        const ov = collinearOverlap(a.start, a.end, b.start, b.end, toleranceM);
        if (!ov) continue;
        const start = pointAlong(a.start, a.end, ov.aFromM);
        const end = pointAlong(a.start, a.end, ov.aToM);
        pieces.push({
          id: `${a.ref}|${b.ref}`,
          levelId,
          kind: "shared",
          start,
          end,
          lengthM: ov.lengthM,
          sides: [
            { roomId: a.roomId, edgeRef: a.ref, fromM: ov.aFromM, toM: ov.aToM },
            { roomId: b.roomId, edgeRef: b.ref, fromM: ov.bFromM, toM: ov.bToM },
          ],
        });
        for (const [e, from, to] of [[a, ov.aFromM, ov.aToM], [b, ov.bFromM, ov.bToM]] as const) {
          const list = covered.get(e.ref) ?? [];
          list.push([from, to]);
          covered.set(e.ref, list);
        }
      }
    }
    for (const { edge } of edges) {
      const free = uncoveredIntervals(edge.lengthM, covered.get(edge.ref) ?? [], toleranceM);
      free.forEach(([from, to], k) => {
        pieces.push({
          id: `${edge.ref}|${k}`,
          levelId,
          kind: "exterior",
          start: pointAlong(edge.start, edge.end, from),
          end: pointAlong(edge.start, edge.end, to),
          lengthM: to - from,
          sides: [{ roomId: edge.roomId, edgeRef: edge.ref, fromM: from, toM: to }],
        });
      });
    }
  }
  return pieces.sort((a, b) => (a.id < b.id ? -1 : a.id > b.id ? 1 : 0));
}

/** The plan's wall pieces with the plan's own tolerance (m). */
export function planWallPieces(plan: Plan): WallPiece[] {
  return wallPieces(elementsOfType(plan, "room"), plan.defaults.wallToleranceM);
}

/** Wall pieces shared between two rooms, with the length they share, m. */
export function sharedWalls(pieces: readonly WallPiece[]): Array<{ id: string; roomIds: [string, string]; lengthM: number }> {
  return pieces
    .filter((p) => p.kind === "shared")
    .map((p) => ({ id: p.id, roomIds: [p.sides[0]!.roomId, p.sides[1]!.roomId] as [string, string], lengthM: p.lengthM }));
}
