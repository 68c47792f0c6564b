import { coverings, silencers } from "./coverings.js";
import { floorConstructions } from "./constructions-floors.js";
import { openingConstructions } from "./constructions-openings.js";
import { wallConstructions } from "./constructions-walls.js";
import type { Catalogue } from "./types.js";

function byId<T extends { id: string }>(list: readonly T[]): Record<string, T> {
  const out: Record<string, T> = {};
  for (const item of list) {
    if (out[item.id]) throw new Error(`duplicate catalogue id ${item.id}`);
    out[item.id] = item;
  }
  return out;
}

/** Freezes an object and everything inside it, so catalogue arrays can be shared by reference. */
function deepFrozen<T>(value: T): T {
  if (typeof value === "object" && value !== null && !Object.isFrozen(value)) {
    for (const v of Object.values(value)) deepFrozen(v);
    Object.freeze(value);
  }
  return value;
}

/** The seeded catalogue: constructions, coverings and silencers of the trade, keyed by stable id. */
export const constructionCatalogue: Catalogue = deepFrozen({
  constructions: byId([...wallConstructions, ...openingConstructions, ...floorConstructions]),
  coverings: byId(coverings),
  silencers: byId(silencers),
});
