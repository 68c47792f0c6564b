import type { Element, ElementOf, ElementType, Plan } from "./schema.js";

/** The plan's elements of one type, sorted by id so every derived list is deterministic (no unit). */
export function elementsOfType<T extends ElementType>(plan: Plan, type: T): ElementOf<T>[] {
  const out: ElementOf<T>[] = [];
  for (const el of Object.values(plan.elements)) if (el.type === type) out.push(el as ElementOf<T>);
  return out.sort((a, b) => (a.id < b.id ? -1 : a.id > b.id ? 1 : 0));
}

/** One element by id and expected type, or undefined (no unit). */
export function elementOfType<T extends ElementType>(plan: Plan, id: string, type: T): ElementOf<T> | undefined {
  const el: Element | undefined = plan.elements[id];
  return el && el.type === type ? (el as ElementOf<T>) : undefined;
}

/** Levels in ascending floor elevation, ties by id (no unit). */
export function levelsByElevation(plan: Plan): ElementOf<"level">[] {
  return elementsOfType(plan, "level").sort((a, b) => a.elevationM - b.elevationM || (a.id < b.id ? -1 : 1));
}
