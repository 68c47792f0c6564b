import type { Point } from "../document/schema.js";
import { polygonSignedAreaM2 } from "../geometry/polygon.js";

/** A point in the file's world frame, z up, m. */
export interface Vec3 {
  x: number;
  y: number;
  z: number;
}

/** A triangulated shape in world metres (z up). */
export interface WorldMesh {
  points: Vec3[];
  /** Index triples into `points`. */
  triangles: number[];
}

/** Range of z over a mesh, m. */
export function zRange(mesh: WorldMesh): { minZ: number; maxZ: number } {
  let minZ = Infinity, maxZ = -Infinity;
  for (const p of mesh.points) {
    minZ = Math.min(minZ, p.z);
    maxZ = Math.max(maxZ, p.z);
  }
  return { minZ, maxZ };
}

/**
 * The outline of a mesh's lowest flat faces (a space's floor), counter-clockwise, in m: the
 * edges used by exactly one bottom triangle, chained into loops; the largest loop wins. Null
 * when the shape has no flat bottom.
 */
export function bottomOutline(mesh: WorldMesh, toleranceM = 1e-3): Point[] | null {
  const { minZ } = zRange(mesh);
  if (!Number.isFinite(minZ)) return null;
  const key = (p: Vec3) => `${Math.round(p.x / 1e-4)},${Math.round(p.y / 1e-4)}`;
  const at = new Map<string, Point>();
  const edges = new Map<string, { from: string; to: string; count: number }>();
  const t = mesh.triangles;
  for (let i = 0; i + 2 < t.length; i += 3) {
    const tri = [mesh.points[t[i]!]!, mesh.points[t[i + 1]!]!, mesh.points[t[i + 2]!]!];
    if (tri.some((p) => Math.abs(p.z - minZ) > toleranceM)) continue;
    const ks = tri.map(key);
    if (ks[0] === ks[1] || ks[1] === ks[2] || ks[0] === ks[2]) continue;
    tri.forEach((p, j) => at.set(ks[j]!, { x: p.x, y: p.y }));
    for (let j = 0; j < 3; j++) {
      const a = ks[j]!, b = ks[(j + 1) % 3]!;
      const k = a < b ? `${a}|${b}` : `${b}|${a}`;
      const e = edges.get(k);
      if (e) e.count++;
      else edges.set(k, { from: a, to: b, count: 1 });
    }
  }
  // Undirected: exporters do not all wind their triangles the same way.
  const next = new Map<string, string[]>();
  for (const e of edges.values()) {
    if (e.count !== 1) continue;
    next.set(e.from, [...(next.get(e.from) ?? []), e.to]);
    next.set(e.to, [...(next.get(e.to) ?? []), e.from]);
  }
  const used = new Set<string>();
  let best: Point[] | null = null;
  for (const start of next.keys()) {
    if (used.has(start)) continue;
    const loop: string[] = [];
    let cur: string | undefined = start;
    while ((cur !== undefined && cur !== start) || loop.length === 0) {
      used.add(cur!);
      loop.push(cur!);
      const options: string[] = next.get(cur!) ?? [];
      cur = options.find((n) => !used.has(n)) ?? (loop.length > 2 && options.includes(start) ? start : undefined);
    }
    if (cur !== start || loop.length < 3) continue;
    const pts = simplifiedRing(loop.map((k) => at.get(k)!));
    if (pts.length >= 3 && (!best || Math.abs(polygonSignedAreaM2(pts)) > Math.abs(polygonSignedAreaM2(best)))) best = pts;
  }
  if (!best) return null;
  return polygonSignedAreaM2(best) < 0 ? best.reverse() : best;
}

