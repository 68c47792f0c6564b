import type { Point } from "../document/schema.js";
import { polygonSelfIntersections, polygonSignedAreaM2 } from "../geometry/polygon.js";

/** Edges within this angle of a wall count as along it. */
const MAX_ANGLE_SIN = Math.sin((2 * Math.PI) / 180);

interface Line2 {
  p: Point;
  u: Point;
}

function intersection(a: Line2, b: Line2): Point | null {
  const den = a.u.x * b.u.y - a.u.y * b.u.x;
  if (Math.abs(den) < 1e-6) return null;
  const t = ((b.p.x - a.p.x) * b.u.y - (b.p.y - a.p.y) * b.u.x) / den;
  return { x: a.p.x + a.u.x * t, y: a.p.y + a.u.y * t };
}

function projected(p: Point, l: Line2): Point {
  const t = (p.x - l.p.x) * l.u.x + (p.y - l.p.y) * l.u.y;
  return { x: l.p.x + l.u.x * t, y: l.p.y + l.u.y * t };
}

/**
 * A room outline with each edge that lies along a wall face (parallel, at half the wall's
 * thickness from its centreline within `toleranceM`, alongside it for at least a quarter of the
 * edge) moved onto that wall's centreline, corners re-found where neighbouring edges meet, m.
 * The plan draws rooms at wall centrelines; IFC spaces stop at the wall faces. An outline that
 * would fold over itself comes back as it was.
 */
export function outlineOnWallAxes(
  outline: readonly Point[],
  walls: ReadonlyArray<{ start: Point; end: Point; thicknessM: number }>,
  toleranceM = 0.02,
): { points: Point[]; moved: number } {
  const n = outline.length;
  const lines: Line2[] = [];
  let moved = 0;
  for (let i = 0; i < n; i++) {
    const a = outline[i]!, b = outline[(i + 1) % n]!;
    const len = Math.hypot(b.x - a.x, b.y - a.y);
    const u = len > 0 ? { x: (b.x - a.x) / len, y: (b.y - a.y) / len } : { x: 1, y: 0 };
    let best: { overlap: number; p: Point } | null = null;
    for (const w of walls) {
      const wl = Math.hypot(w.end.x - w.start.x, w.end.y - w.start.y);
      if (wl === 0 || len === 0) continue;
      const wu = { x: (w.end.x - w.start.x) / wl, y: (w.end.y - w.start.y) / wl };
      if (Math.abs(u.x * wu.y - u.y * wu.x) > MAX_ANGLE_SIN) continue;
      const wn = { x: -wu.y, y: wu.x };
      const mid = { x: (a.x + b.x) / 2, y: (a.y + b.y) / 2 };
      const d = (mid.x - w.start.x) * wn.x + (mid.y - w.start.y) * wn.y;
      if (Math.abs(Math.abs(d) - w.thicknessM / 2) > toleranceM) continue;
      const ta = (a.x - w.start.x) * wu.x + (a.y - w.start.y) * wu.y;
      const tb = (b.x - w.start.x) * wu.x + (b.y - w.start.y) * wu.y;
      const overlap = Math.min(wl, Math.max(ta, tb)) - Math.max(0, Math.min(ta, tb));
      if (overlap < Math.max(0.25 * len, 0.05)) continue;
      if (!best || overlap > best.overlap) best = { overlap, p: { x: mid.x - d * wn.x, y: mid.y - d * wn.y } };
    }
    if (best) moved++;
    lines.push({ p: best ? best.p : a, u });
  }
  if (moved === 0) return { points: outline.map((p) => ({ ...p })), moved: 0 };
  const points = outline.map((v, i) => {
    const before = lines[(i + n - 1) % n]!, after = lines[i]!;
    return intersection(before, after) ?? projected(v, after);
  });
  const sameWinding = Math.sign(polygonSignedAreaM2(points)) === Math.sign(polygonSignedAreaM2(outline));
  if (!sameWinding || polygonSelfIntersections(points).length > 0) return { points: outline.map((p) => ({ ...p })), moved: 0 };
  return { points, moved };
}
