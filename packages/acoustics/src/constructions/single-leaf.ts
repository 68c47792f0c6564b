/**
 * Single-leaf transmission loss estimates: the mass law and the coincidence region (Sharp's
 * method, as given in Bies, Hansen & Howard, Engineering Noise Control, 5th ed., 7.2). Estimates,
 * not measurements: every result carries `estimate: true`.
 */
import { AIR_IMPEDANCE_RAYL, SPEED_OF_SOUND_M_S } from "./air.js";

/**
 * Normal-incidence mass law TL0 = 10·lg[1 + (π·f·m/(ρ0·c0))²] in dB (m in kg/m², f in Hz).
 * ≈ 20·lg(m·f) − 42.4 when the second term dominates.
 */
export function massLawNormalDb(surfaceDensityKgM2: number, fHz: number, rhoC = AIR_IMPEDANCE_RAYL): number {
  const x = (Math.PI * fHz * surfaceDensityKgM2) / rhoC;
  return 10 * Math.log10(1 + x * x);
}

/** Field-incidence mass law ≈ 20·lg(m·f) − 47 in dB (m in kg/m², f in Hz). */
export function massLawFieldDb(surfaceDensityKgM2: number, fHz: number): number {
  return 20 * Math.log10(surfaceDensityKgM2 * fHz) - 47;
}

/** Critical (coincidence) frequency fc = c0²/(2π)·√(m/B) in Hz (m in kg/m², bending stiffness B in N·m). */
export function criticalFrequencyHz(surfaceDensityKgM2: number, bendingStiffnessNm: number, c0 = SPEED_OF_SOUND_M_S): number {
  return ((c0 * c0) / (2 * Math.PI)) * Math.sqrt(surfaceDensityKgM2 / bendingStiffnessNm);
}

/** Bending stiffness B = E·h³/(12(1 − ν²)) in N·m of a plate (E in Pa, h in m). */
export function bendingStiffnessNm(youngsModulusPa: number, thicknessM: number, poisson = 0.3): number {
  return (youngsModulusPa * thicknessM ** 3) / (12 * (1 - poisson * poisson));
}

/**
 * Critical frequency from the material product h·fc (m·Hz) and the thickness (m).
 * Products (Hopkins, Sound Insulation, 2007, Table A2): gypsum board 43.5 (other boards 32–36),
 * glass 12.5, concrete 17.1, brick 24.0, steel 12.3.
 */
export function criticalFrequencyFromProductHz(hFcMHz: number, thicknessM: number): number {
  return hFcMHz / thicknessM;
}

export const H_FC_PRODUCTS_M_HZ = Object.freeze({
  gypsumBoard: 43.5,
  glass: 12.5,
  concrete: 17.1,
  brick: 24.0,
  steel: 12.3,
});

export interface SingleLeafInput {
  readonly surfaceDensityKgM2: number;
  readonly criticalFrequencyHz: number;
  /** Total loss factor η (typical 0.01–0.03 for boards and glass, ~0.01–0.02 for masonry). */
  readonly lossFactor: number;
}

/**
 * TL in dB of a single homogeneous leaf at f (Hz) by Sharp's method: below fc/2 the field mass law
 * 20·lg(π·f·m/(ρ0c0)) − 5.5; above fc 20·lg(π·f·m/(ρ0c0)) + 10·lg(2·η·f/(π·fc)); between them a
 * straight line on a log-frequency axis. Never above the normal-incidence mass law.
 */
export function singleLeafTlDb(leaf: SingleLeafInput, fHz: number): number {
  const { surfaceDensityKgM2: m, criticalFrequencyHz: fc, lossFactor: eta } = leaf;
  const mass = (f: number) => 20 * Math.log10((Math.PI * f * m) / AIR_IMPEDANCE_RAYL);
  const below = (f: number) => mass(f) - 5.5;
  const above = (f: number) => mass(f) + 10 * Math.log10((2 * eta * f) / (Math.PI * fc));
  let tl: number;
  if (fHz <= fc / 2) tl = below(fHz);
  else if (fHz >= fc) tl = above(fHz);
  else {
    const r1 = below(fc / 2);
    const r2 = above(fc);
    tl = r1 + ((r2 - r1) * Math.log10(fHz / (fc / 2))) / Math.log10(2);
  }
  return Math.max(0, Math.min(tl, massLawNormalDb(m, fHz)));
}
