/**
 * Butterworth filters as cascades of second-order sections, designed in the analog domain and
 * mapped with the pre-warped bilinear transform so the band edges land exactly where asked.
 */

/** One second-order section, y = (b0 + b1 z⁻¹ + b2 z⁻²)/(1 + a1 z⁻¹ + a2 z⁻²)·x. */
export interface Section {
  b0: number;
  b1: number;
  b2: number;
  a1: number;
  a2: number;
}

interface Complex {
  re: number;
  im: number;
}

const mul = (a: Complex, b: Complex): Complex => ({ re: a.re * b.re - a.im * b.im, im: a.re * b.im + a.im * b.re });
const div = (a: Complex, b: Complex): Complex => {
  const d = b.re * b.re + b.im * b.im;
  return { re: (a.re * b.re + a.im * b.im) / d, im: (a.im * b.re - a.re * b.im) / d };
};
const sqrtC = (a: Complex): Complex => {
  const r = Math.hypot(a.re, a.im);
  const re = Math.sqrt((r + a.re) / 2);
  const im = Math.sign(a.im || 1) * Math.sqrt(Math.max(0, (r - a.re) / 2));
  return { re, im };
};

/** Poles of the analog Butterworth low-pass prototype of order n (unit cut-off, left half plane). */
function prototypePoles(order: number): Complex[] {
  return Array.from({ length: order }, (_, k) => {
    const angle = (Math.PI * (2 * k + order + 1)) / (2 * order);
    return { re: Math.cos(angle), im: Math.sin(angle) };
  });
}

/** z = (1 + s/2fs)/(1 − s/2fs). */
function bilinear(s: Complex, sampleRateHz: number): Complex {
  const k = 2 * sampleRateHz;
  return div({ re: 1 + s.re / k, im: s.im / k }, { re: 1 - s.re / k, im: -s.im / k });
}

const prewarp = (fHz: number, sampleRateHz: number) => 2 * sampleRateHz * Math.tan((Math.PI * fHz) / sampleRateHz);

/** Denominator of a section from one pole of a conjugate pair (or two real poles). */
function denominator(z1: Complex, z2: Complex): { a1: number; a2: number } {
  const sum = { re: z1.re + z2.re, im: z1.im + z2.im };
  const prod = mul(z1, z2);
  return { a1: -sum.re, a2: prod.re };
}

/** Complex gain of a cascade at frequency f in Hz. */
export function sectionsResponse(sections: readonly Section[], fHz: number, sampleRateHz: number): number {
  const w = (2 * Math.PI * fHz) / sampleRateHz;
  const z1 = { re: Math.cos(-w), im: Math.sin(-w) };
  const z2 = { re: Math.cos(-2 * w), im: Math.sin(-2 * w) };
  let gain: Complex = { re: 1, im: 0 };
  for (const s of sections) {
    const num = { re: s.b0 + s.b1 * z1.re + s.b2 * z2.re, im: s.b1 * z1.im + s.b2 * z2.im };
    const den = { re: 1 + s.a1 * z1.re + s.a2 * z2.re, im: s.a1 * z1.im + s.a2 * z2.im };
    gain = mul(gain, div(num, den));
  }
  return Math.hypot(gain.re, gain.im);
}

/**
 * Band-pass Butterworth of the given prototype order (so 2·order poles) between lowerHz and
 * upperHz (the −3 dB edges), unity gain at the geometric centre. Order 3 meets the shape of
 * IEC 61260-1 class 1 filters in the pass band and near the edges.
 */
export function butterworthBandPass(lowerHz: number, upperHz: number, sampleRateHz: number, order = 3): Section[] {
  const w1 = prewarp(lowerHz, sampleRateHz);
  const w2 = prewarp(upperHz, sampleRateHz);
  const w0sq = w1 * w2;
  const bw = w2 - w1;
  const poles: Complex[] = [];
  for (const p of prototypePoles(order)) {
    // s² − p·B·s + ω0² = 0 for each prototype pole p (low-pass → band-pass).
    const pb = { re: p.re * bw, im: p.im * bw };
    const disc = sqrtC({ re: pb.re * pb.re - pb.im * pb.im - 4 * w0sq, im: 2 * pb.re * pb.im });
    poles.push({ re: (pb.re + disc.re) / 2, im: (pb.im + disc.im) / 2 }, { re: (pb.re - disc.re) / 2, im: (pb.im - disc.im) / 2 });
  }
  const upper = poles.filter((p) => p.im > 0);
  const sections: Section[] = upper.map((p) => {
    const z = bilinear(p, sampleRateHz);
    const { a1, a2 } = denominator(z, { re: z.re, im: -z.im });
    // Zeros of the band-pass: half at s = 0 (z = 1), half at infinity (z = −1): (1 − z⁻²) per section.
    return { b0: 1, b1: 0, b2: -1, a1, a2 };
  });
  normalise(sections, Math.sqrt(lowerHz * upperHz), sampleRateHz);
  return sections;
}

/** Low-pass Butterworth of even order with its −3 dB point at cutoffHz, unity gain at DC. */
export function butterworthLowPass(cutoffHz: number, sampleRateHz: number, order = 4): Section[] {
  if (order % 2 !== 0) throw new RangeError("low-pass order must be even");
  const wc = prewarp(cutoffHz, sampleRateHz);
  const sections = prototypePoles(order)
    .filter((p) => p.im > 0)
    .map((p) => {
      const z = bilinear({ re: p.re * wc, im: p.im * wc }, sampleRateHz);
      const { a1, a2 } = denominator(z, { re: z.re, im: -z.im });
      return { b0: 1, b1: 2, b2: 1, a1, a2 };
    });
  normalise(sections, 0, sampleRateHz);
  return sections;
}

function normalise(sections: Section[], atHz: number, sampleRateHz: number): void {
  const g = sectionsResponse(sections, atHz, sampleRateHz);
  const each = Math.pow(g, 1 / sections.length);
  for (const s of sections) {
    s.b0 /= each;
    s.b1 /= each;
    s.b2 /= each;
  }
}

/** A running cascade (transposed direct form II, two state values per section). */
export class Cascade {
  private readonly coef: Float64Array;
  private readonly state: Float64Array;
  constructor(sections: readonly Section[]) {
    this.coef = new Float64Array(sections.length * 5);
    sections.forEach((s, i) => this.coef.set([s.b0, s.b1, s.b2, s.a1, s.a2], i * 5));
    this.state = new Float64Array(sections.length * 2);
  }

  /** Filters `input[0..length)` into `output` (may be the same array). */
  process(input: Float64Array, output: Float64Array, length: number): void {
    const c = this.coef;
    const st = this.state;
    const n = c.length / 5;
    if (input !== output) output.set(input.subarray(0, length));
    for (let s = 0; s < n; s++) {
      const b0 = c[s * 5]!, b1 = c[s * 5 + 1]!, b2 = c[s * 5 + 2]!, a1 = c[s * 5 + 3]!, a2 = c[s * 5 + 4]!;
      let z1 = st[s * 2]!, z2 = st[s * 2 + 1]!;
      for (let i = 0; i < length; i++) {
        const x = output[i]!;
        const y = b0 * x + z1;
        z1 = b1 * x - a1 * y + z2;
        z2 = b2 * x - a2 * y;
        output[i] = y;
      }
      st[s * 2] = z1;
      st[s * 2 + 1] = z2;
    }
  }
}
