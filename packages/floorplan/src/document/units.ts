/** A length in the plan's display unit: "1.20 m" or feet and inches like `3' 11"` (input in m). */
export function formatLength(lengthM: number, unit: "metric" | "imperial"): string {
  if (unit === "metric") return `${lengthM.toFixed(2)} m`;
  const totalIn = Math.round(lengthM / 0.0254);
  const feet = Math.floor(totalIn / 12);
  const inches = totalIn - feet * 12;
  return feet > 0 ? `${feet}' ${inches}"` : `${inches}"`;
}

/** An area in the plan's display unit: "20.0 m²" or "215 sq ft" (input in m²). */
export function formatArea(areaM2: number, unit: "metric" | "imperial"): string {
  return unit === "metric" ? `${areaM2.toFixed(1)} m²` : `${Math.round(areaM2 / 0.09290304)} sq ft`;
}
