import { NC_CURVES_DB, OCTAVE, THIRD_OCTAVE, aWeightsDb, bandEdgesHz } from "@hushmark/acoustics";
import type { MeasurementKind } from "@hushmark/schemas";

export const BANDS_HZ = THIRD_OCTAVE.nominalHz;
const A_WEIGHTS = aWeightsDb("third-octave");

/** A-weighted total (dBA) of the bands that have a level; null when none has. */
export function aWeightedTotal(levels: readonly (number | null)[]): number | null {
  let e = 0;
  let any = false;
  levels.forEach((l, i) => {
    if (l === null || l === undefined) return;
    any = true;
    e += 10 ** ((l + A_WEIGHTS[i]!) / 10);
  });
  return any ? Math.round(10 * Math.log10(e) * 10) / 10 : null;
}

export const bandEdges = THIRD_OCTAVE.exactHz.map((f) => bandEdgesHz(f, 3));

/** NC curves (octave bands 63–8000 Hz) as points at the octave mid-frequencies. */
export const ncCurves = [...NC_CURVES_DB.entries()].map(([nc, levels]) => ({ nc, points: OCTAVE.exactHz.map((f, i) => ({ hz: f, db: levels[i]! })) }));

export const kindLabels: Record<MeasurementKind, string> = {
  background: "Background",
  source_side: "Source side",
  receiver_side: "Receiver side",
  before_work: "Before the work",
  after_work: "After the work",
};

export const formatHz = (hz: number) => (hz >= 1000 ? `${hz / 1000}k` : String(hz));
export const formatDb = (v: number | null | undefined, unit = "dB") => (v === null || v === undefined ? "—" : `${v.toFixed(1)} ${unit}`);

export function formatClock(seconds: number): string {
  const s = Math.floor(seconds);
  const h = Math.floor(s / 3600);
  const m = Math.floor((s % 3600) / 60);
  const ss = String(s % 60).padStart(2, "0");
  return h > 0 ? `${h}:${String(m).padStart(2, "0")}:${ss}` : `${m}:${ss}`;
}

export const SERIES_COLOURS = ["#1f7a74", "#c2412d", "#c98a12", "#1d2433", "#7a1f3d", "#2f8f4e"];

/**
 * Octave-band levels 63 Hz–4 kHz from one-third-octave levels 50–5000 Hz, each the energy sum of
 * its three bands (null where one of them has no level), with the octave's band edges in Hz.
 */
export function octaveSteps(levels: readonly (number | null)[]): { hz: number; lowerHz: number; upperHz: number; db: number | null }[] {
  return OCTAVE.nominalHz.slice(0, 7).map((hz, k) => {
    const three = levels.slice(3 * k, 3 * k + 3);
    const db = three.length === 3 && three.every((v) => v !== null && v !== undefined) ? 10 * Math.log10(three.reduce((e: number, v) => e + 10 ** (v! / 10), 0)) : null;
    const { lowerHz, upperHz } = bandEdgesHz(OCTAVE.exactHz[k]!, 1);
    return { hz, lowerHz, upperHz, db };
  });
}
