/**
 * Impact sound ratings: Ln,w with CI (ISO 717-2), the weighted reduction ΔLw of a floor covering
 * (ISO 717-2, 5.3) and the impact insulation class IIC (ASTM E989).
 */
import { energySumDb, roundTo } from "../bands/levels.js";
import { requireBands, thirdOctaveRange, type RatingInput } from "./band-data.js";
import { fitContour } from "./contour.js";
import { curveRating, type CurveRating } from "./rating.js";

const BANDS_HZ = thirdOctaveRange(100, 3150);
const CI_BANDS_HZ = thirdOctaveRange(100, 2500);

/** ISO 717-2 reference values for impact sound, 100–3150 Hz (Table 3). */
export const LNW_REFERENCE_DB = [62, 62, 62, 62, 62, 62, 61, 60, 59, 58, 57, 54, 51, 48, 45, 42] as const;
/** IIC contour relative to its 500 Hz value, 100–3150 Hz (ASTM E989). */
export const IIC_CONTOUR_DB = [2, 2, 2, 2, 2, 2, 1, 0, -1, -2, -3, -6, -9, -12, -15, -18] as const;
/** Ln of the heavyweight reference floor, 100–3150 Hz (ISO 717-2, Table 4); its Ln,r,0,w = 78 dB. */
export const REFERENCE_FLOOR_LN_DB = [67, 67.5, 68, 68.5, 69, 69.5, 70, 70.5, 71, 71.5, 72, 72, 72, 72, 72, 72] as const;
export const REFERENCE_FLOOR_LNW_DB = 78;

export interface LnwRating extends CurveRating {
  /** Spectrum adaptation term CI in dB (needs 100–2500 Hz). */
  readonly ci: number;
}

function fitLn(values: readonly number[]) {
  return fitContour(values, { reference: LNW_REFERENCE_DB, unfavourable: "above", maxSumDb: 32 });
}

/** CI = round(10·lg Σ 10^(Li/10), 100–2500 Hz) − 15 − Ln,w in dB (ISO 717-2, Annex A). */
export function impactAdaptationCi(ln: RatingInput, lnw: number): number {
  const values = requireBands(ln, CI_BANDS_HZ, "CI");
  return roundTo(energySumDb(values)) - 15 - lnw;
}

/** Ln,w (or L'n,w, L'nT,w with `name`) and CI of normalized impact levels Ln in dB (ISO 717-2). */
export function ratingLnw(ln: RatingInput, name = "Ln,w"): LnwRating {
  const values = requireBands(ln, BANDS_HZ, name);
  const fit = fitLn(values);
  const value = 60 + fit.shiftDb;
  return {
    ...curveRating({ name, value, standard: "ISO 717-2" }, BANDS_HZ, values, fit),
    ci: impactAdaptationCi(ln, value),
  };
}

/**
 * Weighted impact reduction ΔLw of a floor covering from its improvement ΔL in dB:
 * Ln,r = Ln,r,0 − ΔL on the reference floor, ΔLw = 78 − Ln,r,w (ISO 717-2, 5.3).
 */
export function ratingDeltaLw(deltaL: RatingInput): CurveRating {
  const dl = requireBands(deltaL, BANDS_HZ, "ΔLw");
  const lnr = REFERENCE_FLOOR_LN_DB.map((l, i) => l - (dl[i] as number));
  const fit = fitLn(lnr);
  const lnrw = 60 + fit.shiftDb;
  return curveRating(
    { name: "ΔLw", value: REFERENCE_FLOOR_LNW_DB - lnrw, standard: "ISO 717-2, 5.3", notes: [`Ln,r,w = ${lnrw} dB on the reference floor`] },
    BANDS_HZ,
    lnr,
    fit,
  );
}

export interface IicOptions {
  /** Apply the 8 dB largest-deviation rule (ASTM E989); on by default. */
  readonly maxDeviationRule?: boolean;
}

/** IIC of normalized impact levels Ln in dB, one-third octaves 100–3150 Hz (ASTM E989). */
export function ratingIic(ln: RatingInput, options: IicOptions = {}, name = "IIC"): CurveRating {
  const values = requireBands(ln, BANDS_HZ, name);
  const rule = options.maxDeviationRule ?? true;
  const fit = fitContour(values, {
    reference: IIC_CONTOUR_DB,
    unfavourable: "above",
    maxSumDb: 32,
    ...(rule ? { maxSingleDb: 8 } : {}),
  });
  const notes = rule ? [] : ["rated without the 8 dB largest-deviation rule"];
  return curveRating({ name, value: 110 - fit.shiftDb, standard: "ASTM E989", notes }, BANDS_HZ, values, fit);
}
