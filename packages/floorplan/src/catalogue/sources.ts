import { A_WEIGHTING_DB, energySumDb, rounded } from "./bands.js";
import type { SourceNote } from "./types.js";

/** A typical source spectrum: band levels in the source space, dB re 20 µPa, 50–5000 Hz. */
export interface SourceSpectrum {
  id: string;
  name: string;
  kind: "airborne" | "impact";
  /** Band levels, dB; for impact sources an offset added to each floor's own Ln (0 = tapping-machine-like). */
  levelsDb: number[];
  /** Where the noise is usually kept: inside a room or outside the building. */
  typicalSpace: "room" | "outdoors" | "floor";
  source: SourceNote;
}

/** Band shape scaled so its energy sum is `overallDb`, dB. */
function scaledTo(shape: readonly number[], overallDb: number): number[] {
  const shift = overallDb - energySumDb(shape);
  return rounded(shape.map((v) => v + shift));
}

/** A-weighted band shape scaled so its A-weighted sum is `dba` and returned unweighted, dB. */
function fromAWeighted(shapeA: readonly number[], dba: number): number[] {
  const shift = dba - energySumDb(shapeA);
  return rounded(shapeA.map((v, i) => v + shift - A_WEIGHTING_DB[i]!));
}

// Long-term speech: strongest 250–500 Hz, falling about 5 dB per octave above 1 kHz and steeply
// below 160 Hz (a typical shape; the overall levels are the published part).
const SPEECH_SHAPE = [-32, -27, -20, -13, -8, -4, -2, 0, 0, -1, -1.5, -3, -4.5, -6, -7, -8.5, -10, -11, -12.5, -14, -16];
// ISO 717-1 spectrum No. 2 (urban road traffic, A-weighted, for Ctr), 50–5000 Hz extension from memory.
const TRAFFIC_A = [-25, -23, -21, -20, -20, -18, -16, -15, -14, -13, -12, -11, -9, -8, -9, -10, -11, -13, -15, -16, -18];

/** Typical source spectra for diagnosis when nothing was measured. */
export const sourceLibrary: SourceSpectrum[] = [
  {
    id: "speech-normal", name: "Normal speech", kind: "airborne", typicalSpace: "room",
    levelsDb: scaledTo(SPEECH_SHAPE, 62.35),
    source: { kind: "typical", note: "Overall 62.35 dB at 1 m for normal vocal effort (ANSI S3.5-1997); the band shape is a typical long-term speech spectrum (assumption)." },
  },
  {
    id: "speech-raised", name: "Raised speech", kind: "airborne", typicalSpace: "room",
    levelsDb: scaledTo(SPEECH_SHAPE, 68.34),
    source: { kind: "typical", note: "Overall 68.34 dB at 1 m for raised vocal effort (ANSI S3.5-1997); the band shape is a typical long-term speech spectrum (assumption)." },
  },
  {
    id: "music-amplified-bass", name: "Amplified music with strong bass", kind: "airborne", typicalSpace: "room",
    levelsDb: rounded([96, 98, 98, 97, 95, 93, 91, 90, 89, 88, 88, 87, 86, 86, 85, 84, 83, 82, 80, 78, 76]),
    source: { kind: "typical", note: "A typical assumption for a rehearsal room or party at about 100 dB(C), bass 50–100 Hz highest. Not a measurement." },
  },
  {
    id: "cinema-bass", name: "Home cinema with subwoofer", kind: "airborne", typicalSpace: "room",
    levelsDb: rounded([100, 101, 100, 97, 93, 90, 88, 86, 85, 84, 84, 83, 83, 82, 82, 81, 80, 79, 78, 77, 75]),
    source: { kind: "typical", note: "A typical assumption near cinema reference level (85 dB(C) per channel, peaks to 105 dB and the low-frequency channel to 115 dB in the cinema standard), sustained passages with the subwoofer. Not a measurement." },
  },
  {
    id: "television", name: "Television at a living-room level", kind: "airborne", typicalSpace: "room",
    levelsDb: scaledTo(SPEECH_SHAPE.map((v, i) => v + (i < 4 ? 8 : 0)), 70),
    source: { kind: "typical", note: "A typical assumption: speech-like spectrum with some added bass, 70 dB overall. Not a measurement." },
  },
  {
    id: "traffic-urban", name: "Urban road traffic outside a façade", kind: "airborne", typicalSpace: "outdoors",
    levelsDb: fromAWeighted(TRAFFIC_A, 72),
    source: { kind: "typical", note: "Band shape of ISO 717-1 spectrum No. 2 (urban road traffic; 50–80 and 4000–5000 Hz from memory), set to a typical 72 dB(A) at a city-street façade (assumption)." },
  },
  {
    id: "tram-wheel-squeal", name: "Tram passing with wheel squeal", kind: "airborne", typicalSpace: "outdoors",
    levelsDb: fromAWeighted(TRAFFIC_A.map((v, i) => v + ([0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 2, 6, 10, 12, 10, 6, 2, 0][i] ?? 0)), 80),
    source: { kind: "typical", note: "ISO 717-1 spectrum No. 2 shape with a tonal squeal added at 1.25–3.15 kHz, 80 dB(A) at the shopfront during a pass-by. A typical assumption, not a measurement." },
  },
  {
    id: "machinery-hum", name: "Machinery hum (compressor, condenser, pump)", kind: "airborne", typicalSpace: "room",
    levelsDb: rounded([78, 74, 70, 80, 72, 68, 66, 65, 63, 61, 60, 58, 56, 55, 53, 51, 49, 47, 45, 43, 41]),
    source: { kind: "typical", note: "A typical assumption: broadband machine noise with a strong 100 Hz tone (twice a 50 Hz mains frequency). Not a measurement." },
  },
  {
    id: "impact-tapping", name: "Footfall and dropped objects (tapping-machine-like)", kind: "impact", typicalSpace: "floor",
    levelsDb: new Array(21).fill(0),
    source: { kind: "typical", note: "Each floor's own normalized impact level Ln, as under the ISO standard tapping machine; real footfall differs, heavier in the bass on lightweight floors." },
  },
];

/** One library spectrum by id, or undefined (no unit). */
export function sourceSpectrum(id: string): SourceSpectrum | undefined {
  return sourceLibrary.find((s) => s.id === id);
}