/** Drops repeated corners and corners in a straight line (within `toleranceM` of the chord), m. */
export function simplifiedRing(points: readonly Point[], toleranceM = 1e-4): Point[] {
  let pts = [...points];
  for (let changed = true; changed && pts.length > 3; ) {
    changed = false;
    for (let i = 0; i < pts.length && pts.length > 3; i++) {
      const a = pts[(i + pts.length - 1) % pts.length]!, b = pts[i]!, c = pts[(i + 1) % pts.length]!;
      const len = Math.hypot(c.x - a.x, c.y - a.y);
      const off = len === 0 ? 0 : Math.abs((c.x - a.x) * (b.y - a.y) - (c.y - a.y) * (b.x - a.x)) / len;
      if (Math.hypot(b.x - a.x, b.y - a.y) < toleranceM || off < toleranceM) {
        pts = pts.filter((_, j) => j !== i);
        changed = true;
      }
    }
  }
  return pts;
}

/** Convex hull of plan points, counter-clockwise (monotone chain), m. */
export function convexHull(points: readonly Point[]): Point[] {
  const ps = [...points].sort((a, b) => a.x - b.x || a.y - b.y);
  if (ps.length < 3) return ps;
  const cross = (o: Point, a: Point, b: Point) => (a.x - o.x) * (b.y - o.y) - (a.y - o.y) * (b.x - o.x);
  const lower: Point[] = [], upper: Point[] = [];
  for (const p of ps) {
    while (lower.length >= 2 && cross(lower[lower.length - 2]!, lower[lower.length - 1]!, p) <= 1e-12) lower.pop();
    lower.push(p);
  }
  for (const p of [...ps].reverse()) {
    while (upper.length >= 2 && cross(upper[upper.length - 2]!, upper[upper.length - 1]!, p) <= 1e-12) upper.pop();
    upper.push(p);
  }
  return [...lower.slice(0, -1), ...upper.slice(0, -1)];
}

/**
 * The smallest-area rectangle around plan points (its sides follow a hull edge): a straight
 * wall's axis is the centreline along the long side and its thickness the short side, m.
 */
export function wallAxisFromPoints(points: readonly Point[]): { start: Point; end: Point; lengthM: number; thicknessM: number } | null {
  const hull = convexHull(points);
  if (hull.length < 3) return null;
  let best: { area: number; ux: number; uy: number; minU: number; maxU: number; minV: number; maxV: number } | null = null;
  for (let i = 0; i < hull.length; i++) {
    const a = hull[i]!, b = hull[(i + 1) % hull.length]!;
    const len = Math.hypot(b.x - a.x, b.y - a.y);
    if (len < 1e-9) continue;
    const ux = (b.x - a.x) / len, uy = (b.y - a.y) / len;
    let minU = Infinity, maxU = -Infinity, minV = Infinity, maxV = -Infinity;
    for (const p of hull) {
      const u = p.x * ux + p.y * uy, v = -p.x * uy + p.y * ux;
      minU = Math.min(minU, u); maxU = Math.max(maxU, u); minV = Math.min(minV, v); maxV = Math.max(maxV, v);
    }
    const area = (maxU - minU) * (maxV - minV);
    if (!best || area < best.area - 1e-12) best = { area, ux, uy, minU, maxU, minV, maxV };
  }
  if (!best) return null;
  let { ux, uy, minU, maxU, minV, maxV } = best;
  if (maxV - minV > maxU - minU) {
    // The long side runs along v: turn the frame a quarter so u is along the wall.
    [ux, uy] = [-uy, ux];
    [minU, maxU, minV, maxV] = [minV, maxV, -maxU, -minU];
  }
  // Walls point east or north by convention, so the same wall read twice gets the same direction.
  if (ux < -1e-9 || (Math.abs(ux) <= 1e-9 && uy < 0)) {
    [ux, uy] = [-ux, -uy];
    [minU, maxU, minV, maxV] = [-maxU, -minU, -maxV, -minV];
  }
  const v = (minV + maxV) / 2;
  const at = (u: number): Point => ({ x: u * ux - v * uy, y: u * uy + v * ux });
  return { start: at(minU), end: at(maxU), lengthM: maxU - minU, thicknessM: maxV - minV };
}
