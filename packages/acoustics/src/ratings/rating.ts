/** The shape every reference-curve rating returns (the web app draws the curve and deviations). */
import type { ContourFit } from "./contour.js";

export interface CurveRating {
  /** Rating name as the standard writes it: STC, ASTC, NNIC, Rw, R'w, DnT,w, Ln,w, IIC … */
  readonly name: string;
  /** The single-number rating in dB (IIC, STC: a number without unit by convention). */
  readonly value: number;
  /** Standard (and clause) the procedure follows. */
  readonly standard: string;
  /** Nominal frequencies in Hz of the rated bands. */
  readonly frequenciesHz: readonly number[];
  /** The data that were rated, one per band. */
  readonly valuesDb: readonly number[];
  /** The reference curve shifted to its final position. */
  readonly curveDb: readonly number[];
  /** Unfavourable deviation per band (deficiencies for insulation, excesses for impact), ≥ 0. */
  readonly deviationsDb: readonly number[];
  readonly deviationSumDb: number;
  readonly maxDeviationDb: number;
  /** Caveats of the standard that apply to the figure. */
  readonly notes: readonly string[];
}

/** Assemble a CurveRating (values in dB) from a rating's head and its contour fit. */
export function curveRating(
  head: { name: string; value: number; standard: string; notes?: string[] },
  frequenciesHz: readonly number[],
  valuesDb: readonly number[],
  fit: ContourFit,
): CurveRating {
  return {
    name: head.name,
    value: head.value,
    standard: head.standard,
    frequenciesHz,
    valuesDb,
    curveDb: fit.curveDb,
    deviationsDb: fit.deviationsDb,
    deviationSumDb: fit.deviationSumDb,
    maxDeviationDb: fit.maxDeviationDb,
    notes: head.notes ?? [],
  };
}
