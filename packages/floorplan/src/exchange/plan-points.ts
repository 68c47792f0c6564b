import type { Plan, Point } from "../document/schema.js";
import { pointInPolygon, polygonCentroid } from "../geometry/polygon.js";

/** A point inside an outline for its label: the centroid, or for an L or U shape the middle of a span across it (m). */
export function interiorPointM(outline: readonly Point[]): Point {
  const c = polygonCentroid(outline);
  if (pointInPolygon(c, outline)) return c;
  const xs: number[] = [];
  for (let i = 0; i < outline.length; i++) {
    const a = outline[i]!, b = outline[(i + 1) % outline.length]!;
    if ((a.y > c.y) !== (b.y > c.y)) xs.push(a.x + ((c.y - a.y) * (b.x - a.x)) / (b.y - a.y));
  }
  xs.sort((p, q) => p - q);
  return xs.length >= 2 ? { x: (xs[0]! + xs[1]!) / 2, y: c.y } : c;
}

/** The level a space (room or void) lies on, or undefined for neighbours and outdoors (no unit). */
export function spaceLevelId(plan: Plan, spaceId: string): string | undefined {
  const el = plan.elements[spaceId];
  return el && (el.type === "room" || el.type === "void") ? el.levelId : undefined;
}

/** The corners of a band of `thicknessM` centred on the segment a→b, counter-clockwise (m). */
export function bandCornersM(a: Point, b: Point, thicknessM: number): Point[] {
  const len = Math.hypot(b.x - a.x, b.y - a.y);
  if (len === 0) return [a, b];
  const nx = (-(b.y - a.y) / len) * (thicknessM / 2), ny = ((b.x - a.x) / len) * (thicknessM / 2);
  return [
    { x: a.x - nx, y: a.y - ny }, { x: b.x - nx, y: b.y - ny },
    { x: b.x + nx, y: b.y + ny }, { x: a.x + nx, y: a.y + ny },
  ];
}
