/**
 * Frequency weightings A and C from their defining formulas (IEC 61672-1:2013, Annex E), evaluated
 * at the exact base-10 mid-frequencies of the bands (not from a hand table).
 */
import { bandSet, type BandSetId } from "./bands.js";
import { dbToEnergy, energyToDb } from "./levels.js";
import type { Spectrum } from "./spectrum.js";

// Pole frequencies in Hz (IEC 61672-1:2013, E.2–E.3).
const F1 = 20.598997;
const F2 = 107.65265;
const F3 = 737.86223;
const F4 = 12194.217;
// Normalisation constants A1000 and C1000 in dB (IEC 61672-1:2013, E.2).
const A1000 = -2.0;
const C1000 = -0.062;

/** A-weighting in dB at frequency f in Hz (IEC 61672-1:2013, eq. E.6). */
export function aWeightingDb(fHz: number): number {
  const f2 = fHz * fHz;
  const num = F4 * F4 * f2 * f2;
  const den = (f2 + F1 * F1) * Math.sqrt(f2 + F2 * F2) * Math.sqrt(f2 + F3 * F3) * (f2 + F4 * F4);
  return 20 * Math.log10(num / den) - A1000;
}

/** C-weighting in dB at frequency f in Hz (IEC 61672-1:2013, eq. E.1). */
export function cWeightingDb(fHz: number): number {
  const f2 = fHz * fHz;
  const num = F4 * F4 * f2;
  const den = (f2 + F1 * F1) * (f2 + F4 * F4);
  return 20 * Math.log10(num / den) - C1000;
}

const A_WEIGHTS = new Map<BandSetId, readonly number[]>();

/** A-weighting in dB of every band of a band set, at the exact mid-frequencies. */
export function aWeightsDb(bands: BandSetId): number[] {
  let w = A_WEIGHTS.get(bands);
  if (w === undefined) {
    w = Object.freeze(bandSet(bands).exactHz.map(aWeightingDb));
    A_WEIGHTS.set(bands, w);
  }
  return [...w];
}

/** C-weighting in dB of every band of a band set, at the exact mid-frequencies. */
export function cWeightsDb(bands: BandSetId): number[] {
  return bandSet(bands).exactHz.map(cWeightingDb);
}

/** Linear A-weights 10^(A/10) of every band (multiply band energies by these). */
export function aWeightsLinear(bands: BandSetId): Float64Array {
  return Float64Array.from(aWeightsDb(bands), dbToEnergy);
}

function weightedTotal(s: Spectrum, weightsDb: readonly number[]): number {
  let e = 0;
  for (let i = 0; i < s.values.length; i++) e += dbToEnergy((s.values[i] as number) + (weightsDb[i] as number));
  return energyToDb(e);
}

/** A-weighted total level in dB(A) of a band spectrum: 10·lg Σ 10^((Li + Ai)/10). */
export function aWeightedLevelDb(s: Spectrum): number {
  return weightedTotal(s, aWeightsDb(s.bands));
}

/** C-weighted total level in dB(C) of a band spectrum. */
export function cWeightedLevelDb(s: Spectrum): number {
  return weightedTotal(s, cWeightsDb(s.bands));
}
