/**
 * Rating input: band values keyed by nominal frequency. Ratings read the bands their standard
 * needs and say which are missing, so partial data (a lab report from 100 to 3150 Hz) can be rated
 * for what it supports.
 */
import { bandSet } from "../bands/bands.js";
import type { Spectrum } from "../bands/spectrum.js";

/** Nominal frequency in Hz → value in dB. */
export type BandTable = ReadonlyMap<number, number>;

/** Anything a rating accepts: a full spectrum or a band table. */
export type RatingInput = Spectrum | BandTable;

/** Thrown when a rating's standard needs bands the data do not have. */
export class MissingBandsError extends Error {
  override readonly name = "MissingBandsError";
  constructor(
    readonly rating: string,
    readonly missingHz: readonly number[],
  ) {
    super(`${rating} needs data at ${missingHz.join(", ")} Hz`);
  }
}

/** A band table from a spectrum (nominal frequencies of its band set). */
export function bandTableOf(input: RatingInput): BandTable {
  if (input instanceof Map) return input;
  const s = input as Spectrum;
  const f = bandSet(s.bands).nominalHz;
  return new Map(f.map((hz, i) => [hz, s.values[i] as number]));
}

/** Bands of `needHz` the input lacks. */
export function missingBands(input: RatingInput, needHz: readonly number[]): number[] {
  const t = bandTableOf(input);
  return needHz.filter((hz) => !Number.isFinite(t.get(hz)));
}

/** Values at `needHz`, or MissingBandsError naming the rating and the missing bands. */
export function requireBands(input: RatingInput, needHz: readonly number[], rating: string): number[] {
  const missing = missingBands(input, needHz);
  if (missing.length > 0) throw new MissingBandsError(rating, missing);
  const t = bandTableOf(input);
  return needHz.map((hz) => t.get(hz) as number);
}

/** Nominal one-third-octave frequencies from `fromHz` to `toHz` inclusive. */
export function thirdOctaveRange(fromHz: number, toHz: number): number[] {
  const f = bandSet("third-octave").nominalHz;
  const extra = [6300, 8000, 10000];
  const all = [...f, ...extra];
  return all.slice(all.indexOf(fromHz), all.indexOf(toHz) + 1);
}
