import type { Plan } from "@hushmark/floorplan";
import { wallBands } from "../../editor/model/wall-geometry";

export type OverlayTarget = "wall" | "opening" | "vent" | "duct" | "floor" | null;

/** How an analysed element shows on the plan: which drawing the Paths overlay colours for it. */
export function overlayTarget(plan: Plan, elementId: string): OverlayTarget {
  if (elementId.includes("^")) return elementId.split("^").some((id) => plan.elements[id]?.type === "room") ? "floor" : null;
  if (bandIds(plan).has(elementId)) return "wall";
  const el = plan.elements[elementId];
  if (!el) return null;
  if (el.type === "door" || el.type === "window" || el.type === "penetration") return "opening";
  if (el.type === "vent") return "vent";
  if (el.type === "duct") return "duct";
  return null;
}

const bandIdsCache = new WeakMap<object, Set<string>>();

function bandIds(plan: Plan): Set<string> {
  let ids = bandIdsCache.get(plan.elements);
  if (!ids) {
    ids = new Set(wallBands(plan).map((b) => b.id));
    bandIdsCache.set(plan.elements, ids);
  }
  return ids;
}
