/** Outdoor–indoor transmission class OITC (ASTM E1332). */
import { dbToEnergy, energyToDb, roundTo } from "../bands/levels.js";
import { requireBands, thirdOctaveRange, type RatingInput } from "./band-data.js";

export const OITC_BANDS_HZ = thirdOctaveRange(80, 4000);
/**
 * A-weighted reference source levels 80–4000 Hz (ASTM E1332). Memory-grade in engine-notes: taken
 * from an open code file; they sum to 100.13 dB(A), the constant of the formula.
 */
export const OITC_REFERENCE_DBA = [
  80.5, 82.9, 84.9, 84.6, 86.1, 86.4, 87.4, 88.2, 89.8, 89.1, 89.2, 89.0, 89.6, 89.0, 89.2, 88.3, 86.2, 85.0,
] as const;

export interface OitcRating {
  readonly name: "OITC";
  /** OITC rounded to an integer. */
  readonly value: number;
  /** Unrounded value. */
  readonly exact: number;
  readonly standard: string;
  readonly frequenciesHz: readonly number[];
  readonly valuesDb: readonly number[];
  /** Transmitted A-weighted level per band for the reference source, dB(A). */
  readonly transmittedDba: readonly number[];
  readonly notes: readonly string[];
}

/** OITC = 100.13 − 10·lg Σ 10^((L_A,f − TL_f)/10) over 80–4000 Hz, TL in dB (ASTM E1332). */
export function ratingOitc(tl: RatingInput): OitcRating {
  const values = requireBands(tl, OITC_BANDS_HZ, "OITC");
  const transmitted = values.map((v, i) => (OITC_REFERENCE_DBA[i] as number) - v);
  const exact = 100.13 - energyToDb(transmitted.reduce((s, l) => s + dbToEnergy(l), 0));
  return {
    name: "OITC",
    value: roundTo(exact),
    exact,
    standard: "ASTM E1332",
    frequenciesHz: OITC_BANDS_HZ,
    valuesDb: values,
    transmittedDba: transmitted,
    notes: ["OITC reference source levels are memory-grade (see engine-notes)"],
  };
}
