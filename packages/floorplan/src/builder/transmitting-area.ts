import { linkTransmittingArea, type Link } from "@hushmark/acoustics";
import { BAND_COUNT } from "../catalogue/bands.js";
import type { LinkInput } from "./types.js";

// Links are not changed once built, so one computation per link object serves pruning and the
// absorption budget alike.
const cache = new WeakMap<object, Float64Array>();

/**
 * τ·S of a network link in every band, m², by the engine's own formula. The builder always sets
 * the fields the schema would default (`type`, flanking `path`), so its links already have the
 * parsed shape and need no schema pass.
 */
export function linkTauSM2(link: Link | LinkInput): Float64Array {
  let hit = cache.get(link);
  if (!hit) {
    hit = linkTransmittingArea(link as Link, BAND_COUNT);
    cache.set(link, hit);
  }
  return hit;
}
