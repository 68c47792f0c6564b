import type { Plan, Point } from "@hushmark/floorplan";
import { elementsOfType } from "@hushmark/floorplan";
import { dist } from "../../geometry/vec.js";

/** The grille nearest the pointer within reach, on any level (ducts run between floors too). */
export function ventNear(plan: Plan, p: Point, toleranceM: number): string | null {
  let best: { id: string; d: number } | null = null;
  for (const v of elementsOfType(plan, "vent")) {
    const d = dist(v.position, p);
    if (d <= toleranceM * 1.5 && (!best || d < best.d)) best = { id: v.id, d };
  }
  return best?.id ?? null;
}
