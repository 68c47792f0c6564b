import { describe, expect, it } from "vitest";
import { THIRD_OCTAVE, bandEdgesHz } from "../bands/bands.js";
import { BandAnalyzer, type BandAnalysis } from "./band-analyzer.js";
import { butterworthBandPass, butterworthLowPass, sectionsResponse } from "./butterworth.js";
import { detectEvents } from "./events.js";
import { pinkNoise, sineSamples, whiteNoise } from "./test-signals.js";

const band = (hz: number) => THIRD_OCTAVE.nominalHz.indexOf(hz);
const energySum = (levels: readonly (number | null)[]) => 10 * Math.log10(levels.reduce<number>((s, l) => s + (l === null ? 0 : 10 ** (l / 10)), 0));

/** Feeds `seconds` of a generator in 0.1 s blocks and answers the analysis. */
function analyse(gen: (count: number, start: number) => Float64Array, seconds: number, sampleRateHz = 48_000, calibrationDb = 0): BandAnalysis {
  const a = new BandAnalyzer({ sampleRateHz, calibrationDb });
  const block = Math.round(sampleRateHz / 10);
  for (let start = 0; start < seconds * sampleRateHz; start += block) a.feed(gen(Math.min(block, seconds * sampleRateHz - start), start));
  return a.finish();
}

describe("band filters", () => {
  it("band-pass filters are 3 dB down at the IEC 61260-1 band edges and unity at the centre", () => {
    // Butterworth response at its design edges is 1/√2 (−3.01 dB) [derived]; edges per IEC 61260-1:2014, eq. 3–4.
    for (const fs of [44_100, 48_000]) {
      const { lowerHz, upperHz } = bandEdgesHz(1000, 3);
      const s = butterworthBandPass(lowerHz, upperHz, fs);
      expect(20 * Math.log10(sectionsResponse(s, 1000, fs))).toBeCloseTo(0, 6);
      expect(20 * Math.log10(sectionsResponse(s, lowerHz, fs))).toBeCloseTo(-3.01, 2);
      expect(20 * Math.log10(sectionsResponse(s, upperHz, fs))).toBeCloseTo(-3.01, 2);
      // An octave away the 6-pole band-pass is far down (about 49 dB [derived]).
      expect(20 * Math.log10(sectionsResponse(s, 2000, fs))).toBeLessThan(-40);
    }
  });

  it("the decimation low-pass keeps its pass band and rejects what would fold back", () => {
    const fs = 48_000;
    const s = butterworthLowPass(0.15 * fs, fs, 4);
    expect(Math.abs(20 * Math.log10(sectionsResponse(s, 0.0625 * fs, fs)))).toBeLessThan(0.01);
    expect(20 * Math.log10(sectionsResponse(s, 0.4375 * fs, fs))).toBeLessThan(-70);
  });
});

