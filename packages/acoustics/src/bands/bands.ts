/**
 * Band sets of the engine: one-third-octave bands 50–5000 Hz (21) and octave bands 63–8000 Hz (8),
 * with exact base-10 mid-frequencies per IEC 61260-1:2014 (G = 10^(3/10)).
 */

export type BandSetId = "third-octave" | "octave";

export interface BandSet {
  readonly id: BandSetId;
  /** Nominal mid-frequencies in Hz (the labels used in standards and tables). */
  readonly nominalHz: readonly number[];
  /** Exact base-10 mid-frequencies in Hz, f = 1000·G^(x/b). */
  readonly exactHz: readonly number[];
}

/** Octave frequency ratio G = 10^(3/10), base-10 system (IEC 61260-1:2014, 5.2). */
export const OCTAVE_RATIO_G = Math.pow(10, 3 / 10);

const THIRD_OCTAVE_NOMINAL_HZ = [
  50, 63, 80, 100, 125, 160, 200, 250, 315, 400, 500, 630, 800, 1000, 1250, 1600, 2000, 2500,
  3150, 4000, 5000,
] as const;
const OCTAVE_NOMINAL_HZ = [63, 125, 250, 500, 1000, 2000, 4000, 8000] as const;

/** Exact mid-frequency in Hz of band index x (x = 0 at 1 kHz) in a 1/b-octave set (IEC 61260-1:2014, eq. 2). */
export function bandMidFrequencyHz(x: number, bandsPerOctave: number): number {
  return 1000 * Math.pow(OCTAVE_RATIO_G, x / bandsPerOctave);
}

/** Lower and upper band-edge frequencies in Hz of a band with exact mid-frequency fm (IEC 61260-1:2014, eq. 3–4). */
export function bandEdgesHz(midHz: number, bandsPerOctave: number): { lowerHz: number; upperHz: number } {
  const half = Math.pow(OCTAVE_RATIO_G, 1 / (2 * bandsPerOctave));
  return { lowerHz: midHz / half, upperHz: midHz * half };
}

function exactFrequencies(firstX: number, count: number, bandsPerOctave: number): number[] {
  return Array.from({ length: count }, (_, i) => bandMidFrequencyHz(firstX + i, bandsPerOctave));
}

/** One-third-octave bands 50–5000 Hz (x = −13…7). */
export const THIRD_OCTAVE: BandSet = Object.freeze({
  id: "third-octave",
  nominalHz: Object.freeze([...THIRD_OCTAVE_NOMINAL_HZ]),
  exactHz: Object.freeze(exactFrequencies(-13, 21, 3)),
});

/** Octave bands 63–8000 Hz (x = −4…3). */
export const OCTAVE: BandSet = Object.freeze({
  id: "octave",
  nominalHz: Object.freeze([...OCTAVE_NOMINAL_HZ]),
  exactHz: Object.freeze(exactFrequencies(-4, 8, 1)),
});

/** The band set for an id. */
export function bandSet(id: BandSetId): BandSet {
  return id === "octave" ? OCTAVE : THIRD_OCTAVE;
}

/** Number of bands in a band set. */
export function bandCount(id: BandSetId): number {
  return bandSet(id).nominalHz.length;
}

/** Index of a nominal frequency (Hz) in a band set, or −1. */
export function bandIndexOf(id: BandSetId, nominalHz: number): number {
  return bandSet(id).nominalHz.indexOf(nominalHz);
}
