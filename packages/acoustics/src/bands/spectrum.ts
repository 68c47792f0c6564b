/**
 * A band spectrum that knows its band set, so that combining spectra of different band sets is
 * an error with a clear message, never a silent misalignment.
 */
import { bandCount, bandSet, type BandSetId } from "./bands.js";
import { dbToEnergy, energyToDb } from "./levels.js";

export interface Spectrum<B extends BandSetId = BandSetId> {
  readonly bands: B;
  /** One value per band of `bands`, ascending in frequency (dB unless the caller says otherwise). */
  readonly values: readonly number[];
}

/** Thrown when spectra of different band sets (or a wrong number of values) are combined. */
export class BandMismatchError extends Error {
  override readonly name = "BandMismatchError";
}

/** A spectrum over a band set; throws BandMismatchError unless there is one value per band. */
export function spectrum<B extends BandSetId>(bands: B, values: readonly number[]): Spectrum<B> {
  const n = bandCount(bands);
  if (values.length !== n) {
    throw new BandMismatchError(`${bands} spectrum needs ${n} values (${describeBands(bands)}), got ${values.length}`);
  }
  if (values.some((v) => Number.isNaN(v))) throw new BandMismatchError(`${bands} spectrum contains NaN`);
  return Object.freeze({ bands, values: Object.freeze([...values]) });
}

/** A spectrum with the same value in every band. */
export function flatSpectrum<B extends BandSetId>(bands: B, valueDb: number): Spectrum<B> {
  return spectrum(bands, new Array<number>(bandCount(bands)).fill(valueDb));
}

function describeBands(bands: BandSetId): string {
  const f = bandSet(bands).nominalHz;
  return `${f[0]}–${f[f.length - 1]} Hz`;
}

/** Throws BandMismatchError unless both spectra use the same band set. */
export function assertSameBands(a: Spectrum, b: Spectrum, context: string): void {
  if (a.bands !== b.bands) {
    throw new BandMismatchError(`${context}: cannot combine a ${a.bands} spectrum with a ${b.bands} spectrum`);
  }
}

/** Band-by-band combination of two spectra of the same band set. */
export function zipSpectra<B extends BandSetId>(
  a: Spectrum<B>,
  b: Spectrum<B>,
  f: (x: number, y: number, band: number) => number,
  context = "zipSpectra",
): Spectrum<B> {
  assertSameBands(a, b, context);
  return spectrum(a.bands, a.values.map((x, i) => f(x, b.values[i] as number, i)));
}

/** Band-by-band map of a spectrum. */
export function mapSpectrum<B extends BandSetId>(s: Spectrum<B>, f: (x: number, band: number) => number): Spectrum<B> {
  return spectrum(s.bands, s.values.map(f));
}

/** Energetic sum of spectra, band by band (dB). */
export function sumSpectra<B extends BandSetId>(spectra: readonly Spectrum<B>[]): Spectrum<B> {
  const first = spectra[0];
  if (first === undefined) throw new BandMismatchError("sumSpectra needs at least one spectrum");
  const energy = new Array<number>(first.values.length).fill(0);
  for (const s of spectra) {
    assertSameBands(first, s, "sumSpectra");
    s.values.forEach((v, i) => (energy[i] = (energy[i] as number) + dbToEnergy(v)));
  }
  return spectrum(first.bands, energy.map(energyToDb));
}

/** Total level of a spectrum: energetic sum of its bands (dB, unweighted "Z"). */
export function totalLevelDb(s: Spectrum): number {
  let e = 0;
  for (const v of s.values) e += dbToEnergy(v);
  return energyToDb(e);
}

/**
 * Octave levels from one-third-octave levels 50–5000 Hz by energy sums of three bands each:
 * 63 Hz (50, 63, 80) … 4000 Hz (3150, 4000, 5000). The 8000 Hz octave has no data: −Infinity.
 */
export function thirdOctaveToOctave(s: Spectrum<"third-octave">): Spectrum<"octave"> {
  if (s.bands !== "third-octave") throw new BandMismatchError(`thirdOctaveToOctave needs a third-octave spectrum, got ${s.bands}`);
  const out: number[] = [];
  for (let k = 0; k < 7; k++) {
    const e = dbToEnergy(s.values[3 * k] as number) + dbToEnergy(s.values[3 * k + 1] as number) + dbToEnergy(s.values[3 * k + 2] as number);
    out.push(energyToDb(e));
  }
  out.push(-Infinity);
  return spectrum("octave", out);
}

/** Levels at given nominal frequencies (Hz) of a spectrum, or undefined where the band set lacks one. */
export function valuesAtHz(s: Spectrum, nominalHz: readonly number[]): (number | undefined)[] {
  const f = bandSet(s.bands).nominalHz;
  return nominalHz.map((hz) => {
    const i = f.indexOf(hz);
    return i < 0 ? undefined : s.values[i];
  });
}
