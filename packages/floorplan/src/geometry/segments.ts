import type { Point } from "../document/schema.js";

/** Where two collinear segments overlap: distances along each from its own start, m. */
export interface SegmentOverlap {
  aFromM: number;
  aToM: number;
  bFromM: number;
  bToM: number;
  lengthM: number;
}

/** Point at distance `alongM` from `a` towards `b`, m. */
export function pointAlong(a: Point, b: Point, alongM: number): Point {
  const len = Math.hypot(b.x - a.x, b.y - a.y);
  if (len === 0) return { x: a.x, y: a.y };
  return { x: a.x + ((b.x - a.x) * alongM) / len, y: a.y + ((b.y - a.y) * alongM) / len };
}

/** Perpendicular distance of `p` from the infinite line through `a` and `b`, m. */
export function distanceToLineM(p: Point, a: Point, b: Point): number {
  const len = Math.hypot(b.x - a.x, b.y - a.y);
  if (len === 0) return Math.hypot(p.x - a.x, p.y - a.y);
  return Math.abs((b.x - a.x) * (p.y - a.y) - (b.y - a.y) * (p.x - a.x)) / len;
}

/** Distance of `p` along the segment a→b from `a` (may be negative or past the end), m. */
export function projectionAlongM(p: Point, a: Point, b: Point): number {
  const len = Math.hypot(b.x - a.x, b.y - a.y);
  if (len === 0) return 0;
  return ((p.x - a.x) * (b.x - a.x) + (p.y - a.y) * (b.y - a.y)) / len;
}

/**
 * The overlap of two segments that lie on one line within `toleranceM` (both ends of each within
 * the tolerance of the other's line), longer than the tolerance; null otherwise (m).
 */
export function collinearOverlap(a0: Point, a1: Point, b0: Point, b1: Point, toleranceM: number): SegmentOverlap | null {
  const lenA = Math.hypot(a1.x - a0.x, a1.y - a0.y);
  const lenB = Math.hypot(b1.x - b0.x, b1.y - b0.y);
  if (lenA <= toleranceM || lenB <= toleranceM) return null;
  const tol = Math.max(toleranceM, 1e-9);
  if (distanceToLineM(b0, a0, a1) > tol || distanceToLineM(b1, a0, a1) > tol) return null;
  if (distanceToLineM(a0, b0, b1) > tol || distanceToLineM(a1, b0, b1) > tol) return null;
  const s0 = projectionAlongM(b0, a0, a1);
  const s1 = projectionAlongM(b1, a0, a1);
  const from = Math.max(0, Math.min(s0, s1));
  const to = Math.min(lenA, Math.max(s0, s1));
  if (to - from <= tol) return null;
  const pFrom = pointAlong(a0, a1, from);
  const pTo = pointAlong(a0, a1, to);
  const bFrom = projectionAlongM(pFrom, b0, b1);
  const bTo = projectionAlongM(pTo, b0, b1);
  return {
    aFromM: from,
    aToM: to,
    bFromM: Math.max(0, Math.min(lenB, Math.min(bFrom, bTo))),
    bToM: Math.max(0, Math.min(lenB, Math.max(bFrom, bTo))),
    lengthM: to - from,
  };
}

/** Parts of [0, lengthM] not covered by the given intervals, longer than `minM`, m. */
export function uncoveredIntervals(lengthM: number, covered: ReadonlyArray<[number, number]>, minM: number): Array<[number, number]> {
  const sorted = [...covered].sort((p, q) => p[0] - q[0]);
  const out: Array<[number, number]> = [];
  let cursor = 0;
  for (const [from, to] of sorted) {
    if (from - cursor > minM) out.push([cursor, from]);
    cursor = Math.max(cursor, to);
  }
  if (lengthM - cursor > minM) out.push([cursor, lengthM]);
  return out;
}
