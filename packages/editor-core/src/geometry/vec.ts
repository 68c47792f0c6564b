import type { Point } from "@hushmark/floorplan";

export const sub = (a: Point, b: Point): Point => ({ x: a.x - b.x, y: a.y - b.y });
export const add = (a: Point, b: Point): Point => ({ x: a.x + b.x, y: a.y + b.y });
export const scale = (a: Point, k: number): Point => ({ x: a.x * k, y: a.y * k });
export const dot = (a: Point, b: Point): number => a.x * b.x + a.y * b.y;
export const cross = (a: Point, b: Point): number => a.x * b.y - a.y * b.x;
export const len = (a: Point): number => Math.hypot(a.x, a.y);
export const dist = (a: Point, b: Point): number => Math.hypot(a.x - b.x, a.y - b.y);

/** Unit vector, or (1, 0) for a zero vector so callers never divide by zero. */
export function unit(a: Point): Point {
  const l = len(a);
  return l === 0 ? { x: 1, y: 0 } : { x: a.x / l, y: a.y / l };
}

/** The closest point on segment ab to p, and how far along it is (0..1). */
export function closestOnSegment(p: Point, a: Point, b: Point): { point: Point; t: number; distance: number } {
  const ab = sub(b, a);
  const l2 = dot(ab, ab);
  const t = l2 === 0 ? 0 : Math.max(0, Math.min(1, dot(sub(p, a), ab) / l2));
  const point = add(a, scale(ab, t));
  return { point, t, distance: dist(p, point) };
}

/** Rounds to a millimetre so floating noise from snapping does not reach the document. */
export const roundMm = (v: number): number => Math.round(v * 1000) / 1000;
export const roundPoint = (p: Point): Point => ({ x: roundMm(p.x), y: roundMm(p.y) });
