import type { LinkInput } from "./types.js";

// TODO(engine): the engine computes exactly this in network/transmission.ts
// (linkTransmittingArea) but does not export it yet; switch to it once it is in
// @hushmark/acoustics' index so the two cannot drift.

const tau = (tlDb: number) => 10 ** (-tlDb / 10);
const at = (v: number | readonly number[] | undefined, b: number) => (v === undefined ? 0 : typeof v === "number" ? v : v[b]!);

/** K_ij of a flanking link at band b, dB: rigid cross/T junction formula (ISO 12354-1, Annex E), never below K_ij,min. */
export function flankingKijDb(link: Extract<LinkInput, { type: "flanking" }>, b: number): number {
  if (link.kij_db !== undefined) return at(link.kij_db, b);
  const m = Math.log10(link.mass_perpendicular_kg_m2 / link.element_i.mass_kg_m2);
  const straight = (link.path ?? "Ff") === "Ff";
  const k = link.junction === "cross" ? (straight ? 8.7 + 17.1 * m : 8.7) + 5.7 * m * m : (straight ? 5.7 + 14.1 * m : 5.7) + 5.7 * m * m;
  const kMin = 10 * Math.log10(link.coupling_length_m * (1 / link.element_i.area_m2 + 1 / link.element_j.area_m2));
  return Math.max(k, kMin);
}

/** τ·S of a network link at band b, m², as the engine's power balance uses it. */
export function linkTauSM2(link: LinkInput, b: number): number {
  switch (link.type) {
    case "vent":
      return link.open_area_m2 * tau(link.attenuation_db[b]!);
    case "floor":
      return link.area_m2 * tau(link.tl_db[b]!);
    case "flanking": {
      const r = (link.element_i.tl_db[b]! + link.element_j.tl_db[b]!) / 2 + at(link.delta_r_db, b) + flankingKijDb(link, b) + 10 * Math.log10(link.separating_area_m2 / link.coupling_length_m);
      return link.separating_area_m2 * tau(r);
    }
    default: {
      let sum = 0;
      for (const p of link.parts) {
        if ("open" in p && p.open) sum += p.area_m2;
        else if ("dne_db" in p) sum += 10 * tau(p.dne_db[b]!);
        else if ("tl_db" in p) sum += p.area_m2 * tau(p.tl_db[b]!);
      }
      return sum;
    }
  }
}
