/**
 * Transmitting area τ·S (m²) per band of every link type: the quantity that couples two spaces in
 * the power balance, e2 += e1·τS/A2 (L2 = L1 − TL + 10·lg(S/A2)).
 */
import { tauOfTl } from "../bands/levels.js";
import { DNE_REFERENCE_AREA_M2 } from "../constructions/composite.js";
import {
  flankingReductionIndexDb,
  massRatioM,
  vibrationReductionIndexDb,
  vibrationReductionIndexMinDb,
} from "../constructions/flanking.js";
import type { FlankingLink, FloorLink, ImpactSource, Link, Part } from "./schema.js";

/** One number for every band, or the band's own value. */
export function bandValue(v: number | readonly number[] | undefined, b: number, fallback = 0): number {
  if (v === undefined) return fallback;
  return typeof v === "number" ? v : (v[b] as number);
}

/** τ·S of one partition part at band b, m². */
export function partTransmittingAreaAt(part: Part, b: number): number {
  if ("open" in part) return part.area_m2;
  if ("dne_db" in part) return DNE_REFERENCE_AREA_M2 * tauOfTl(part.dne_db[b] as number);
  return part.area_m2 * tauOfTl(part.tl_db[b] as number);
}

/** K_ij of a flanking link in dB at band b: the override, or the rigid-junction formula, never below K_ij,min. */
export function flankingKijDb(link: FlankingLink, b: number): number {
  if (link.kij_db !== undefined) return bandValue(link.kij_db, b);
  const straight = link.path === "Ff";
  const m = massRatioM(link.mass_perpendicular_kg_m2, link.element_i.mass_kg_m2);
  const k = vibrationReductionIndexDb(link.junction, straight ? "straight" : "corner", m);
  const kMin = vibrationReductionIndexMinDb(link.coupling_length_m, link.element_i.area_m2, link.element_j.area_m2);
  return Math.max(k, kMin);
}

/** Flanking sound reduction index R_ij of a flanking link at band b, dB (ISO 12354-1 simplified). */
export function flankingRijDb(link: FlankingLink, b: number): number {
  return flankingReductionIndexDb({
    riDb: link.element_i.tl_db[b] as number,
    rjDb: link.element_j.tl_db[b] as number,
    deltaRDb: bandValue(link.delta_r_db, b),
    kijDb: flankingKijDb(link, b),
    separatingAreaM2: link.separating_area_m2,
    couplingLengthM: link.coupling_length_m,
  });
}

/** τ·S of a link at band b, m². */
export function linkTransmittingAreaAt(link: Link, b: number): number {
  switch (link.type) {
    case "partition": {
      let sum = 0;
      for (const p of link.parts) sum += partTransmittingAreaAt(p, b);
      return sum;
    }
    case "vent":
      return link.open_area_m2 * tauOfTl(link.attenuation_db[b] as number);
    case "floor":
      return link.area_m2 * tauOfTl(link.tl_db[b] as number);
    case "flanking":
      return link.separating_area_m2 * tauOfTl(flankingRijDb(link, b));
  }
}

/** Add τ·S of a partition part in every band to `out`, m². */
function addPartTransmittingArea(part: Part, out: Float64Array): void {
  if ("open" in part) {
    for (let b = 0; b < out.length; b++) out[b]! += part.area_m2;
  } else if ("dne_db" in part) {
    for (let b = 0; b < out.length; b++) out[b]! += DNE_REFERENCE_AREA_M2 * tauOfTl(part.dne_db[b] as number);
  } else {
    for (let b = 0; b < out.length; b++) out[b]! += part.area_m2 * tauOfTl(part.tl_db[b] as number);
  }
}

/** τ·S of a link in every band, m². */
export function linkTransmittingArea(link: Link, bands: number): Float64Array {
  const out = new Float64Array(bands);
  if (link.type === "partition") {
    for (const p of link.parts) addPartTransmittingArea(p, out);
    return out;
  }
  if (link.type === "flanking" && !Array.isArray(link.kij_db)) {
    // K_ij from the junction formula (or one given number) is the same in every band: work it
    // out once. Flanking paths are most of a large building's links.
    const kijDb = flankingKijDb(link, 0);
    for (let b = 0; b < bands; b++) {
      const rij = flankingReductionIndexDb({
        riDb: link.element_i.tl_db[b] as number,
        rjDb: link.element_j.tl_db[b] as number,
        deltaRDb: bandValue(link.delta_r_db, b),
        kijDb,
        separatingAreaM2: link.separating_area_m2,
        couplingLengthM: link.coupling_length_m,
      });
      out[b] = link.separating_area_m2 * tauOfTl(rij);
    }
    return out;
  }
  for (let b = 0; b < bands; b++) out[b] = linkTransmittingAreaAt(link, b);
  return out;
}

/** Nominal area S of a link in m² (partition: sum of parts; flanking: the separating area). */
export function linkAreaM2(link: Link): number {
  switch (link.type) {
    case "partition":
      return link.parts.reduce((s, p) => s + p.area_m2, 0);
    case "vent":
      return link.open_area_m2;
    case "floor":
      return link.area_m2;
    case "flanking":
      return link.separating_area_m2;
  }
}

/** Reference absorption area A0 = 10 m² of normalized impact levels (ISO 10140-3). */
export const IMPACT_REFERENCE_ABSORPTION_M2 = 10;

/**
 * Impact excitation of the space below a floor, as the power-balance source term b (m²·energy):
 * L2 = Ln − ΔL − 10·lg(A2/A0) in isolation ⇔ b = A0·10^((Ln − ΔL)/10).
 */
export function impactSourceTerm(floor: FloorLink, source: ImpactSource, bands: number): Float64Array {
  const ln = source.ln_db ?? floor.impact?.ln_db;
  if (ln === undefined) throw new RangeError(`impact source on "${floor.id}" has no ln_db`);
  const out = new Float64Array(bands);
  for (let b = 0; b < bands; b++) {
    const dl = floor.impact?.delta_l_db?.[b] ?? 0;
    out[b] = IMPACT_REFERENCE_ABSORPTION_M2 * Math.pow(10, ((ln[b] as number) - dl) / 10);
  }
  return out;
}
