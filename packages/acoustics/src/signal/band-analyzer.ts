/**
 * Streaming one-third-octave analysis of PCM samples (50–5000 Hz, IEC 61260-1 band edges).
 *
 * Each band is a 6-pole Butterworth band-pass (three biquads) between the exact band edges.
 * Low bands run at a decimated rate: the signal passes a 4th-order low-pass at 0.15·rate and
 * every second sample is kept, octave by octave, until a band's upper edge is at most 1/8 of
 * its stage's rate. That keeps the filters well conditioned and the cost near three bands' worth
 * per input sample. Fast time weighting (τ = 125 ms, IEC 61672-1) gives Lmax; energy means give
 * Leq; statistical levels come from fixed histograms of the fast level sampled 40 times a
 * second, so memory does not grow with the recording — except the 1 s history, which is the
 * output itself (23 numbers per second).
 *
 * Levels are in dB re full-scale: a sample value of ±1 held constant is 0 dB, so a full-scale
 * sine is −3.01 dB; `calibrationDb` is added to every level to turn that into sound pressure level.
 * A-weighted figures are band sums with the A-weights at the exact mid-frequencies, so they cover
 * 50–5000 Hz only.
 */
import { THIRD_OCTAVE, bandEdgesHz } from "../bands/bands.js";
import { aWeightsLinear } from "../bands/weighting.js";
import { Cascade, butterworthBandPass, butterworthLowPass } from "./butterworth.js";
import { LevelHistogram } from "./level-histogram.js";

/** Fast time constant in seconds (IEC 61672-1:2013, 5.8). */
export const FAST_TIME_CONSTANT_S = 0.125;
/** Fast-level samples per second for the statistical levels and the per-second maxima. */
export const TICKS_PER_SECOND = 40;
/** A band is analysed only when its upper edge is below this fraction of the sample rate. */
const MAX_EDGE_FRACTION = 0.45;
const STAGE_EDGE_FRACTION = 0.125;
const DECIMATION_CUTOFF_FRACTION = 0.15;
const ENERGY_FLOOR = 1e-20;

export interface BandAnalyzerOptions {
  sampleRateHz: number;
  /** dB added to every level (sound pressure level of a full-scale constant). Default 0. */
  calibrationDb?: number;
  /** Keep the 1 s history (default true). */
  keepHistory?: boolean;
}

/** Levels per second: A-weighted Leq over the second, the highest A-weighted fast level in it, and band Leqs. */
export interface LevelHistory {
  stepS: number;
  laeqDb: number[];
  lafmaxDb: number[];
  /** One array of 21 band levels per second (null for bands above the file's range). */
  bandsDb: (number | null)[][];
}

export interface BandAnalysis {
  sampleRateHz: number;
  durationS: number;
  calibrationDb: number;
  bandsHz: number[];
  leqDb: (number | null)[];
  lmaxDb: (number | null)[];
  l10Db: (number | null)[];
  l90Db: (number | null)[];
  laeqDb: number | null;
  lafmaxDb: number | null;
  la10Db: number | null;
  la90Db: number | null;
  history: LevelHistory | null;
}

/** The live state: current fast levels, the peak hold and the running Leq, per band. */
export interface BandSnapshot {
  durationS: number;
  fastDb: (number | null)[];
  lmaxDb: (number | null)[];
  leqDb: (number | null)[];
  lafDb: number | null;
  laeqDb: number | null;
}

interface Stage {
  rateHz: number;
  bands: number[];
  alpha: number;
  lowPass: Cascade | null;
  phase: number;
  input: Float64Array;
  length: number;
}

const toDb = (e: number) => 10 * Math.log10(Math.max(e, ENERGY_FLOOR));

/** One-third-octave band analyzer over a stream of mono samples; feed blocks of any size, then finish. */
export class BandAnalyzer {
  readonly sampleRateHz: number;
  readonly calibrationDb: number;
  private readonly count = THIRD_OCTAVE.nominalHz.length;
  private readonly available: boolean[];
  private readonly filters: (Cascade | null)[];
  private readonly stages: Stage[];
  private readonly aWeights = aWeightsLinear("third-octave");
  private readonly scratch: Float64Array;
  private readonly fast: Float64Array;
  private readonly maxFast: Float64Array;
  private readonly energy: Float64Array;
  private readonly samples: Float64Array;
  private readonly secEnergy: Float64Array;
  private readonly secSamples: Float64Array;
  private readonly bandHistograms: LevelHistogram[];
  private readonly aHistogram = new LevelHistogram();
  private readonly history: LevelHistory | null;
  private baseSamples = 0;
  private tick = 0;
  private nextTickAt: number;
  private secMaxA = -Infinity;
  private maxA = -Infinity;
  private ticksInSecond = 0;

