import { linkTransmittingArea, type Link } from "@hushmark/acoustics";
import { BAND_COUNT } from "../catalogue/bands.js";
import type { LinkInput } from "./types.js";

/**
 * τ·S of a network link in every band, m², by the engine's own formula. The builder always sets
 * the fields the schema would default (`type`, flanking `path`), so its links already have the
 * parsed shape and need no schema pass.
 */
export function linkTauSM2(link: LinkInput): Float64Array {
  return linkTransmittingArea(link as Link, BAND_COUNT);
}
