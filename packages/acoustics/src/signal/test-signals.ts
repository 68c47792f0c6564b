/**
 * Reproducible test signals: a seeded generator (no Math.random in the engine), tones, white and
 * pink noise. Used by the tests here and by other packages' tests and fixtures.
 */

/** A small seeded pseudo-random generator (mulberry32), uniform in [0, 1). */
export function seededRandom(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** Standard normal samples (Box–Muller) from a uniform generator. */
export function gaussian(random: () => number): () => number {
  let spare: number | null = null;
  return () => {
    if (spare !== null) {
      const s = spare;
      spare = null;
      return s;
    }
    const u = Math.max(random(), 1e-300);
    const v = random();
    const r = Math.sqrt(-2 * Math.log(u));
    spare = r * Math.sin(2 * Math.PI * v);
    return r * Math.cos(2 * Math.PI * v);
  };
}

/** A sine of the given frequency in Hz and RMS value (full-scale units). */
export function sineSamples(frequencyHz: number, rms: number, sampleRateHz: number, count: number, startSample = 0): Float64Array {
  const out = new Float64Array(count);
  const amp = rms * Math.SQRT2;
  for (let i = 0; i < count; i++) out[i] = amp * Math.sin((2 * Math.PI * frequencyHz * (i + startSample)) / sampleRateHz);
  return out;
}

/** A white-noise source of the given RMS (Gaussian samples). */
export function whiteNoise(seed: number, rms: number): (count: number) => Float64Array {
  const g = gaussian(seededRandom(seed));
  return (count) => Float64Array.from({ length: count }, () => rms * g());
}

/**
 * A pink-noise source (−3 dB per octave) of roughly the given RMS: white noise through a sum of
 * first-order low-passes (a well-known economical filter, coefficients for 44.1–48 kHz; its
 * flatness within about ±0.5 dB over 10 Hz–20 kHz is from memory and is what the band test checks).
 */
export function pinkNoise(seed: number, rms: number): (count: number) => Float64Array {
  const g = gaussian(seededRandom(seed));
  let b0 = 0, b1 = 0, b2 = 0, b3 = 0, b4 = 0, b5 = 0, b6 = 0;
  const scale = rms * 0.11;
  return (count) => {
    const out = new Float64Array(count);
    for (let i = 0; i < count; i++) {
      const w = g();
      b0 = 0.99886 * b0 + w * 0.0555179;
      b1 = 0.99332 * b1 + w * 0.0750759;
      b2 = 0.969 * b2 + w * 0.153852;
      b3 = 0.8665 * b3 + w * 0.3104856;
      b4 = 0.55 * b4 + w * 0.5329522;
      b5 = -0.7616 * b5 - w * 0.016898;
      out[i] = (b0 + b1 + b2 + b3 + b4 + b5 + b6 + w * 0.5362) * scale;
      b6 = w * 0.115926;
    }
    return out;
  };
}
