import type { Point } from "@hushmark/floorplan";

/** Points of a quarter-circle swing from `from` round `centre` towards `to` (m), as a flat list. */
export function arcPoints(centre: Point, from: Point, to: Point, steps = 16): number[] {
  const r = Math.hypot(from.x - centre.x, from.y - centre.y);
  const a0 = Math.atan2(from.y - centre.y, from.x - centre.x);
  let a1 = Math.atan2(to.y - centre.y, to.x - centre.x);
  let d = a1 - a0;
  while (d > Math.PI) d -= 2 * Math.PI;
  while (d < -Math.PI) d += 2 * Math.PI;
  a1 = a0 + d;
  const out: number[] = [];
  for (let i = 0; i <= steps; i++) {
    const a = a0 + (d * i) / steps;
    out.push(centre.x + r * Math.cos(a), centre.y + r * Math.sin(a));
  }
  return out;
}

export const flat = (points: readonly Point[]): number[] => points.flatMap((p) => [p.x, p.y]);
