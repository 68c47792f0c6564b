import { THIRD_OCTAVE } from "@hushmark/acoustics";

/** Nominal one-third-octave mid-frequencies 50–5000 Hz used by every catalogue curve. */
export const BANDS_HZ: readonly number[] = THIRD_OCTAVE.nominalHz;
/** Exact mid-frequencies of the same bands, Hz (IEC 61260-1). */
export const BANDS_EXACT_HZ: readonly number[] = THIRD_OCTAVE.exactHz;
/** Number of bands in every catalogue curve (21). */
export const BAND_COUNT = BANDS_HZ.length;

/** Octave centres 63–8000 Hz, as catalogue sources publish them. */
export const OCTAVES_HZ = [63, 125, 250, 500, 1000, 2000, 4000, 8000] as const;

/** Rounds every band value to 0.1 dB so catalogue data reads like a table (dB). */
export function rounded(values: readonly number[]): number[] {
  return values.map((v) => Math.round(v * 10) / 10);
}

/** Band values no lower than 0 dB: a fitted curve may dip below zero where physics cannot, dB. */
export function nonNegative(values: readonly number[]): number[] {
  return values.map((v) => Math.max(0, v));
}

/**
 * Third-octave curve from octave-band values, dB: linear in log-frequency between octave centres,
 * held flat beyond the first and last centre. An approximation: an octave value is the energy
 * mean of its three bands, which interpolation only matches for smooth curves.
 */
export function thirdOctavesFromOctaves(octaveHz: readonly number[], octaveDb: readonly number[]): number[] {
  return BANDS_HZ.map((f) => {
    const lf = Math.log2(f);
    if (f <= octaveHz[0]!) return octaveDb[0]!;
    for (let i = 0; i + 1 < octaveHz.length; i++) {
      const a = Math.log2(octaveHz[i]!), b = Math.log2(octaveHz[i + 1]!);
      if (lf <= b) return octaveDb[i]! + ((octaveDb[i + 1]! - octaveDb[i]!) * (lf - a)) / (b - a);
    }
    return octaveDb[octaveDb.length - 1]!;
  });
}

/** A-weighting at the nominal bands 50–5000 Hz, dB (IEC 61672-1:2013 table). */
export const A_WEIGHTING_DB: readonly number[] = [
  -30.2, -26.2, -22.5, -19.1, -16.1, -13.4, -10.9, -8.6, -6.6, -4.8, -3.2, -1.9, -0.8, 0, 0.6, 1.0, 1.2, 1.3, 1.2, 1.0, 0.5,
];

/** Energy sum of band levels, dB. */
export function energySumDb(levels: readonly number[]): number {
  return 10 * Math.log10(levels.reduce((s, l) => s + 10 ** (l / 10), 0));
}
