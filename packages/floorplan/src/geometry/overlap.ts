import { featureCollection, intersect, polygon } from "@turf/turf";
import type { Point } from "../document/schema.js";
import { convexClipAreaM2, polygonIsConvex } from "./clip.js";
import { boundsM, polygonAreaM2 } from "./polygon.js";

function ring(points: readonly Point[]): number[][] {
  const coords = points.map((p) => [p.x, p.y]);
  const first = coords[0]!;
  coords.push([first[0]!, first[1]!]);
  return coords;
}

function ringAreaM2(coords: number[][]): number {
  // turf closes rings by repeating the first point; the shoelace sum is unaffected by it.
  return polygonAreaM2(coords.map(([x, y]) => ({ x: x!, y: y! })));
}

/**
 * Area where two plan polygons overlap, m²: exact convex clipping when either is convex (most
 * rooms), otherwise turf's intersection for the boolean part (it works on plane coordinates)
 * with the area planar (holes subtracted).
 */
export function polygonOverlapM2(a: readonly Point[], b: readonly Point[]): number {
  if (a.length < 3 || b.length < 3) return 0;
  const ba = boundsM(a), bb = boundsM(b);
  if (ba.maxX <= bb.minX || bb.maxX <= ba.minX || ba.maxY <= bb.minY || bb.maxY <= ba.minY) return 0;
  if (polygonIsConvex(b)) return convexClipAreaM2(a, b);
  if (polygonIsConvex(a)) return convexClipAreaM2(b, a);
  return turfOverlapM2(a, b);
}

/** Overlap area by turf's polygon intersection, the area planar, m². */
export function turfOverlapM2(a: readonly Point[], b: readonly Point[]): number {
  let result;
  try {
    result = intersect(featureCollection([polygon([ring(a)]), polygon([ring(b)])]));
  } catch {
    // A self-intersecting outline can make the clipper throw; validation reports that outline.
    return 0;
  }
  if (!result) return 0;
  const polys = result.geometry.type === "Polygon" ? [result.geometry.coordinates] : result.geometry.coordinates;
  let area = 0;
  for (const rings of polys) {
    rings.forEach((r, i) => {
      area += i === 0 ? ringAreaM2(r) : -ringAreaM2(r);
    });
  }
  return area;
}
