/**
 * Weighted sound reduction index Rw with the spectrum adaptation terms C and Ctr (ISO 717-1),
 * in one-third octaves (100–3150 Hz, extended 50–5000 Hz) or octaves (125–2000 Hz). The same
 * procedure rates field data: R'w (apparent) and DnT,w (standardized level difference).
 */
import { dbToEnergy, energyToDb, roundTo } from "../bands/levels.js";
import { bandTableOf, missingBands, requireBands, thirdOctaveRange, type RatingInput } from "./band-data.js";
import { fitContour } from "./contour.js";
import { curveRating, type CurveRating } from "./rating.js";

const THIRD_HZ = thirdOctaveRange(100, 3150);
const OCTAVE_HZ = [125, 250, 500, 1000, 2000];
const EXT_HZ = thirdOctaveRange(50, 5000);

/** ISO 717-1 reference values, one-third octaves 100–3150 Hz (Table 3). */
export const RW_REFERENCE_THIRD_DB = [33, 36, 39, 42, 45, 48, 51, 52, 53, 54, 55, 56, 56, 56, 56, 56] as const;
/** ISO 717-1 reference values, octaves 125–2000 Hz (Table 3). */
export const RW_REFERENCE_OCTAVE_DB = [36, 45, 52, 55, 56] as const;

/** Spectrum No. 1 (pink noise, A-weighted, for C), 100–3150 Hz (ISO 717-1, Table 4). */
export const SPECTRUM_C_THIRD_DB = [-29, -26, -23, -21, -19, -17, -15, -13, -12, -11, -10, -9, -9, -9, -9, -9] as const;
/** Spectrum No. 2 (urban traffic, A-weighted, for Ctr), 100–3150 Hz (ISO 717-1, Table 4). */
export const SPECTRUM_CTR_THIRD_DB = [-20, -20, -18, -16, -15, -14, -13, -12, -11, -9, -8, -9, -10, -11, -13, -15] as const;
export const SPECTRUM_C_OCTAVE_DB = [-21, -14, -8, -5, -4] as const;
export const SPECTRUM_CTR_OCTAVE_DB = [-14, -10, -7, -4, -6] as const;
/**
 * Extended 50–5000 Hz spectra (ISO 717-1, Table 4, C50-5000 and Ctr,50-5000). From memory in
 * engine-notes (consistent with published intermediate sums): No. 1 is the 100–3150 table minus
 * 1 dB with −41, −37, −34 below and −10, −10 above; No. 2 the table as is with −25, −23, −21
 * below and −16, −18 above.
 */
export const SPECTRUM_C_EXT_DB = [-41, -37, -34, ...SPECTRUM_C_THIRD_DB.map((v) => v - 1), -10, -10];
export const SPECTRUM_CTR_EXT_DB = [-25, -23, -21, ...SPECTRUM_CTR_THIRD_DB, -16, -18];

export interface RwRating extends CurveRating {
  /** Spectrum adaptation term C (pink noise) in dB. */
  readonly c: number;
  /** Spectrum adaptation term Ctr (urban traffic) in dB. */
  readonly ctr: number;
  /** C50-5000 and Ctr,50-5000 when one-third-octave data 50–5000 Hz exist. */
  readonly c50_5000?: number;
  readonly ctr50_5000?: number;
}

export interface RwOptions {
  /** Rate octave data (125–2000 Hz) instead of one-third octaves; default: third-octave. */
  readonly octave?: boolean;
  /** Name of the figure (Rw, R'w, DnT,w, Dn,w). */
  readonly name?: string;
}

/** X_A = −10·lg Σ 10^((Li − Xi)/10) in dB, the A-weighted level difference for spectrum L (ISO 717-1, 4.4). */
export function aWeightedDifferenceDb(values: readonly number[], spectrumDb: readonly number[]): number {
  let e = 0;
  values.forEach((x, i) => (e += dbToEnergy((spectrumDb[i] as number) - x)));
  return -energyToDb(e);
}

/** Adaptation term = round(X_A) − single-number value (ISO 717-1, 4.4). */
function adaptation(values: readonly number[], spectrumDb: readonly number[], rating: number): number {
  return roundTo(aWeightedDifferenceDb(values, spectrumDb)) - rating;
}

function rateOctave(input: RatingInput, name: string): RwRating {
  const values = requireBands(input, OCTAVE_HZ, `${name} (octaves)`);
  const fit = fitContour(values, { reference: RW_REFERENCE_OCTAVE_DB, unfavourable: "below", maxSumDb: 10 });
  const value = 52 + fit.shiftDb;
  const base = curveRating({ name, value, standard: "ISO 717-1 (octave bands)" }, OCTAVE_HZ, values, fit);
  return {
    ...base,
    c: adaptation(values, SPECTRUM_C_OCTAVE_DB, value),
    ctr: adaptation(values, SPECTRUM_CTR_OCTAVE_DB, value),
  };
}

function rateThird(input: RatingInput, name: string): RwRating {
  const values = requireBands(input, THIRD_HZ, name);
  const fit = fitContour(values, { reference: RW_REFERENCE_THIRD_DB, unfavourable: "below", maxSumDb: 32 });
  const value = 52 + fit.shiftDb;
  const base = curveRating({ name, value, standard: "ISO 717-1" }, THIRD_HZ, values, fit);
  const rated: RwRating = {
    ...base,
    c: adaptation(values, SPECTRUM_C_THIRD_DB, value),
    ctr: adaptation(values, SPECTRUM_CTR_THIRD_DB, value),
  };
  if (missingBands(input, EXT_HZ).length > 0) return rated;
  const t = bandTableOf(input);
  const ext = EXT_HZ.map((hz) => t.get(hz) as number);
  return {
    ...rated,
    c50_5000: adaptation(ext, SPECTRUM_C_EXT_DB, value),
    ctr50_5000: adaptation(ext, SPECTRUM_CTR_EXT_DB, value),
    notes: [...rated.notes, "C50-5000 and Ctr,50-5000 use the extended spectra as recalled in engine-notes (from memory)"],
  };
}

/** Rw (or R'w, DnT,w …) with C and Ctr of sound reduction data in dB (ISO 717-1). */
export function ratingRw(input: RatingInput, options: RwOptions = {}): RwRating {
  const name = options.name ?? "Rw";
  return options.octave ? rateOctave(input, name) : rateThird(input, name);
}
