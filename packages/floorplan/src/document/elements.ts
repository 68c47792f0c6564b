import type { Element, ElementOf, ElementType, Plan } from "./schema.js";

// Plans are treated as immutable values (the editor replaces them through immer), so the
// per-type lists are cached against the elements record they were read from.
const byTypeCache = new WeakMap<object, Map<ElementType, Element[]>>();

function byType(plan: Plan): Map<ElementType, Element[]> {
  let map = byTypeCache.get(plan.elements);
  if (!map) {
    map = new Map();
    const ids = Object.keys(plan.elements).sort();
    for (const id of ids) {
      const el = plan.elements[id]!;
      const list = map.get(el.type) ?? [];
      list.push(el);
      map.set(el.type, list);
    }
    byTypeCache.set(plan.elements, map);
  }
  return map;
}

/** The plan's elements of one type, sorted by id so every derived list is deterministic (no unit); do not mutate. */
export function elementsOfType<T extends ElementType>(plan: Plan, type: T): readonly ElementOf<T>[] {
  return (byType(plan).get(type) ?? []) as ElementOf<T>[];
}

/** One element by id and expected type, or undefined (no unit). */
export function elementOfType<T extends ElementType>(plan: Plan, id: string, type: T): ElementOf<T> | undefined {
  const el: Element | undefined = plan.elements[id];
  return el && el.type === type ? (el as ElementOf<T>) : undefined;
}

/** Levels in ascending floor elevation, ties by id (no unit). */
export function levelsByElevation(plan: Plan): ElementOf<"level">[] {
  return [...elementsOfType(plan, "level")].sort((a, b) => a.elevationM - b.elevationM || (a.id < b.id ? -1 : 1));
}
