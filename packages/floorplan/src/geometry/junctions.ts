import type { Point } from "../document/schema.js";

/** A wall piece's end at a junction, with the unit direction pointing away from it. */
export interface JunctionArm {
  pieceId: string;
  end: "start" | "end";
  dx: number;
  dy: number;
}

/** A point where wall pieces meet: `end` (1 arm), `corner` or `inline` (2), `t` (3), `cross` (4+). */
export interface Junction {
  id: string;
  point: Point;
  kind: "end" | "inline" | "corner" | "t" | "cross";
  arms: JunctionArm[];
}

/** Anything with an id and two ends in plan coordinates (m). */
export interface SegmentLike {
  id: string;
  start: Point;
  end: Point;
}

function distinctDirections(arms: readonly JunctionArm[]): number {
  const dirs: Array<[number, number]> = [];
  for (const a of arms) if (!dirs.some(([x, y]) => x * a.dx + y * a.dy > 0.999)) dirs.push([a.dx, a.dy]);
  return dirs.length;
}

/** Whether two arms continue each other in a straight line through their junction (no unit). */
export function armsInline(a: JunctionArm, b: JunctionArm): boolean {
  return a.dx * b.dx + a.dy * b.dy < -0.999;
}

/** Groups segment ends lying within `toleranceM` of each other into junctions (m). */
export function wallJunctions(segments: readonly SegmentLike[], toleranceM: number): Junction[] {
  const cell = Math.max(toleranceM, 1e-6) * 2;
  // Grid cells by a number, not a "cx,cy" string: one look-up per neighbouring cell per end.
  // Keys are unique while |cy| < 2^20 cells (100 km at 0.1 m); beyond, two cells may share a
  // key, which only adds candidates — every union still checks the distance.
  const cellKey = (cx: number, cy: number) => cx * 2097152 + cy;
  const grid = new Map<number, number[]>();
  const points: Array<{ p: Point; arm: JunctionArm }> = [];
  for (const s of segments) {
    const len = Math.hypot(s.end.x - s.start.x, s.end.y - s.start.y);
    if (len === 0) continue;
    const ux = (s.end.x - s.start.x) / len, uy = (s.end.y - s.start.y) / len;
    points.push({ p: s.start, arm: { pieceId: s.id, end: "start", dx: ux, dy: uy } });
    points.push({ p: s.end, arm: { pieceId: s.id, end: "end", dx: -ux, dy: -uy } });
  }
  const parent = points.map((_, i) => i);
  const find = (i: number): number => (parent[i] === i ? i : (parent[i] = find(parent[i]!)));
  points.forEach(({ p }, i) => {
    const cx = Math.floor(p.x / cell), cy = Math.floor(p.y / cell);
    for (let dx = -1; dx <= 1; dx++) {
      for (let dy = -1; dy <= 1; dy++) {
        for (const j of grid.get(cellKey(cx + dx, cy + dy)) ?? []) {
          const q = points[j]!.p;
          if (Math.hypot(q.x - p.x, q.y - p.y) <= toleranceM + 1e-9) parent[find(i)] = find(j);
        }
      }
    }
    const key = cellKey(cx, cy);
    const list = grid.get(key) ?? [];
    list.push(i);
    grid.set(key, list);
  });
  const groups = new Map<number, number[]>();
  points.forEach((_, i) => {
    const r = find(i);
    const list = groups.get(r) ?? [];
    list.push(i);
    groups.set(r, list);
  });
  const out: Junction[] = [];
  for (const members of groups.values()) {
    const arms = members.map((i) => points[i]!.arm).sort((a, b) => (a.pieceId < b.pieceId ? -1 : a.pieceId > b.pieceId ? 1 : a.end < b.end ? -1 : 1));
    const n = members.length;
    const x = members.reduce((s, i) => s + points[i]!.p.x, 0) / n;
    const y = members.reduce((s, i) => s + points[i]!.p.y, 0) / n;
    const dirs = distinctDirections(arms);
    const kind = dirs <= 1 ? "end" : dirs === 2 ? (armsInline(arms[0]!, arms[1]!) ? "inline" : "corner") : dirs === 3 ? "t" : "cross";
    out.push({ id: `j${x.toFixed(3)},${y.toFixed(3)}`, point: { x, y }, kind, arms });
  }
  return out.sort((a, b) => a.point.x - b.point.x || a.point.y - b.point.y);
}
