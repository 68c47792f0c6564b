import { linkSchema, linkTransmittingArea, type NetworkInput } from "@hushmark/acoustics";
import { OUTDOORS_ID } from "../document/ids.js";
import type { SpaceInput } from "./types.js";

const SABINE = 0.16;

/** A space's absorption per band from what the finish gave (area or reverberation time), m². */
function finishAbsorptionM2(space: SpaceInput, bands: number): number[] {
  const value = (v: number | readonly number[], b: number) => (typeof v === "number" ? v : (v[b] ?? v[v.length - 1] ?? 0));
  if (space.absorption_m2 !== undefined) return Array.from({ length: bands }, (_, b) => value(space.absorption_m2!, b));
  if (space.rt60_s !== undefined && space.volume_m3 !== undefined) return Array.from({ length: bands }, (_, b) => (SABINE * space.volume_m3!) / value(space.rt60_s!, b));
  return new Array(bands).fill(0.01);
}

/**
 * Adds to each space's absorption the sound that leaves it through its links (Σ τ·S per band, m²).
 * The engine takes a space's absorption as given, including what leaves through its boundaries
 * (docs/network-format.md); a finish preset only describes the surfaces, so a light ceiling that
 * transmits more at low frequencies than its surface absorbs would otherwise make the power
 * balance impossible. Energy leaving through a boundary is, seen from the room, absorbed.
 */
export function withBoundaryLosses(network: NetworkInput, bands = 21): NetworkInput {
  const extra = new Map<string, Float64Array>();
  for (const raw of network.links ?? []) {
    const link = linkSchema.parse(raw);
    const tauS = linkTransmittingArea(link, bands);
    for (const id of link.between) {
      if (id === OUTDOORS_ID) continue;
      const acc = extra.get(id) ?? new Float64Array(bands);
      for (let b = 0; b < bands; b++) acc[b]! += tauS[b]!;
      extra.set(id, acc);
    }
  }
  const spaces = network.spaces.map((space) => {
    const add = extra.get(space.id);
    if (space.kind === "outdoors" || !add) return space;
    const base = finishAbsorptionM2(space, bands);
    const { rt60_s: _dropped, ...rest } = space;
    return { ...rest, absorption_m2: base.map((a, b) => Math.round((a + add[b]!) * 1e6) / 1e6) };
  });
  return { ...network, spaces };
}