  constructor(options: BandAnalyzerOptions) {
    const fs = options.sampleRateHz;
    if (!Number.isFinite(fs) || fs < 4000) throw new RangeError("sample rate must be at least 4000 Hz");
    this.sampleRateHz = fs;
    this.calibrationDb = options.calibrationDb ?? 0;
    const n = this.count;
    const edges = THIRD_OCTAVE.exactHz.map((f) => bandEdgesHz(f, 3));
    this.available = edges.map((e) => e.upperHz < MAX_EDGE_FRACTION * fs);
    const stageOf = edges.map((e) => Math.max(0, Math.floor(Math.log2((STAGE_EDGE_FRACTION * fs) / e.upperHz))));
    const stageCount = Math.max(1, ...stageOf.filter((_, i) => this.available[i]).map((k) => k + 1));
    const maxPiece = Math.ceil(fs / TICKS_PER_SECOND) + 2;
    this.stages = Array.from({ length: stageCount }, (_, k) => {
      const rateHz = fs / 2 ** k;
      return {
        rateHz,
        bands: stageOf.flatMap((s, b) => (s === k && this.available[b] ? [b] : [])),
        alpha: 1 - Math.exp(-1 / (FAST_TIME_CONSTANT_S * rateHz)),
        lowPass: k < stageCount - 1 ? new Cascade(butterworthLowPass(DECIMATION_CUTOFF_FRACTION * rateHz, rateHz, 4)) : null,
        phase: 0,
        input: new Float64Array(maxPiece),
        length: 0,
      };
    });
    this.filters = edges.map((e, b) => (this.available[b] ? new Cascade(butterworthBandPass(e.lowerHz, e.upperHz, fs / 2 ** stageOf[b]!, 3)) : null));
    this.scratch = new Float64Array(maxPiece);
    this.fast = new Float64Array(n);
    this.maxFast = new Float64Array(n);
    this.energy = new Float64Array(n);
    this.samples = new Float64Array(n);
    this.secEnergy = new Float64Array(n);
    this.secSamples = new Float64Array(n);
    this.bandHistograms = Array.from({ length: n }, () => new LevelHistogram());
    this.history = options.keepHistory === false ? null : { stepS: 1, laeqDb: [], lafmaxDb: [], bandsDb: [] };
    this.nextTickAt = Math.round(fs / TICKS_PER_SECOND);
  }

  /** Seconds of signal fed so far. */
  get durationS(): number {
    return this.baseSamples / this.sampleRateHz;
  }

  /** Feeds mono samples (full scale ±1). */
  feed(samples: ArrayLike<number>): void {
    let offset = 0;
    while (offset < samples.length) {
      const take = Math.min(samples.length - offset, this.nextTickAt - this.baseSamples);
      const first = this.stages[0]!;
      for (let i = 0; i < take; i++) first.input[i] = samples[offset + i]!;
      first.length = take;
      this.processPiece();
      offset += take;
      this.baseSamples += take;
      if (this.baseSamples === this.nextTickAt) this.onTick();
    }
  }

  private processPiece(): void {
    const y = this.scratch;
    for (let k = 0; k < this.stages.length; k++) {
      const stage = this.stages[k]!;
      const len = stage.length;
      for (const b of stage.bands) {
        this.filters[b]!.process(stage.input, y, len);
        const alpha = stage.alpha;
        let fast = this.fast[b]!;
        let maxFast = this.maxFast[b]!;
        let sum = 0;
        for (let i = 0; i < len; i++) {
          const e = y[i]! * y[i]!;
          sum += e;
          fast += alpha * (e - fast);
          if (fast > maxFast) maxFast = fast;
        }
        this.fast[b] = fast;
        this.maxFast[b] = maxFast;
        this.energy[b]! += sum;
        this.samples[b]! += len;
        this.secEnergy[b]! += sum;
        this.secSamples[b]! += len;
      }
      const next = this.stages[k + 1];
      if (!next || !stage.lowPass) continue;
      stage.lowPass.process(stage.input, y, len);
      let out = 0;
      for (let i = (2 - stage.phase) % 2; i < len; i += 2) next.input[out++] = y[i]!;
      stage.phase = (stage.phase + len) % 2;
      next.length = out;
    }
  }

