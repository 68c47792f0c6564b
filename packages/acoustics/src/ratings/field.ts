/**
 * Field sound insulation quantities (ISO 16283-1 / ISO 717-1 and ASTM E336) from measured levels.
 * All levels in dB, areas in m², volumes in m³, times in s.
 */
import type { Spectrum } from "../bands/spectrum.js";
import { zipSpectra, mapSpectrum } from "../bands/spectrum.js";
import type { BandSetId } from "../bands/bands.js";

/** Level difference D = L1 − L2 in dB. */
export function levelDifference<B extends BandSetId>(l1: Spectrum<B>, l2: Spectrum<B>): Spectrum<B> {
  return zipSpectra(l1, l2, (a, b) => a - b, "levelDifference");
}

/** Normalized level difference Dn = D − 10·lg(A/A0), A0 = 10 m² (ISO 16283-1). */
export function normalizedLevelDifference<B extends BandSetId>(d: Spectrum<B>, absorptionM2: number): Spectrum<B> {
  return mapSpectrum(d, (x) => x - 10 * Math.log10(absorptionM2 / 10));
}

/** Standardized level difference DnT = D + 10·lg(T/T0), T0 = 0.5 s (ISO 16283-1). */
export function standardizedLevelDifference<B extends BandSetId>(d: Spectrum<B>, rt60S: number): Spectrum<B> {
  return mapSpectrum(d, (x) => x + 10 * Math.log10(rt60S / 0.5));
}

/** Apparent sound reduction index R' = D + 10·lg(S/A) (ISO 16283-1); also ASTM's ATL. */
export function apparentSoundReductionIndex<B extends BandSetId>(
  d: Spectrum<B>,
  partitionAreaM2: number,
  absorptionM2: number,
): Spectrum<B> {
  return mapSpectrum(d, (x) => x + 10 * Math.log10(partitionAreaM2 / absorptionM2));
}

/** DnT from R': DnT = R' + 10·lg(0.32·V/S) (ISO 16283-1 relation, T0 = 0.5 s). */
export function standardizedFromApparent<B extends BandSetId>(rPrime: Spectrum<B>, volumeM3: number, partitionAreaM2: number): Spectrum<B> {
  return mapSpectrum(rPrime, (x) => x + 10 * Math.log10((0.32 * volumeM3) / partitionAreaM2));
}

/** Façade: R'45° = L1,s − L2 + 10·lg(S/A) − 1.5 dB (ISO 16283-3, loudspeaker method). */
export function facadeApparentReduction<B extends BandSetId>(
  l1Surface: Spectrum<B>,
  l2: Spectrum<B>,
  facadeAreaM2: number,
  absorptionM2: number,
): Spectrum<B> {
  return zipSpectra(l1Surface, l2, (a, b) => a - b + 10 * Math.log10(facadeAreaM2 / absorptionM2) - 1.5, "facadeApparentReduction");
}

/** Sabine absorption area A = 0.16·V/T in m² (V in m³, T in s). */
export function sabineAbsorptionM2(volumeM3: number, rt60S: number): number {
  return (0.16 * volumeM3) / rt60S;
}
