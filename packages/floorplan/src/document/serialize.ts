import type { Plan } from "./schema.js";

function sortedValue(value: unknown): unknown {
  if (Array.isArray(value)) return value.map(sortedValue);
  if (typeof value === "number") return Object.is(value, -0) ? 0 : value;
  if (typeof value === "object" && value !== null) {
    const out: Record<string, unknown> = {};
    for (const key of Object.keys(value).sort()) {
      const v = (value as Record<string, unknown>)[key];
      if (v !== undefined) out[key] = sortedValue(v);
    }
    return out;
  }
  return value;
}

/** JSON with object keys sorted at every depth, so equal plans give equal text (no unit). */
export function canonicalJson(value: unknown, indent = 2): string {
  return JSON.stringify(sortedValue(value), null, indent);
}

/** The plan as deterministic JSON text with a trailing newline (no unit). */
export function serializePlan(plan: Plan): string {
  return `${canonicalJson(plan)}\n`;
}