  private fastA(): number {
    let e = 0;
    for (let b = 0; b < this.count; b++) if (this.available[b]) e += this.fast[b]! * this.aWeights[b]!;
    return toDb(e);
  }

  private onTick(): void {
    this.tick += 1;
    this.ticksInSecond += 1;
    // The fast integrator starts from silence; the first 5τ would bias the statistics low.
    const settled = this.baseSamples / this.sampleRateHz >= 5 * FAST_TIME_CONSTANT_S;
    const laf = this.fastA();
    if (settled) {
      this.aHistogram.add(laf);
      for (let b = 0; b < this.count; b++) if (this.available[b]) this.bandHistograms[b]!.add(toDb(this.fast[b]!));
    }
    this.secMaxA = Math.max(this.secMaxA, laf);
    this.maxA = Math.max(this.maxA, laf);
    if (this.tick % TICKS_PER_SECOND === 0) this.closeSecond();
    this.nextTickAt = Math.round(((this.tick + 1) * this.sampleRateHz) / TICKS_PER_SECOND);
  }

  private closeSecond(): void {
    if (this.history && this.ticksInSecond > 0) {
      const cal = this.calibrationDb;
      const bands: (number | null)[] = [];
      let a = 0;
      for (let b = 0; b < this.count; b++) {
        if (!this.available[b] || this.secSamples[b] === 0) {
          bands.push(null);
          continue;
        }
        const mean = this.secEnergy[b]! / this.secSamples[b]!;
        a += mean * this.aWeights[b]!;
        bands.push(round2(toDb(mean) + cal));
      }
      this.history.bandsDb.push(bands);
      this.history.laeqDb.push(round2(toDb(a) + cal));
      this.history.lafmaxDb.push(round2(this.secMaxA + cal));
    }
    this.secEnergy.fill(0);
    this.secSamples.fill(0);
    this.secMaxA = -Infinity;
    this.ticksInSecond = 0;
  }

  private perBand(value: (b: number) => number | null): (number | null)[] {
    return Array.from({ length: this.count }, (_, b) => {
      if (!this.available[b]) return null;
      const v = value(b);
      return v === null ? null : round2(v + this.calibrationDb);
    });
  }

  /** The live state (for a display that refreshes while samples arrive). */
  snapshot(): BandSnapshot {
    const leq = this.perBand((b) => (this.samples[b]! > 0 ? toDb(this.energy[b]! / this.samples[b]!) : null));
    let a = 0;
    for (let b = 0; b < this.count; b++) if (this.available[b] && this.samples[b]! > 0) a += (this.energy[b]! / this.samples[b]!) * this.aWeights[b]!;
    return {
      durationS: this.durationS,
      fastDb: this.perBand((b) => toDb(this.fast[b]!)),
      lmaxDb: this.perBand((b) => toDb(this.maxFast[b]!)),
      leqDb: leq,
      lafDb: this.baseSamples > 0 ? round2(this.fastA() + this.calibrationDb) : null,
      laeqDb: this.baseSamples > 0 ? round2(toDb(a) + this.calibrationDb) : null,
    };
  }

  /** Closes the last (partial) second and answers the analysis. */
  finish(): BandAnalysis {
    if (this.ticksInSecond > 0 || this.secSamples.some((s) => s > 0)) {
      if (this.ticksInSecond === 0) this.ticksInSecond = 1;
      this.closeSecond();
    }
    const snap = this.snapshot();
    const cal = this.calibrationDb;
    const withCal = (v: number | null) => (v === null ? null : round2(v + cal));
    return {
      sampleRateHz: this.sampleRateHz,
      durationS: this.durationS,
      calibrationDb: cal,
      bandsHz: [...THIRD_OCTAVE.nominalHz],
      leqDb: snap.leqDb,
      lmaxDb: snap.lmaxDb,
      l10Db: this.perBand((b) => this.bandHistograms[b]!.exceededDb(10)),
      l90Db: this.perBand((b) => this.bandHistograms[b]!.exceededDb(90)),
      laeqDb: snap.laeqDb,
      lafmaxDb: Number.isFinite(this.maxA) ? round2(this.maxA + cal) : null,
      la10Db: withCal(this.aHistogram.exceededDb(10)),
      la90Db: withCal(this.aHistogram.exceededDb(90)),
      history: this.history,
    };
  }
}

function round2(v: number): number {
  return Math.round(v * 100) / 100;
}
