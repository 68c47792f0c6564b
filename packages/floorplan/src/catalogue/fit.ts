import { ratingStc } from "@hushmark/acoustics";
import { BANDS_HZ, rounded } from "./bands.js";

const I125 = BANDS_HZ.indexOf(125);

/** STC of a 21-band curve by the engine's ASTM E413 procedure (no unit). */
export function stcForFit(tlDb: readonly number[]): number {
  return ratingStc(new Map(BANDS_HZ.map((hz, i) => [hz, tlDb[i]!]))).value;
}

/**
 * A physical estimate moved by whole decibels until its STC equals a published `stc`, dB (a
 * uniform whole-dB shift moves the STC by exactly as much). Below 125 Hz, outside the STC range,
 * a downward shift is not allowed to take the curve below the unshifted estimate capped at the
 * shifted 125 Hz value, so a fit driven by the mid bands does not empty the bass.
 */
export function shiftedToStc(rawEstimateDb: readonly number[], stc: number): { tlDb: number[]; shiftDb: number } {
  // Round first: whole-dB shifts of a 0.1 dB grid need no rounding afterwards, which could move the rating.
  const estimateDb = rounded(rawEstimateDb);
  const shiftDb = stc - stcForFit(estimateDb);
  const shifted = estimateDb.map((v) => v + shiftDb);
  const at125 = shifted[I125]!;
  const tlDb = shifted.map((v, i) => (i < I125 ? Math.max(v, Math.min(estimateDb[i]!, at125)) : v));
  return { tlDb, shiftDb };
}
