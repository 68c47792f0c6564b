import type { Plan } from "@hushmark/floorplan";

/**
 * The analysed elements a click on the plan stands for: the element itself (a wall part, door,
 * window, gap, vent or duct), or for a room its floors and ceilings (ids `a^b` naming the room).
 */
export function pickTargets<T extends { elementId: string; kind?: string }>(elements: readonly T[], plan: Plan, picked: string | null): T[] {
  if (!picked) return [];
  const exact = elements.filter((e) => e.elementId === picked && e.kind !== "flanking");
  if (exact.length) return exact;
  if (plan.elements[picked]?.type === "room") return elements.filter((e) => e.kind !== "flanking" && e.elementId.includes("^") && e.elementId.split("^").includes(picked));
  return [];
}
