/**
 * Finding the events in a long recording: stretches where the A-weighted level rises a set margin
 * above the background (L90) for at least a set time. Works on the 1 s history, so a week-long
 * recording costs one pass over ~600 000 numbers.
 */
import { THIRD_OCTAVE } from "../bands/bands.js";
import type { LevelHistory } from "./band-analyzer.js";

export interface EventOptions {
  /** Background level in dB (usually LA90 of the recording). */
  backgroundDb: number;
  /** How far above the background the level must rise, in dB. Default 10. */
  marginDb?: number;
  /** The shortest stretch that counts, in seconds. Default 2. */
  minDurationS?: number;
  /** Stretches separated by at most this many seconds below the threshold join into one. Default 1. */
  joinGapS?: number;
  /** At most this many events, the loudest kept. Default 200. */
  limit?: number;
}

export interface NoiseEvent {
  startS: number;
  durationS: number;
  /** Highest A-weighted fast level during the event, dB. */
  peakDb: number;
  /** A-weighted Leq over the event, dB. */
  leqDb: number;
  /** Nominal mid-frequency (Hz) of the band with the most energy during the event. */
  dominantBandHz: number | null;
}

/** Events in a level history (times in seconds from the start of the recording). */
export function detectEvents(history: LevelHistory, options: EventOptions): NoiseEvent[] {
  const margin = options.marginDb ?? 10;
  const minDuration = options.minDurationS ?? 2;
  const joinGap = options.joinGapS ?? 1;
  const threshold = options.backgroundDb + margin;
  const step = history.stepS;
  const stretches: [number, number][] = [];
  let start = -1;
  let lastAbove = -1;
  for (let i = 0; i <= history.laeqDb.length; i++) {
    const above = i < history.laeqDb.length && history.laeqDb[i]! > threshold;
    if (above) {
      if (start < 0) start = i;
      else if ((i - lastAbove - 1) * step > joinGap) {
        stretches.push([start, lastAbove]);
        start = i;
      }
      lastAbove = i;
    } else if (start >= 0 && ((i - lastAbove) * step > joinGap || i === history.laeqDb.length)) {
      stretches.push([start, lastAbove]);
      start = -1;
    }
  }
  const events = stretches
    .filter(([a, b]) => (b - a + 1) * step >= minDuration)
    .map(([a, b]) => eventOf(history, a, b));
  if (events.length <= (options.limit ?? 200)) return events;
  return events
    .sort((x, y) => y.peakDb - x.peakDb)
    .slice(0, options.limit ?? 200)
    .sort((x, y) => x.startS - y.startS);
}

function eventOf(history: LevelHistory, first: number, last: number): NoiseEvent {
  let peak = -Infinity;
  let aEnergy = 0;
  const bandEnergy = new Float64Array(THIRD_OCTAVE.nominalHz.length);
  for (let i = first; i <= last; i++) {
    peak = Math.max(peak, history.lafmaxDb[i] ?? -Infinity);
    aEnergy += Math.pow(10, (history.laeqDb[i] ?? -Infinity) / 10);
    const bands = history.bandsDb[i] ?? [];
    bands.forEach((l, b) => {
      if (l !== null) bandEnergy[b]! += Math.pow(10, l / 10);
    });
  }
  let dominant = -1;
  bandEnergy.forEach((e, b) => {
    if (e > 0 && (dominant < 0 || e > bandEnergy[dominant]!)) dominant = b;
  });
  const n = last - first + 1;
  return {
    startS: first * history.stepS,
    durationS: n * history.stepS,
    peakDb: Math.round(peak * 10) / 10,
    leqDb: Math.round(10 * Math.log10(aEnergy / n) * 10) / 10,
    dominantBandHz: dominant >= 0 ? (THIRD_OCTAVE.nominalHz[dominant] ?? null) : null,
  };
}
