import { elementsOfType } from "../document/elements.js";
import type { Plan, Point } from "../document/schema.js";
import { distanceToLineM } from "../geometry/segments.js";
import { formatArea } from "../document/units.js";
import { polygonOverlapM2 } from "../geometry/overlap.js";
import { boundsM, polygonAreaM2, polygonSelfIntersections } from "../geometry/polygon.js";
import { MIN_OVERLAP_M2 } from "../geometry/stacking.js";
import { called, problem } from "./make.js";
import type { Problem } from "./problem.js";

/** Smallest room or void the builder accepts, m². */
export const MIN_ROOM_AREA_M2 = 0.01;

/** Whether all corners lie on one line (or there are fewer than three), so the outline has no inside. */
function flat(points: readonly Point[]): boolean {
  if (points.length < 3) return true;
  const a = points[0]!;
  let far = a, best = 0;
  for (const p of points) {
    const d = Math.hypot(p.x - a.x, p.y - a.y);
    if (d > best) [far, best] = [p, d];
  }
  return best === 0 || points.every((p) => distanceToLineM(p, a, far) < 1e-6);
}

/** Levels, room and void outlines, and rooms overlapping on one level. */
export function geometryProblems(plan: Plan): Problem[] {
  const out: Problem[] = [];
  const unit = plan.displayUnit;
  for (const level of elementsOfType(plan, "level")) {
    if (level.heightM === undefined || level.heightM <= 0) {
      out.push(problem("level-without-height", level.id, `${called(level, "Level")} has no floor-to-ceiling height, so room volumes cannot be worked out.`, "Enter the floor-to-ceiling height of this level."));
    }
  }
  const clean = new Set<string>();
  for (const el of [...elementsOfType(plan, "room"), ...elementsOfType(plan, "void")]) {
    const kind = el.type === "room" ? "Room" : "Void";
    const level = plan.elements[el.levelId];
    if (!level || level.type !== "level") {
      out.push(problem("unknown-level", el.id, `${called(el, kind)} is on a level that is not in the plan.`, "Move it onto one of the plan's levels."));
    }
    const ids = new Set<string>();
    for (const v of el.outline) {
      if (ids.has(v.id)) out.push(problem("room-duplicate-corner", el.id, `${called(el, kind)} has two corners with the id ${v.id}.`, "Redraw the outline so each corner is its own point."));
      ids.add(v.id);
    }
    const area = el.outline.length >= 3 ? polygonAreaM2(el.outline) : 0;
    const crossings = flat(el.outline) ? [] : polygonSelfIntersections(el.outline);
    if (area < MIN_ROOM_AREA_M2 && crossings.length === 0) {
      out.push(problem(el.type === "room" ? "room-zero-area" : "void-zero-area", el.id, `${called(el, kind)} has no floor area (${formatArea(area, unit)}): its outline needs at least three corners that are not in a line.`, "Redraw the outline, or delete it if it was drawn by mistake."));
      continue;
    }
    if (crossings.length > 0) {
      const [i, j] = crossings[0]!;
      out.push(problem("room-self-intersecting", el.id, `The outline of ${called(el, kind).toLowerCase()} crosses itself (the wall from corner ${el.outline[i]!.id} crosses the wall from corner ${el.outline[j]!.id}).`, "Drag the corners so the outline goes round the room once without crossing."));
      continue;
    }
    if (el.type === "room") clean.add(el.id);
  }
  // Sort and sweep on x so only rooms whose bounds meet are compared.
  const rooms = elementsOfType(plan, "room")
    .filter((r) => clean.has(r.id))
    .map((r) => ({ r, b: boundsM(r.outline) }))
    .sort((p, q) => p.b.minX - q.b.minX);
  for (let i = 0; i < rooms.length; i++) {
    const { r: a, b: ba } = rooms[i]!;
    for (let j = i + 1; j < rooms.length && rooms[j]!.b.minX < ba.maxX; j++) {
      const { r: b, b: bb } = rooms[j]!;
      if (a.levelId !== b.levelId || ba.maxY <= bb.minY || bb.maxY <= ba.minY) continue;
      const overlap = polygonOverlapM2(a.outline, b.outline);
      if (overlap >= MIN_OVERLAP_M2) {
        const [first, second] = a.id < b.id ? [a, b] : [b, a];
        out.push(problem("rooms-overlap", first.id, `${called(first, "Room")} and ${called(second, "room")} overlap by ${formatArea(overlap, unit)} on the same level; a floor area can belong to one room only.`, `Move the shared wall so the two outlines meet along it instead of overlapping.`));
      }
    }
  }
  return out;
}
