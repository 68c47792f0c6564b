import type { Plan, Point } from "@hushmark/floorplan";
import { hostOf } from "./hosts.js";

export interface Bounds { minX: number; minY: number; maxX: number; maxY: number }

function fromPoints(points: readonly Point[], pad = 0): Bounds | null {
  if (points.length === 0) return null;
  let minX = Infinity, minY = Infinity, maxX = -Infinity, maxY = -Infinity;
  for (const p of points) {
    if (p.x < minX) minX = p.x;
    if (p.y < minY) minY = p.y;
    if (p.x > maxX) maxX = p.x;
    if (p.y > maxY) maxY = p.y;
  }
  return { minX: minX - pad, minY: minY - pad, maxX: maxX + pad, maxY: maxY + pad };
}

export function unionBounds(a: Bounds | null, b: Bounds | null): Bounds | null {
  if (!a) return b;
  if (!b) return a;
  return { minX: Math.min(a.minX, b.minX), minY: Math.min(a.minY, b.minY), maxX: Math.max(a.maxX, b.maxX), maxY: Math.max(a.maxY, b.maxY) };
}

/** An element's extent on the plan, m; walls include half their thickness. */
export function elementBounds(plan: Plan, id: string): Bounds | null {
  const el = plan.elements[id];
  if (!el) return null;
  switch (el.type) {
    case "room": case "void": return fromPoints(el.outline, plan.defaults.wallThicknessM / 2);
    case "wall": return fromPoints([el.start, el.end], el.thicknessM / 2);
    case "pin": case "note": case "vent": return fromPoints([el.position], 0.15);
    case "door": case "window": case "penetration": {
      const host = hostOf(plan, el.wallRef);
      if (!host || host.lengthM === 0) return null;
      const at = (m: number): Point => ({
        x: host.start.x + ((host.end.x - host.start.x) * m) / host.lengthM,
        y: host.start.y + ((host.end.y - host.start.y) * m) / host.lengthM,
      });
      return fromPoints([at(el.offsetM), at(el.offsetM + el.widthM)], el.type === "door" ? el.widthM : host.thicknessM);
    }
    case "duct": return unionBounds(elementBounds(plan, el.fromVentId), elementBounds(plan, el.toVentId));
    default: return null;
  }
}

/** The extent of everything drawn on a level (or all levels), m; null for an empty plan. */
export function planBounds(plan: Plan, levelId?: string): Bounds | null {
  let out: Bounds | null = null;
  for (const el of Object.values(plan.elements)) {
    if (levelId && "levelId" in el && el.levelId !== levelId) continue;
    if (el.type === "level" || el.type === "neighbour") continue;
    out = unionBounds(out, elementBounds(plan, el.id));
  }
  return out;
}

export function boundsOfMany(plan: Plan, ids: readonly string[]): Bounds | null {
  let out: Bounds | null = null;
  for (const id of ids) out = unionBounds(out, elementBounds(plan, id));
  return out;
}
