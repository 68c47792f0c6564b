/**
 * Flanking transmission by the simplified model of ISO 12354-1 (EN 12354-1): the vibration
 * reduction index K_ij of rigid cross and T junctions from the mass ratio, its lower bound, and
 * the flanking sound reduction index of one path R_ij. Levels in dB, masses in kg/m², areas in m²,
 * lengths in m.
 */

export type JunctionType = "cross" | "t";
/** `straight`: across the junction (Ff, K13); `corner`: around it (Df/Fd, K12). */
export type JunctionPath = "straight" | "corner";

/** M = lg(m'⊥ / m'i): the mass ratio of the perpendicular element to the element in the path. */
export function massRatioM(massPerpendicularKgM2: number, massElementKgM2: number): number {
  return Math.log10(massPerpendicularKgM2 / massElementKgM2);
}

/**
 * K_ij in dB of a rigid junction (ISO 12354-1, Annex E): cross K13 = 8.7 + 17.1·M + 5.7·M²,
 * K12 = 8.7 + 5.7·M²; T K13 = 5.7 + 14.1·M + 5.7·M², K12 = 5.7 + 5.7·M².
 */
export function vibrationReductionIndexDb(junction: JunctionType, path: JunctionPath, m: number): number {
  const m2 = 5.7 * m * m;
  if (junction === "cross") return path === "straight" ? 8.7 + 17.1 * m + m2 : 8.7 + m2;
  return path === "straight" ? 5.7 + 14.1 * m + m2 : 5.7 + m2;
}

/** Lower bound K_ij,min = 10·lg[l_f·(1/S_i + 1/S_j)] in dB (ISO 12354-1, l0 = 1 m). */
export function vibrationReductionIndexMinDb(couplingLengthM: number, areaIM2: number, areaJM2: number): number {
  return 10 * Math.log10(couplingLengthM * (1 / areaIM2 + 1 / areaJM2));
}

export interface FlankingPathInput {
  /** R of the element in the source room, dB. */
  readonly riDb: number;
  /** R of the element in the receiving room, dB. */
  readonly rjDb: number;
  /** ΔR_i + ΔR_j of linings, dB. */
  readonly deltaRDb: number;
  readonly kijDb: number;
  readonly separatingAreaM2: number;
  readonly couplingLengthM: number;
}

/** R_ij = (R_i + R_j)/2 + ΔR_ij + K_ij + 10·lg(S_s/(l0·l_f)) in dB (ISO 12354-1, simplified model). */
export function flankingReductionIndexDb(p: FlankingPathInput): number {
  return (p.riDb + p.rjDb) / 2 + p.deltaRDb + p.kijDb + 10 * Math.log10(p.separatingAreaM2 / p.couplingLengthM);
}

/** Apparent sound reduction index R' = −10·lg Σ 10^(−R/10) over the direct and every flanking path, dB (ISO 12354-1). */
export function apparentReductionIndexDb(pathsDb: readonly number[]): number {
  return -10 * Math.log10(pathsDb.reduce((s, r) => s + Math.pow(10, -r / 10), 0));
}
