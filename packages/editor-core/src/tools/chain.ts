import type { Point } from "@hushmark/floorplan";
import { add, dist, len, scale, sub, unit } from "../geometry/vec.js";
import { formatLength, parseLength, type DisplayUnit } from "../units/length.js";

/** The next point `lengthM` from `from` towards `towards` (or along +x when they coincide), m. */
export function pointAtLength(from: Point, towards: Point, lengthM: number): Point {
  const d = sub(towards, from);
  return add(from, scale(len(d) < 1e-9 ? { x: 1, y: 0 } : unit(d), lengthM));
}

/** Dimension labels for each segment of a chain, in the display unit. */
export function chainDims(points: readonly Point[], unitName: DisplayUnit): Array<{ start: Point; end: Point; text: string }> {
  const out = [];
  for (let i = 0; i + 1 < points.length; i++) {
    const start = points[i]!, end = points[i + 1]!;
    if (dist(start, end) > 1e-6) out.push({ start, end, text: formatLength(dist(start, end), unitName) });
  }
  return out;
}

/** Reads a typed length for the next segment, or null. */
export function typedSegment(text: string, unitName: DisplayUnit): number | null {
  const m = parseLength(text, unitName);
  return m !== null && m > 0 ? m : null;
}
