import { edgeRef } from "../document/ids.js";
import { elementsOfType } from "../document/elements.js";
import type { Plan, Point, Room } from "../document/schema.js";
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

const edgesCache = new WeakMap<Room, RoomEdge[]>();

/** The edges of a room outline, skipping zero-length ones, m (cached for frozen rooms, as immer leaves them). */
export function roomEdges(room: Room): RoomEdge[] {
  const frozen = Object.isFrozen(room) && Object.isFrozen(room.outline);
  const hit = frozen ? edgesCache.get(room) : undefined;
  if (hit) return hit;
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
  if (frozen) edgesCache.set(room, out);
  return out;
}

/** Angle buckets of about 0.6°; edges further apart in direction are never one wall. */
const ANGLE_STEP = 0.01;

/**
 * Pairs of edges that may lie on one line: edges are bucketed by direction and by the offset of
 * their line from the origin, neighbouring buckets are merged into clusters (so a line straddling
 * a bucket edge stays together), and within a cluster only edges whose extents along the line
 * overlap are paired (sort and sweep). Near-linear in the number of edges.
 */
function candidatePairs(edges: readonly RoomEdge[], toleranceM: number): Array<[RoomEdge, RoomEdge]> {
  const cell = Math.max(toleranceM, 1e-6) * 2;
  const steps = Math.round(Math.PI / ANGLE_STEP);
  const bucketOf = new Map<string, number>();
  const parent: number[] = [];
  const find = (x: number): number => (parent[x] === x ? x : (parent[x] = find(parent[x]!)));
  const edgeBucket = edges.map((e) => {
    let ux = (e.end.x - e.start.x) / e.lengthM, uy = (e.end.y - e.start.y) / e.lengthM;
    if (uy < 0 || (uy === 0 && ux < 0)) [ux, uy] = [-ux, -uy];
    const a = Math.round(Math.atan2(uy, ux) / ANGLE_STEP) % steps;
    const o = Math.floor((-uy * e.start.x + ux * e.start.y) / cell);
    const key = `${a},${o}`;
    let id = bucketOf.get(key);
    if (id === undefined) {
      id = parent.length;
      parent.push(id);
      bucketOf.set(key, id);
      for (const da of [-1, 0, 1]) {
        // Directions wrap at π, where the line offset changes sign.
        let aa = a + da, flip = false;
        if (aa < 0) [aa, flip] = [aa + steps, true];
        if (aa >= steps) [aa, flip] = [aa - steps, true];
        for (const d0 of [-1, 0, 1]) {
          const other = bucketOf.get(`${aa},${flip ? -o - 1 + d0 : o + d0}`);
          if (other !== undefined) parent[find(other)] = find(id);
        }
      }
    }
    return id;
  });
  const clusters = new Map<number, number[]>();
  edgeBucket.forEach((b, i) => {
    const root = find(b);
    const list = clusters.get(root) ?? [];
    list.push(i);
    clusters.set(root, list);
  });
  const pairs: Array<[RoomEdge, RoomEdge]> = [];
  for (const members of clusters.values()) {
    if (members.length < 2) continue;
    const first = edges[members[0]!]!;
    const ux = (first.end.x - first.start.x) / first.lengthM, uy = (first.end.y - first.start.y) / first.lengthM;
    const span = members
      .map((i) => {
        const e = edges[i]!;
        const p = e.start.x * ux + e.start.y * uy, q = e.end.x * ux + e.end.y * uy;
        return { i, lo: Math.min(p, q), hi: Math.max(p, q) };
      })
      .sort((x, y) => x.lo - y.lo);
    for (let k = 0; k < span.length; k++) {
      const a = span[k]!;
      for (let m = k + 1; m < span.length && span[m]!.lo <= a.hi + toleranceM; m++) pairs.push([edges[a.i]!, edges[span[m]!.i]!]);
    }
  }
  return pairs;
}

/**
 * Splits every room outline into wall pieces: stretches shared with another room's edge on the
 * same level (collinear within `toleranceM`, partial overlaps and T-junctions included) and the
 * unshared rest (m).
 */
export function wallPieces(rooms: readonly Room[], toleranceM: number): WallPiece[] {
  const byLevel = new Map<string, RoomEdge[]>();
  for (const room of [...rooms].sort((a, b) => (a.id < b.id ? -1 : 1))) {
    for (const edge of roomEdges(room)) {
      const list = byLevel.get(edge.levelId) ?? [];
      list.push(edge);
      byLevel.set(edge.levelId, list);
    }
  }
  const pieces: WallPiece[] = [];
  for (const levelId of [...byLevel.keys()].sort()) {
    const edges = byLevel.get(levelId)!;
    const covered = new Map<string, Array<[number, number]>>();
    for (const [p, q] of candidatePairs(edges, toleranceM)) {
      if (q.roomId === p.roomId) continue;
      const [a, b] = p.ref < q.ref ? [p, q] : [q, p];
      const ov = collinearOverlap(a.start, a.end, b.start, b.end, toleranceM);
      if (!ov) continue;
      pieces.push({
        id: `${a.ref}|${b.ref}`,
        levelId,
        kind: "shared",
        start: pointAlong(a.start, a.end, ov.aFromM),
        end: pointAlong(a.start, a.end, ov.aToM),
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
    for (const edge of edges) {
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
