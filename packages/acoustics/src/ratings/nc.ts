/**
 * Noise criterion (NC) rating of an octave-band spectrum by the tangency method with the NC
 * curves of ANSI/ASA S12.2 (octaves 63–8000 Hz). Between tabulated curves the band's NC value is
 * interpolated linearly; the rating is the lowest integer curve no band exceeds (interpolation
 * rule from memory, see engine-notes).
 */
import { OCTAVE, type BandSetId } from "../bands/bands.js";
import { thirdOctaveToOctave, type Spectrum } from "../bands/spectrum.js";

/** NC curves, octave bands 63–8000 Hz, NC-15 … NC-70 in 5-point steps (ANSI/ASA S12.2, Table 1). */
export const NC_CURVES_DB: ReadonlyMap<number, readonly number[]> = new Map([
  [15, [47, 36, 29, 22, 17, 14, 12, 11]],
  [20, [51, 40, 33, 26, 22, 19, 17, 16]],
  [25, [54, 44, 37, 31, 27, 24, 22, 21]],
  [30, [57, 48, 41, 35, 31, 29, 28, 27]],
  [35, [60, 52, 45, 40, 36, 34, 33, 32]],
  [40, [64, 56, 50, 45, 41, 39, 38, 37]],
  [45, [67, 60, 54, 49, 46, 44, 43, 42]],
  [50, [71, 64, 58, 54, 51, 49, 48, 47]],
  [55, [74, 67, 62, 58, 56, 54, 53, 52]],
  [60, [77, 71, 67, 63, 61, 59, 58, 57]],
  [65, [80, 75, 71, 68, 66, 64, 63, 62]],
  [70, [83, 79, 75, 72, 71, 70, 69, 68]],
]);
const NC_STEPS = [...NC_CURVES_DB.keys()];

export interface NcRating {
  /** Rating (integer). Clamped to 15 when every band is below NC-15 (then `belowRange`). */
  readonly value: number;
  /** Band that sets the rating, Hz. */
  readonly controllingHz: number;
  /** Interpolated NC of each rated octave band. */
  readonly bands: readonly { hz: number; levelDb: number; nc: number }[];
  readonly belowRange: boolean;
  /** True when a band is above NC-70 (the value is extrapolated). */
  readonly aboveRange: boolean;
  readonly notes: readonly string[];
}

function curveValue(nc: number, band: number): number {
  return (NC_CURVES_DB.get(nc) as readonly number[])[band] as number;
}

/** NC value at which the curve of octave band `band` passes `levelDb` (linear between curves, extrapolated outside). */
export function ncOfBand(band: number, levelDb: number): number {
  let k = 0;
  while (k < NC_STEPS.length - 2 && levelDb > curveValue(NC_STEPS[k + 1] as number, band)) k++;
  const lo = NC_STEPS[k] as number;
  const hi = NC_STEPS[k + 1] as number;
  const vLo = curveValue(lo, band);
  const vHi = curveValue(hi, band);
  return lo + ((hi - lo) * (levelDb - vLo)) / (vHi - vLo);
}

/** NC rating of an octave or one-third-octave spectrum in dB (thirds are summed into octaves first). */
export function ratingNc(s: Spectrum<BandSetId>): NcRating {
  const oct = s.bands === "octave" ? (s as Spectrum<"octave">) : thirdOctaveToOctave(s as Spectrum<"third-octave">);
  const notes: string[] = [];
  const bands = oct.values.flatMap((levelDb, band) => {
    if (!Number.isFinite(levelDb)) return [];
    return [{ hz: OCTAVE.nominalHz[band] as number, levelDb, nc: ncOfBand(band, levelDb) }];
  });
  if (s.bands === "third-octave") notes.push("octave levels summed from one-third octaves 50–5000 Hz; no data for the 8000 Hz octave");
  if (bands.length === 0) {
    return { value: 15, controllingHz: 0, bands, belowRange: true, aboveRange: false, notes: [...notes, "no energy in any band"] };
  }
  const top = bands.reduce((a, b) => (b.nc > a.nc ? b : a));
  const raw = Math.ceil(top.nc - 1e-9);
  const aboveRange = top.nc > 70;
  if (aboveRange) notes.push("above NC-70: extrapolated beyond the tabulated curves");
  const belowRange = raw < 15;
  if (belowRange) notes.push("every band is below NC-15");
  return { value: Math.max(15, raw), controllingHz: top.hz, bands, belowRange, aboveRange, notes };
}

/** The NC-N curve in dB per octave band 63–8000 Hz for any N (interpolated between tabulated curves). */
export function ncCurveDb(nc: number): number[] {
  return OCTAVE.nominalHz.map((_, band) => {
    let k = 0;
    while (k < NC_STEPS.length - 2 && nc > (NC_STEPS[k + 1] as number)) k++;
    const lo = NC_STEPS[k] as number;
    const hi = NC_STEPS[k + 1] as number;
    return curveValue(lo, band) + ((curveValue(hi, band) - curveValue(lo, band)) * (nc - lo)) / (hi - lo);
  });
}
