import type { Point } from "../document/schema.js";
import { polygonSignedAreaM2 } from "./polygon.js";

/** Whether a simple polygon is convex (collinear corners allowed), no unit. */
export function polygonIsConvex(points: readonly Point[]): boolean {
  const n = points.length;
  if (n < 3) return false;
  let sign = 0;
  for (let i = 0; i < n; i++) {
    const a = points[i]!, b = points[(i + 1) % n]!, c = points[(i + 2) % n]!;
    const z = (b.x - a.x) * (c.y - b.y) - (b.y - a.y) * (c.x - b.x);
    if (Math.abs(z) < 1e-12) continue;
    const s = z > 0 ? 1 : -1;
    if (sign === 0) sign = s;
    else if (s !== sign) return false;
  }
  return sign !== 0;
}

/**
 * Area of `subject` inside the convex polygon `clip`, m², by Sutherland–Hodgman clipping. The
 * subject may be concave: the clipped ring can then run back along the clip's edges, which adds
 * no area, so the area stays exact.
 */
export function convexClipAreaM2(subject: readonly Point[], clip: readonly Point[]): number {
  const ccw = polygonSignedAreaM2(clip) > 0 ? clip : [...clip].reverse();
  let out: Point[] = [...subject];
  for (let i = 0; i < ccw.length && out.length > 0; i++) {
    const a = ccw[i]!, b = ccw[(i + 1) % ccw.length]!;
    const side = (p: Point) => (b.x - a.x) * (p.y - a.y) - (b.y - a.y) * (p.x - a.x);
    const input = out;
    out = [];
    for (let j = 0; j < input.length; j++) {
      const p = input[j]!, q = input[(j + 1) % input.length]!;
      const sp = side(p), sq = side(q);
      if (sp >= 0) out.push(p);
      if ((sp >= 0) !== (sq >= 0)) {
        const t = sp / (sp - sq);
        out.push({ x: p.x + (q.x - p.x) * t, y: p.y + (q.y - p.y) * t });
      }
    }
  }
  return out.length >= 3 ? Math.abs(polygonSignedAreaM2(out)) : 0;
}
