import type { Point } from "../document/schema.js";

/** Segments needed so no chord strays more than `chordToleranceM` from an arc of radius `radiusM` sweeping `sweepRad` (count). */
export function arcSegmentCount(radiusM: number, sweepRad: number, chordToleranceM: number): number {
  const sweep = Math.abs(sweepRad);
  if (!(radiusM > 0) || !(sweep > 0) || !Number.isFinite(sweep)) return 1;
  // A zero, negative or missing tolerance would ask for infinitely many chords.
  const tol = chordToleranceM > 1e-6 ? chordToleranceM : 1e-6;
  // The sagitta of a chord subtending angle a is r·(1 − cos(a/2)); solve for the largest a within tolerance.
  const ratio = 1 - Math.min(tol / radiusM, 1);
  const maxStep = 2 * Math.acos(ratio);
  return Math.max(1, Math.ceil(sweep / Math.max(maxStep, 1e-6)));
}

/** Points on a circular arc from `startRad` sweeping `sweepRad` (counter-clockwise when positive), both ends included (m). */
export function arcPoints(centre: Point, radiusM: number, startRad: number, sweepRad: number, chordToleranceM: number): Point[] {
  const n = Math.min(arcSegmentCount(radiusM, sweepRad, chordToleranceM), 4096);
  const out: Point[] = [];
  for (let i = 0; i <= n; i++) {
    const a = startRad + (sweepRad * i) / n;
    out.push({ x: centre.x + radiusM * Math.cos(a), y: centre.y + radiusM * Math.sin(a) });
  }
  return out;
}

/**
 * Points of a polyline segment with a bulge (tan of a quarter of the included angle, positive
 * counter-clockwise, as DXF stores it) from `a` to `b`, excluding `a`, including `b` (m).
 */
export function bulgePoints(a: Point, b: Point, bulge: number, chordToleranceM: number): Point[] {
  const chord = Math.hypot(b.x - a.x, b.y - a.y);
  if (!bulge || chord === 0 || !Number.isFinite(bulge)) return [{ x: b.x, y: b.y }];
  const sweep = 4 * Math.atan(bulge);
  const radius = chord / (2 * Math.abs(Math.sin(sweep / 2)));
  // The centre lies on the chord's perpendicular bisector, on the left for a counter-clockwise arc.
  const mx = (a.x + b.x) / 2, my = (a.y + b.y) / 2;
  const ux = (b.x - a.x) / chord, uy = (b.y - a.y) / chord;
  const h = (chord / 2) / Math.tan(sweep / 2);
  const centre = { x: mx - uy * h, y: my + ux * h };
  const start = Math.atan2(a.y - centre.y, a.x - centre.x);
  const pts = arcPoints(centre, radius, start, sweep, chordToleranceM);
  pts[pts.length - 1] = { x: b.x, y: b.y };
  return pts.slice(1);
}

/** Exact area between a chord of length `chordM` and its arc with the given bulge, m² (for checking flattening). */
export function bulgeSegmentAreaM2(chordM: number, bulge: number): number {
  const sweep = Math.abs(4 * Math.atan(bulge));
  if (sweep === 0) return 0;
  const r = chordM / (2 * Math.sin(sweep / 2));
  return (r * r * (sweep - Math.sin(sweep))) / 2;
}
