import { BANDS_EXACT_HZ } from "./bands.js";

// TODO(engine): the engine's issue lists mass-law estimates among its public API; once
// @hushmark/acoustics exports them, use those here so catalogue estimates and upgrade
// estimates come from one model.

/** Field-incidence mass law, dB: 20·lg(m·f) − 47 (m in kg/m², f in Hz). */
export function massLawFieldDb(massKgM2: number, fHz: number): number {
  return 20 * Math.log10(massKgM2 * fHz) - 47;
}

/** A single homogeneous leaf: surface density and coincidence product h·fc (Hopkins 2007, Table A2). */
export interface Leaf {
  massKgM2: number;
  /** Critical frequency, Hz. */
  criticalHz: number;
  /** Total loss factor in place (common practice: 0.01 glass, 0.02 masonry, 0.03 board). */
  lossFactor: number;
}

/**
 * Single-leaf transmission loss per band by Sharp's method, dB: field mass law up to fc/2,
 * 20·lg(m·f) + 10·lg(2ηf/(π·fc)) − 47 from fc up, straight in log f between.
 */
export function singleLeafTlDb(leaf: Leaf): number[] {
  const { massKgM2: m, criticalHz: fc, lossFactor: eta } = leaf;
  const above = (f: number) => massLawFieldDb(m, f) + 10 * Math.log10((2 * eta * f) / (Math.PI * fc));
  return BANDS_EXACT_HZ.map((f) => {
    if (f <= fc / 2) return massLawFieldDb(m, f);
    if (f >= fc) return Math.min(above(f), massLawFieldDb(m, f));
    const a = massLawFieldDb(m, fc / 2), b = Math.min(above(fc), massLawFieldDb(m, fc));
    return a + ((b - a) * Math.log2(f / (fc / 2)));
  });
}

/** Mass–air–mass resonance of two leaves on a cavity, Hz: 60·√((1/m1 + 1/m2)/d) (m in kg/m², d in m). */
export function massAirMassHz(m1: number, m2: number, cavityM: number): number {
  return 60 * Math.sqrt((1 / m1 + 1 / m2) / cavityM);
}

/** A double-leaf construction: two leaves on a cavity and how the leaves are tied together. */
export interface DoubleLeaf {
  leaf1: Leaf;
  leaf2: Leaf;
  cavityM: number;
  /** Porous absorber in the cavity. */
  absorber: boolean;
  /**
   * How much the ties let through, as the most a double leaf can gain over the mass law of its
   * total mass, dB (common practice: ≈ 10 rigid wood studs, 15 steel studs, 20 resilient
   * channel, ∞ independent studs).
   */
  bridgeLimitDb: number;
}

/**
 * Double-leaf transmission loss per band after Sharp, dB: the mass law of the total mass below
 * f0; R1 + R2 + 20·lg(f·d) − 29 between f0 and the cavity limit 55/d; R1 + R2 + 6 above; an
 * empty cavity loses 5 dB above f0 (common practice); ties cap the gain over the total mass law.
 */
export function doubleLeafTlDb(w: DoubleLeaf): number[] {
  const r1 = singleLeafTlDb(w.leaf1), r2 = singleLeafTlDb(w.leaf2);
  const total = singleLeafTlDb({ ...w.leaf1, massKgM2: w.leaf1.massKgM2 + w.leaf2.massKgM2, criticalHz: Math.min(w.leaf1.criticalHz, w.leaf2.criticalHz) });
  const f0 = massAirMassHz(w.leaf1.massKgM2, w.leaf2.massKgM2, w.cavityM);
  const fl = 55 / w.cavityM;
  return BANDS_EXACT_HZ.map((f, i) => {
    const rm = total[i]!;
    if (f <= f0) return f > f0 / 1.26 ? rm - 5 : rm; // the band at resonance dips
    let r = f < fl ? r1[i]! + r2[i]! + 20 * Math.log10(f * w.cavityM) - 29 : r1[i]! + r2[i]! + 6;
    if (!w.absorber) r -= 5;
    r = Math.min(r, rm + w.bridgeLimitDb);
    return Math.max(r, rm - 5);
  });
}

/** Coincidence product h·fc of common materials, m·Hz (Hopkins, Sound Insulation, 2007, Table A2). */
export const COINCIDENCE_M_HZ = { gypsum: 43.5, glass: 12.5, concrete: 17.1, brick: 24.0, steel: 12.3 } as const;

/** Critical frequency of a plate of the given material and thickness, Hz. */
export function criticalFrequencyHz(material: keyof typeof COINCIDENCE_M_HZ, thicknessM: number): number {
  return COINCIDENCE_M_HZ[material] / thicknessM;
}
