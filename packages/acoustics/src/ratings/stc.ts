/**
 * Sound transmission class STC (ASTM E413) and its field forms ASTC and NNIC (ASTM E336 data
 * rated by the E413 procedure).
 */
import { fitContour } from "./contour.js";
import { requireBands, thirdOctaveRange, type RatingInput } from "./band-data.js";
import { curveRating, type CurveRating } from "./rating.js";

/** STC contour relative to its 500 Hz value, 125–4000 Hz (ASTM E413, Table 1). */
export const STC_CONTOUR_DB = [-16, -13, -10, -7, -4, -1, 0, 1, 2, 3, 4, 4, 4, 4, 4, 4] as const;
export const STC_BANDS_HZ = thirdOctaveRange(125, 4000);

export interface StcOptions {
  /** Apply the 8 dB largest-deficiency rule (ASTM E413); on by default. */
  readonly maxDeficiencyRule?: boolean;
}

/** ASTM E413 states the classification is not meant for these sources. */
export const STC_SCOPE_NOTE =
  "STC is designed for speech, radio, television and similar office and dwelling sounds; ASTM E413 says it is not meant for machinery, music with strong bass, or transport noise — judge those by band levels (or OITC for transport noise).";

function rateE413(input: RatingInput, name: string, options: StcOptions): CurveRating {
  const values = requireBands(input, STC_BANDS_HZ, name);
  const rule = options.maxDeficiencyRule ?? true;
  const fit = fitContour(values, {
    reference: STC_CONTOUR_DB,
    unfavourable: "below",
    maxSumDb: 32,
    ...(rule ? { maxSingleDb: 8 } : {}),
  });
  const notes = [STC_SCOPE_NOTE];
  if (!rule) notes.push("rated without the 8 dB largest-deficiency rule");
  return curveRating({ name, value: fit.shiftDb, standard: "ASTM E413", notes }, STC_BANDS_HZ, values, fit);
}

/** STC of laboratory transmission loss TL (dB, one-third octaves 125–4000 Hz), ASTM E413. */
export function ratingStc(tl: RatingInput, options: StcOptions = {}): CurveRating {
  return rateE413(tl, "STC", options);
}

/** ASTC of field apparent transmission loss ATL (ASTM E336 data, E413 procedure). */
export function ratingAstc(atl: RatingInput, options: StcOptions = {}): CurveRating {
  return { ...rateE413(atl, "ASTC", options), standard: "ASTM E336 / E413" };
}

/** NNIC of a normalized noise reduction NNR (ASTM E336 data, E413 procedure). */
export function ratingNnic(nnr: RatingInput, options: StcOptions = {}): CurveRating {
  return { ...rateE413(nnr, "NNIC", options), standard: "ASTM E336 / E413" };
}