describe("band analysis of generated signals", () => {
  it("puts a 1 kHz sine of RMS 0.1 in the 1 kHz band at −20 dB (within 0.5 dB), with the calibration offset added", () => {
    const r = analyse((n, start) => sineSamples(1000, 0.1, 48_000, n, start), 5, 48_000, 94);
    expect(Math.abs(r.leqDb[band(1000)]! - 74)).toBeLessThan(0.5);
    for (const hz of [800, 1250]) expect(r.leqDb[band(hz)]!).toBeLessThan(74 - 15);
    // A steady tone: the fast maximum and the statistical levels sit on the Leq.
    expect(Math.abs(r.lmaxDb[band(1000)]! - 74)).toBeLessThan(0.5);
    expect(Math.abs(r.l90Db[band(1000)]! - 74)).toBeLessThan(0.5);
    expect(r.history!.laeqDb).toHaveLength(5);
  });

  it("finds tones in every band at every common sample rate", () => {
    for (const fs of [8_000, 16_000, 22_050, 44_100, 48_000, 96_000]) {
      for (const hz of [50, 125, 500, 2000, 3150]) {
        if (bandEdgesHz(hz, 3).upperHz > 0.45 * fs) continue;
        const r = analyse((n, start) => sineSamples(hz, 0.05, fs, n, start), 2, fs);
        expect(Math.abs(r.leqDb[band(hz)]! - 20 * Math.log10(0.05)), `${hz} Hz at ${fs} Hz`).toBeLessThan(0.5);
      }
    }
  });

  it("leaves bands above a low sample rate's range empty rather than wrong", () => {
    const r = analyse((n) => new Float64Array(n), 1, 8_000);
    expect(r.leqDb[band(4000)]).toBeNull();
    expect(r.leqDb[band(5000)]).toBeNull();
    expect(r.leqDb[band(1000)]).not.toBeNull();
  });

  it("gives pink noise equal energy per one-third-octave band within 1 dB", () => {
    const pink = pinkNoise(20261201, 0.1);
    const r = analyse((n) => pink(n), 60, 44_100);
    const levels = r.leqDb as number[];
    const mean = energySum(levels) - 10 * Math.log10(levels.length);
    for (const [i, l] of levels.entries()) expect(Math.abs(l - mean), `${THIRD_OCTAVE.nominalHz[i]} Hz`).toBeLessThan(1);
  });

  it("gives white noise a rise of 10·lg(G^(1/3)) ≈ 1.0 dB per band", () => {
    const white = whiteNoise(7, 0.1);
    const r = analyse((n) => white(n), 40);
    const levels = r.leqDb as number[];
    const step = 10 * Math.log10(Math.pow(10, 0.1)); // bandwidth ratio of adjacent bands is G^(1/3) = 10^(0.1) [derived]
    const xs = levels.map((_, i) => i);
    const mx = xs.reduce((a, b) => a + b) / xs.length;
    const my = levels.reduce((a, b) => a + b) / levels.length;
    const slope = xs.reduce((s, x, i) => s + (x - mx) * (levels[i]! - my), 0) / xs.reduce((s, x) => s + (x - mx) ** 2, 0);
    expect(Math.abs(slope - step)).toBeLessThan(0.05);
    for (const [i, l] of levels.entries()) expect(Math.abs(l - (my + slope * (i - mx)))).toBeLessThan(1);
  });

  it("weights a 100 Hz tone down by the IEC 61672-1 A-weighting at 100 Hz", () => {
    const r = analyse((n, start) => sineSamples(100, 0.1, 48_000, n, start), 4, 48_000, 90);
    const unweighted = energySum(r.leqDb);
    // IEC 61672-1:2013, Table 3: A-weighting at 100 Hz is −19.1 dB.
    expect(unweighted - r.laeqDb!).toBeCloseTo(19.1, 0);
    expect(Math.abs(unweighted - r.laeqDb! - 19.1)).toBeLessThan(0.2);
  });

  it("answers the same whatever the block size (streaming keeps its state)", () => {
    const fs = 22_050;
    const noise = whiteNoise(3, 0.2)(fs * 3);
    const whole = new BandAnalyzer({ sampleRateHz: fs });
    whole.feed(noise);
    const pieces = new BandAnalyzer({ sampleRateHz: fs });
    for (let i = 0; i < noise.length; ) {
      const n = 1 + ((i * 7919) % 1500);
      pieces.feed(noise.subarray(i, i + n));
      i += n;
    }
    const a = whole.finish();
    const b = pieces.finish();
    a.leqDb.forEach((l, i) => expect(b.leqDb[i]).toBeCloseTo(l!, 6));
    expect(b.la90Db).toBe(a.la90Db);
    expect(b.history!.laeqDb).toEqual(a.history!.laeqDb);
  });

  it("shows the fast time weighting's response to short tone bursts", () => {
    // Response of exponential averaging to a burst of length T: 10·lg(1 − e^(−T/τ)) [derived from the
    // definition in IEC 61672-1:2013, 5.8]; 200 ms → −1.0 dB, 100 ms → −2.6 dB (Table 4, from memory).
    for (const [ms, expected] of [[1000, 0], [200, -0.98], [100, -2.59]] as const) {
      const fs = 48_000;
      const burstStart = fs;
      const burstEnd = fs + (fs * ms) / 1000;
      const r = analyse((n, start) => {
        const x = sineSamples(1000, 0.1, fs, n, start);
        for (let i = 0; i < n; i++) if (start + i < burstStart || start + i >= burstEnd) x[i] = 0;
        return x;
      }, 3, fs);
      expect(Math.abs(r.lmaxDb[band(1000)]! - (-20 + expected)), `${ms} ms`).toBeLessThan(0.3);
    }
  });

  it("reads L10 and L90 from the time the level spends above them", () => {
    // 7 s at a low level, 3 s at a level 20 dB higher: L90 is the low level, L10 the high one.
    const fs = 16_000;
    const r = analyse((n, start) => sineSamples(500, start >= 7 * fs ? 0.1 : 0.01, fs, n, start), 10, fs);
    expect(Math.abs(r.l90Db[band(500)]! - -40)).toBeLessThan(0.5);
    expect(Math.abs(r.l10Db[band(500)]! - -20)).toBeLessThan(0.5);
    expect(r.la10Db! - r.la90Db!).toBeGreaterThan(19);
  });
});

describe("events", () => {
  it("finds bursts injected into a quiet background at their times, with their band", () => {
    const fs = 16_000;
    const bursts = [
      { at: 12, len: 3, hz: 500 },
      { at: 47, len: 6, hz: 160 },
      { at: 80, len: 2, hz: 2000 },
    ];
    const pink = pinkNoise(99, 0.005);
    const r = analyse((n, start) => {
      const x = pink(n);
      for (const b of bursts) {
        const from = b.at * fs;
        const to = (b.at + b.len) * fs;
        if (start + n <= from || start >= to) continue;
        const tone = sineSamples(b.hz, 0.2, fs, n, start);
        for (let i = 0; i < n; i++) if (start + i >= from && start + i < to) x[i]! += tone[i]!;
      }
      return x;
    }, 100, fs);
    const events = detectEvents(r.history!, { backgroundDb: r.la90Db!, marginDb: 10, minDurationS: 2 });
    expect(events).toHaveLength(3);
    events.forEach((e, i) => {
      const b = bursts[i]!;
      expect(Math.abs(e.startS - b.at)).toBeLessThanOrEqual(1);
      expect(Math.abs(e.durationS - b.len)).toBeLessThanOrEqual(1);
      expect(e.dominantBandHz).toBe(b.hz);
      expect(e.peakDb).toBeGreaterThan(r.la90Db! + 20);
    });
    // A margin above every burst finds nothing; a longer minimum drops the short ones.
    expect(detectEvents(r.history!, { backgroundDb: r.la90Db!, marginDb: 80 })).toHaveLength(0);
    expect(detectEvents(r.history!, { backgroundDb: r.la90Db!, minDurationS: 5 }).map((e) => e.startS)).toEqual([47]);
  });
});
