import { CollisionGrid, type LabelBox } from "./label-grid.js";

type Point = { x: number; y: number };

/** The point a fraction `t` (0–1) of the way along a polyline, by length. */
export function pointAlongPolyline(points: readonly Point[], t: number): Point {
  const lengths = points.slice(1).map((p, i) => Math.hypot(p.x - points[i]!.x, p.y - points[i]!.y));
  const total = lengths.reduce((a, b) => a + b, 0);
  if (points.length < 2 || total === 0) return points[0] ?? { x: 0, y: 0 };
  let left = Math.min(1, Math.max(0, t)) * total;
  for (let i = 0; i < lengths.length; i++) {
    const l = lengths[i]!;
    if (left <= l || i === lengths.length - 1) {
      const a = points[i]!, b = points[i + 1]!, f = l === 0 ? 0 : Math.min(1, left / l);
      return { x: a.x + (b.x - a.x) * f, y: a.y + (b.y - a.y) * f };
    }
    left -= l;
  }
  return points[points.length - 1]!;
}

export interface PathTagInput {
  rank: number;
  /** The path as drawn, in screen pixels. */
  points: readonly Point[];
  /** The tag's size, px. */
  w: number;
  h: number;
}

/** Where along a path its tag is tried, from the middle outwards. */
const ALONG = [0.5, 0.4, 0.6, 0.3, 0.7, 0.2, 0.8];

/**
 * Places each path's level tag beside its line where it covers neither a room name (`avoid`,
 * screen boxes) nor another path's tag: tried from the middle of the path outwards, above-right
 * of the line and then above-left. A path with no free place keeps its middle, since its level is
 * the one thing the tag must show. Answers each path's tag box by rank, strongest path first.
 */
export function placePathTags(paths: readonly PathTagInput[], avoid: readonly LabelBox[]): Map<number, LabelBox> {
  const grid = new CollisionGrid();
  for (const b of avoid) grid.place(b, 0);
  const out = new Map<number, LabelBox>();
  for (const p of [...paths].sort((a, b) => a.rank - b.rank)) {
    if (p.points.length < 2) continue;
    let chosen: LabelBox | undefined;
    for (const t of ALONG) {
      const at = pointAlongPolyline(p.points, t);
      const right = { x: at.x + 6, y: at.y - p.h - 4, w: p.w, h: p.h };
      const left = { x: at.x - 6 - p.w, y: at.y - p.h - 4, w: p.w, h: p.h };
      chosen = [right, left].find((b) => grid.place(b, 3));
      if (chosen) break;
    }
    if (!chosen) {
      const at = pointAlongPolyline(p.points, 0.5);
      chosen = { x: at.x + 6, y: at.y - p.h - 4, w: p.w, h: p.h };
    }
    out.set(p.rank, chosen);
  }
  return out;
}
