import type { Element, ElementOf, ElementType, Plan } from "./schema.js";

// Per-type lists are cached only for frozen records (immer freezes every committed state): an
// immer draft or a plain object may still change under the same identity.
const byTypeCache = new WeakMap<object, Map<ElementType, Element[]>>();

function byType(plan: Plan): Map<ElementType, Element[]> {
  const frozen = Object.isFrozen(plan.elements);
  let map = frozen ? byTypeCache.get(plan.elements) : undefined;
  if (!map) {
    map = new Map();
    const ids = Object.keys(plan.elements).sort();
    for (const id of ids) {
      const el = plan.elements[id]!;
      const list = map.get(el.type) ?? [];
      list.push(el);
      map.set(el.type, list);
    }
    if (frozen) byTypeCache.set(plan.elements, map);
  }
  return map;
}

const byId = (a: Element, b: Element) => (a.id < b.id ? -1 : a.id > b.id ? 1 : 0);

/** The plan's elements of one type, sorted by id so every derived list is deterministic (no unit); do not mutate. */
export function elementsOfType<T extends ElementType>(plan: Plan, type: T): readonly ElementOf<T>[] {
  if (Object.isFrozen(plan.elements)) return (byType(plan).get(type) ?? []) as ElementOf<T>[];
  const out: Element[] = [];
  for (const el of Object.values(plan.elements)) if (el.type === type) out.push(el);
  return out.sort(byId) as ElementOf<T>[];
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
