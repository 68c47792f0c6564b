import type { Point } from "../document/schema.js";

/** Signed planar area by the shoelace formula, m² (positive when counter-clockwise). */
export function polygonSignedAreaM2(points: readonly Point[]): number {
  let sum = 0;
  const n = points.length;
  for (let i = 0; i < n; i++) {
    const a = points[i]!;
    const b = points[(i + 1) % n]!;
    sum += a.x * b.y - b.x * a.y;
  }
  return sum / 2;
}

/** Planar polygon area, m² (coordinates in metres). */
export function polygonAreaM2(points: readonly Point[]): number {
  return Math.abs(polygonSignedAreaM2(points));
}

/** Planar distance between two points, m. */
export function distanceM(a: Point, b: Point): number {
  return Math.hypot(b.x - a.x, b.y - a.y);
}

/** Closed-outline perimeter, m. */
export function polygonPerimeterM(points: readonly Point[]): number {
  let sum = 0;
  for (let i = 0; i < points.length; i++) sum += distanceM(points[i]!, points[(i + 1) % points.length]!);
  return sum;
}

/** Room volume from floor area and floor-to-ceiling height, m³. */
export function roomVolumeM3(areaM2: number, heightM: number): number {
  return areaM2 * heightM;
}

export interface Bounds {
  minX: number;
  minY: number;
  maxX: number;
  maxY: number;
}

const boundsCache = new WeakMap<readonly Point[], Bounds>();

/** Axis-aligned bounds of a point list, m (cached for frozen outlines, as immer leaves them). */
export function boundsM(points: readonly Point[]): Bounds {
  const frozen = Object.isFrozen(points);
  const hit = frozen ? boundsCache.get(points) : undefined;
  if (hit) return hit;
  const b = computedBounds(points);
  if (frozen) boundsCache.set(points, b);
  return b;
}

function computedBounds(points: readonly Point[]): Bounds {
  let minX = Infinity, minY = Infinity, maxX = -Infinity, maxY = -Infinity;
  for (const p of points) {
    if (p.x < minX) minX = p.x;
    if (p.y < minY) minY = p.y;
    if (p.x > maxX) maxX = p.x;
    if (p.y > maxY) maxY = p.y;
  }
  return { minX, minY, maxX, maxY };
}

function cross(o: Point, a: Point, b: Point): number {
  return (a.x - o.x) * (b.y - o.y) - (a.y - o.y) * (b.x - o.x);
}

function onSegment(p: Point, a: Point, b: Point, eps: number): boolean {
  return Math.min(a.x, b.x) - eps <= p.x && p.x <= Math.max(a.x, b.x) + eps &&
    Math.min(a.y, b.y) - eps <= p.y && p.y <= Math.max(a.y, b.y) + eps;
}

/** Whether two closed segments touch or cross (no unit; eps in m² of cross product). */
export function segmentsIntersect(a: Point, b: Point, c: Point, d: Point, eps = 1e-12): boolean {
  const d1 = cross(c, d, a), d2 = cross(c, d, b), d3 = cross(a, b, c), d4 = cross(a, b, d);
  if (((d1 > eps && d2 < -eps) || (d1 < -eps && d2 > eps)) && ((d3 > eps && d4 < -eps) || (d3 < -eps && d4 > eps))) return true;
  if (Math.abs(d1) <= eps && onSegment(a, c, d, 1e-9)) return true;
  if (Math.abs(d2) <= eps && onSegment(b, c, d, 1e-9)) return true;
  if (Math.abs(d3) <= eps && onSegment(c, a, b, 1e-9)) return true;
  if (Math.abs(d4) <= eps && onSegment(d, a, b, 1e-9)) return true;
  return false;
}

/**
 * Pairs of edge indices (edge i runs from vertex i to i+1) that cross or touch although they are
 * not neighbours; adjacent edges count when they fold back onto each other (no unit).
 */
export function polygonSelfIntersections(points: readonly Point[]): Array<[number, number]> {
  const n = points.length;
  const out: Array<[number, number]> = [];
  if (n < 3) return out;
  for (let i = 0; i < n; i++) {
    const a = points[i]!, b = points[(i + 1) % n]!;
    for (let j = i + 1; j < n; j++) {
      const c = points[j]!, d = points[(j + 1) % n]!;
      const adjacent = j === i + 1 || (i === 0 && j === n - 1);
      if (adjacent) {
        // Neighbours always share a vertex; they only count when they overlap along a line.
        const shared = j === i + 1 ? b : a;
        const other1 = j === i + 1 ? a : b;
        const other2 = j === i + 1 ? d : c;
        const folded = Math.abs(cross(shared, other1, other2)) < 1e-12 &&
          (other1.x - shared.x) * (other2.x - shared.x) + (other1.y - shared.y) * (other2.y - shared.y) > 0;
        if (folded) out.push([i, j]);
        continue;
      }
      if (segmentsIntersect(a, b, c, d)) out.push([i, j]);
    }
  }
  return out;
}

/** Whether a point lies strictly inside a polygon by ray casting (no unit). */
export function pointInPolygon(p: Point, points: readonly Point[]): boolean {
  let inside = false;
  for (let i = 0, j = points.length - 1; i < points.length; j = i++) {
    const a = points[i]!, b = points[j]!;
    if ((a.y > p.y) !== (b.y > p.y) && p.x < ((b.x - a.x) * (p.y - a.y)) / (b.y - a.y) + a.x) inside = !inside;
  }
  return inside;
}

/** Centroid of a simple polygon, m (falls back to the vertex mean for zero area). */
export function polygonCentroid(points: readonly Point[]): Point {
  const a = polygonSignedAreaM2(points);
  if (Math.abs(a) < 1e-12) {
    const n = Math.max(points.length, 1);
    return { x: points.reduce((s, p) => s + p.x, 0) / n, y: points.reduce((s, p) => s + p.y, 0) / n };
  }
  let cx = 0, cy = 0;
  for (let i = 0; i < points.length; i++) {
    const p = points[i]!, q = points[(i + 1) % points.length]!;
    const f = p.x * q.y - q.x * p.y;
    cx += (p.x + q.x) * f;
    cy += (p.y + q.y) * f;
  }
  return { x: cx / (6 * a), y: cy / (6 * a) };
}
