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

/** The seeded catalogue: constructions, coverings and silencers of the trade, keyed by stable id. */
export const constructionCatalogue: Catalogue = Object.freeze({
  constructions: byId([...wallConstructions, ...openingConstructions, ...floorConstructions]),
  coverings: byId(coverings),
  silencers: byId(silencers),
});
