/**
 * Reference-curve fitting shared by STC, Rw, Ln,w and IIC: shift a reference curve in 1 dB steps
 * to the most demanding position where the unfavourable deviations stay within the standard's
 * limits (sum, and for the ASTM ratings a largest single deviation).
 */

export interface ContourFit {
  /** Shift of the reference curve in dB (integer). */
  readonly shiftDb: number;
  /** The shifted reference curve, one value per band. */
  readonly curveDb: number[];
  /** Unfavourable deviation per band in dB (≥ 0). */
  readonly deviationsDb: number[];
  readonly deviationSumDb: number;
  readonly maxDeviationDb: number;
}

export interface ContourSpec {
  /** Reference curve values per band (unshifted). */
  readonly reference: readonly number[];
  /**
   * `below`: a deviation is the amount the data fall below the curve (airborne insulation);
   * `above`: the amount they rise above it (impact levels).
   */
  readonly unfavourable: "below" | "above";
  readonly maxSumDb: number;
  /** Largest single deviation allowed, if the standard has such a rule. */
  readonly maxSingleDb?: number;
}

// Data are reported to 0.1 dB; compare sums with a tolerance well below that.
const EPS = 1e-9;

function deviations(values: readonly number[], spec: ContourSpec, shift: number): number[] {
  return values.map((v, i) => {
    const c = (spec.reference[i] as number) + shift;
    return Math.max(0, spec.unfavourable === "below" ? c - v : v - c);
  });
}

function fits(dev: readonly number[], spec: ContourSpec): boolean {
  const sum = dev.reduce((a, b) => a + b, 0);
  const max = Math.max(...dev);
  return sum <= spec.maxSumDb + EPS && (spec.maxSingleDb === undefined || max <= spec.maxSingleDb + EPS);
}

function result(values: readonly number[], spec: ContourSpec, shift: number): ContourFit {
  const dev = deviations(values, spec, shift);
  return {
    shiftDb: shift,
    curveDb: spec.reference.map((r) => r + shift),
    deviationsDb: dev,
    deviationSumDb: dev.reduce((a, b) => a + b, 0),
    maxDeviationDb: Math.max(...dev),
  };
}

/**
 * The most demanding shift that fits: the highest curve for `below` (insulation), the lowest for
 * `above` (impact). Values in dB, one per reference band.
 */
export function fitContour(values: readonly number[], spec: ContourSpec): ContourFit {
  if (values.length !== spec.reference.length) {
    throw new RangeError(`contour fit needs ${spec.reference.length} values, got ${values.length}`);
  }
  const gaps = values.map((v, i) => v - (spec.reference[i] as number));
  if (spec.unfavourable === "below") {
    // At this shift no band is below the curve; raise it while the limits hold.
    let shift = Math.floor(Math.min(...gaps));
    while (fits(deviations(values, spec, shift + 1), spec)) shift++;
    return result(values, spec, shift);
  }
  let shift = Math.ceil(Math.max(...gaps));
  while (fits(deviations(values, spec, shift - 1), spec)) shift--;
  return result(values, spec, shift);
}
