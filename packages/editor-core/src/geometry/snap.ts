import { elementsOfType, type Plan, type Point } from "@hushmark/floorplan";
import { wallHosts } from "./hosts.js";
import { add, closestOnSegment, cross, dist, dot, len, roundPoint, scale, sub, unit } from "./vec.js";

export type SnapKind = "vertex" | "edge" | "perpendicular" | "parallel" | "grid" | "none";

/** Where a pointer snapped to, and what to draw so the surveyor sees why. */
export interface SnapResult {
  point: Point;
  kind: SnapKind;
  /** The element or edge ref the point snapped to, if any. */
  targetRef?: string;
  /** A guide line to draw (the edge snapped to, or the reference edge of a direction lock). */
  guide?: { start: Point; end: Point };
}

export interface SnapOptions {
  levelId: string;
  /** Grid spacing, m; 0 turns grid snapping off. */
  gridM: number;
  /** How near counts as "on" something, m (the screen tolerance divided by the zoom). */
  toleranceM: number;
  /** The point the current segment starts from, for perpendicular and parallel locks. */
  from?: Point;
  /** Turn snapping off (the surveyor holds Alt). */
  disabled?: boolean;
  /** Points to ignore (the vertex being dragged). */
  ignore?: ReadonlySet<string>;
}

const ANGLE_TOLERANCE_RAD = (3 * Math.PI) / 180;

interface Line { ref: string; start: Point; end: Point }

function linesOn(plan: Plan, levelId: string): Line[] {
  return wallHosts(plan).filter((h) => h.levelId === levelId).map((h) => ({ ref: h.ref, start: h.start, end: h.end }));
}

function verticesOn(plan: Plan, levelId: string, ignore: ReadonlySet<string>): Array<{ ref: string; p: Point }> {
  const out: Array<{ ref: string; p: Point }> = [];
  for (const room of elementsOfType(plan, "room")) {
    if (room.levelId !== levelId) continue;
    for (const v of room.outline) {
      const ref = `${room.id}:${v.id}`;
      if (!ignore.has(ref)) out.push({ ref, p: { x: v.x, y: v.y } });
    }
  }
  for (const w of elementsOfType(plan, "wall")) {
    if (w.levelId !== levelId) continue;
    if (!ignore.has(`${w.id}:start`)) out.push({ ref: `${w.id}:start`, p: w.start });
    if (!ignore.has(`${w.id}:end`)) out.push({ ref: `${w.id}:end`, p: w.end });
  }
  return out;
}

/**
 * Snaps a pointer position (m) in order of intent: an existing corner, then a direction lock
 * perpendicular or parallel to a wall (from the segment's start), then a wall line, then the grid.
 */
export function snapPoint(plan: Plan, raw: Point, options: SnapOptions): SnapResult {
  if (options.disabled) return { point: raw, kind: "none" };
  const tol = options.toleranceM;
  const ignore = options.ignore ?? new Set<string>();

  let best: { ref: string; p: Point; d: number } | null = null;
  for (const v of verticesOn(plan, options.levelId, ignore)) {
    const d = dist(v.p, raw);
    if (d <= tol && (!best || d < best.d)) best = { ...v, d };
  }
  if (best) return { point: best.p, kind: "vertex", targetRef: best.ref };

  const lines = linesOn(plan, options.levelId).filter((l) => !ignore.has(l.ref));

  if (options.from) {
    const lock = directionLock(lines, options.from, raw, options.gridM);
    if (lock) {
      // A lock that also lands on a wall line snaps to the crossing, which is what a surveyor closing a room wants.
      for (const l of lines) {
        const c = closestOnSegment(lock.point, l.start, l.end);
        if (c.distance <= tol) {
          const x = intersect(options.from, lock.point, l.start, l.end);
          if (x) return { ...lock, point: roundPoint(x) };
        }
      }
      return lock;
    }
  }

  let onEdge: { line: Line; p: Point; d: number } | null = null;
  for (const l of lines) {
    const c = closestOnSegment(raw, l.start, l.end);
    if (c.distance <= tol && (!onEdge || c.distance < onEdge.d)) onEdge = { line: l, p: c.point, d: c.distance };
  }
  if (onEdge) {
    return { point: roundPoint(onEdge.p), kind: "edge", targetRef: onEdge.line.ref, guide: { start: onEdge.line.start, end: onEdge.line.end } };
  }

  if (options.gridM > 0) return { point: snapToGrid(raw, options.gridM), kind: "grid" };
  return { point: raw, kind: "none" };
}

export function snapToGrid(p: Point, gridM: number): Point {
  return roundPoint({ x: Math.round(p.x / gridM) * gridM, y: Math.round(p.y / gridM) * gridM });
}

function directionLock(lines: Line[], from: Point, raw: Point, gridM: number): SnapResult | null {
  const v = sub(raw, from);
  const l = len(v);
  if (l < 1e-6) return null;
  const dir = unit(v);
  let best: { angle: number; axis: Point; kind: "perpendicular" | "parallel"; line: Line } | null = null;
  for (const line of lines) {
    const along = unit(sub(line.end, line.start));
    const normal = { x: -along.y, y: along.x };
    for (const [axis, kind] of [[along, "parallel"], [normal, "perpendicular"]] as const) {
      const angle = Math.abs(Math.atan2(cross(axis, dir), dot(axis, dir)));
      const folded = Math.min(angle, Math.PI - angle);
      if (folded <= ANGLE_TOLERANCE_RAD && (!best || folded < best.angle)) best = { angle: folded, axis, kind, line };
    }
  }
  if (!best) return null;
  const sign = dot(best.axis, dir) >= 0 ? 1 : -1;
  let length = Math.abs(dot(v, best.axis));
  if (gridM > 0) length = Math.round(length / gridM) * gridM;
  return {
    point: roundPoint(add(from, scale(best.axis, sign * length))),
    kind: best.kind,
    targetRef: best.line.ref,
    guide: { start: best.line.start, end: best.line.end },
  };
}

/** Where line p1p2 (extended) crosses segment ab, if it does. */
function intersect(p1: Point, p2: Point, a: Point, b: Point): Point | null {
  const r = sub(p2, p1);
  const s = sub(b, a);
  const denom = cross(r, s);
  if (Math.abs(denom) < 1e-12) return null;
  const u = cross(sub(a, p1), r) / denom;
  if (u < -1e-9 || u > 1 + 1e-9) return null;
  const t = cross(sub(a, p1), s) / denom;
  return add(p1, scale(r, t));
}
