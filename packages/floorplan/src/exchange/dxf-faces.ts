import type { Point } from "../document/schema.js";
import { polygonAreaM2, polygonPerimeterM, polygonSignedAreaM2 } from "../geometry/polygon.js";
import type { TracedPath } from "./dxf-loops.js";

/** Faces narrower than this (twice area over perimeter) are strips between two wall lines, not rooms, m. */
export const MIN_FACE_WIDTH_M = 0.25;
/** More loose wall segments than this are left for tracing: finding their crossings would take too long. */
export const MAX_FACE_SEGMENTS = 20000;

interface Segment { a: Point; b: Point; path: number }

/**
 * The rooms enclosed by a network of wall lines that do not close one by one: lines are split
 * where they cross or where one ends on another (within `snapM`), loose ends are pruned, and each
 * bounded face of the remaining planar graph is an outline. Faces thinner than
 * `MIN_FACE_WIDTH_M` (a wall drawn as two lines) are returned apart; paths on no face are unused (m).
 */
export function lineNetworkFaces(paths: readonly TracedPath[], snapM: number, minAreaM2: number): { faces: TracedPath[]; thin: TracedPath[]; unused: TracedPath[]; tooMany: boolean } {
  const segs: Segment[] = [];
  paths.forEach((p, path) => {
    for (let i = 1; i < p.points.length; i++) segs.push({ a: p.points[i - 1]!, b: p.points[i]!, path });
  });
  if (segs.length > MAX_FACE_SEGMENTS) return { faces: [], thin: [], unused: [...paths], tooMany: true };
  const eps = Math.max(snapM, 1e-9);
  // Split parameters along each segment (0 and 1 always).
  const cuts = segs.map(() => [0, 1]);
  const box = segs.map((s) => ({ minX: Math.min(s.a.x, s.b.x) - eps, maxX: Math.max(s.a.x, s.b.x) + eps, minY: Math.min(s.a.y, s.b.y) - eps, maxY: Math.max(s.a.y, s.b.y) + eps }));
  const order = segs.map((_, i) => i).sort((p, q) => box[p]!.minX - box[q]!.minX);
  const along = (s: Segment, p: Point): { t: number; d: number } => {
    const dx = s.b.x - s.a.x, dy = s.b.y - s.a.y, len2 = dx * dx + dy * dy;
    const t = len2 === 0 ? 0 : ((p.x - s.a.x) * dx + (p.y - s.a.y) * dy) / len2;
    const c = Math.max(0, Math.min(1, t));
    return { t, d: Math.hypot(s.a.x + dx * c - p.x, s.a.y + dy * c - p.y) };
  };
  for (let k = 0; k < order.length; k++) {
    const i = order[k]!;
    for (let m = k + 1; m < order.length && box[order[m]!]!.minX <= box[i]!.maxX; m++) {
      const j = order[m]!;
      if (box[j]!.minY > box[i]!.maxY || box[i]!.minY > box[j]!.maxY) continue;
      const s = segs[i]!, u = segs[j]!;
      // An end of one lying on the other: a T-junction.
      for (const [x, y] of [[s, u], [u, s]] as const) {
        for (const end of [x.a, x.b]) {
          const h = along(y, end);
          if (h.d <= eps && h.t > 0 && h.t < 1) cuts[y === s ? i : j]!.push(h.t);
        }
      }
      // A proper crossing.
      const d1x = s.b.x - s.a.x, d1y = s.b.y - s.a.y, d2x = u.b.x - u.a.x, d2y = u.b.y - u.a.y;
      const den = d1x * d2y - d1y * d2x;
      if (Math.abs(den) < 1e-15) continue;
      const t = ((u.a.x - s.a.x) * d2y - (u.a.y - s.a.y) * d2x) / den;
      const v = ((u.a.x - s.a.x) * d1y - (u.a.y - s.a.y) * d1x) / den;
      if (t > 0 && t < 1 && v > 0 && v < 1) {
        cuts[i]!.push(t);
        cuts[j]!.push(v);
      }
    }
  }
  // Nodes: split points snapped together through a grid.
  const grid = new Map<string, number[]>();
  const nodes: Point[] = [];
  const nodeOf = (p: Point): number => {
    const gx = Math.floor(p.x / eps), gy = Math.floor(p.y / eps);
    for (let dx = -1; dx <= 1; dx++) for (let dy = -1; dy <= 1; dy++) {
      for (const n of grid.get(`${gx + dx},${gy + dy}`) ?? []) if (Math.hypot(nodes[n]!.x - p.x, nodes[n]!.y - p.y) <= eps) return n;
    }
    nodes.push(p);
    const key = `${gx},${gy}`;
    grid.set(key, [...(grid.get(key) ?? []), nodes.length - 1]);
    return nodes.length - 1;
  };
  const edges = new Map<string, { u: number; v: number; paths: Set<number> }>();
  segs.forEach((s, i) => {
    const ts = [...new Set(cuts[i]!)].sort((p, q) => p - q);
    let prev = nodeOf(s.a);
    for (const t of ts.slice(1)) {
      const n = t === 1 ? nodeOf(s.b) : nodeOf({ x: s.a.x + (s.b.x - s.a.x) * t, y: s.a.y + (s.b.y - s.a.y) * t });
      if (n !== prev) {
        const key = prev < n ? `${prev},${n}` : `${n},${prev}`;
        const e = edges.get(key) ?? { u: Math.min(prev, n), v: Math.max(prev, n), paths: new Set<number>() };
        e.paths.add(s.path);
        edges.set(key, e);
      }
      prev = n;
    }
  });
  const adj = new Map<number, Set<number>>();
  for (const e of edges.values()) {
    adj.set(e.u, (adj.get(e.u) ?? new Set()).add(e.v));
    adj.set(e.v, (adj.get(e.v) ?? new Set()).add(e.u));
  }
  // Loose ends bound no room: prune them until every node has two or more edges.
  const stack = [...adj.keys()].filter((n) => adj.get(n)!.size < 2);
  while (stack.length) {
    const n = stack.pop()!;
    for (const m of adj.get(n) ?? []) {
      adj.get(m)!.delete(n);
      if (adj.get(m)!.size === 1) stack.push(m);
    }
    adj.delete(n);
  }
  const sorted = new Map<number, number[]>();
  for (const [n, ns] of adj) {
    const p = nodes[n]!;
    sorted.set(n, [...ns].sort((a, b) => Math.atan2(nodes[a]!.y - p.y, nodes[a]!.x - p.x) - Math.atan2(nodes[b]!.y - p.y, nodes[b]!.x - p.x)));
  }
  const seen = new Set<string>();
  const faces: TracedPath[] = [];
  const thin: TracedPath[] = [];
  const onFace = new Set<number>();
  for (const u0 of [...sorted.keys()].sort((a, b) => a - b)) {
    for (const v0 of sorted.get(u0)!) {
      if (seen.has(`${u0}>${v0}`)) continue;
      // Keep the face on the left: at each node take the edge next clockwise from the one we came in on.
      const ring: number[] = [];
      let u = u0, v = v0;
      while (!seen.has(`${u}>${v}`) && ring.length <= edges.size * 2) {
        seen.add(`${u}>${v}`);
        ring.push(u);
        const around = sorted.get(v)!;
        const w = around[(around.indexOf(u) - 1 + around.length) % around.length]!;
        [u, v] = [v, w];
      }
      const points = ring.map((n) => nodes[n]!);
      if (points.length < 3 || polygonSignedAreaM2(points) < minAreaM2) continue;
      const used = new Set<number>();
      for (let k = 0; k < ring.length; k++) {
        const a = ring[k]!, b = ring[(k + 1) % ring.length]!;
        for (const p of edges.get(a < b ? `${a},${b}` : `${b},${a}`)?.paths ?? []) used.add(p);
      }
      const handles = [...used].flatMap((p) => paths[p]!.handles).sort();
      const face: TracedPath = { layer: paths[[...used][0] ?? 0]?.layer ?? "", points, closed: true, handles };
      if ((2 * polygonAreaM2(points)) / polygonPerimeterM(points) < MIN_FACE_WIDTH_M) thin.push(face);
      else {
        faces.push(face);
        for (const p of used) onFace.add(p);
      }
    }
  }
  return { faces, thin, unused: paths.filter((_, i) => !onFace.has(i)), tooMany: false };
}
