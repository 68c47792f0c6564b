import { BANDS_HZ, OCTAVES_HZ, rounded, thirdOctavesFromOctaves } from "./bands.js";
import type { Covering, Silencer } from "./types.js";

/** Covering improvement of the ISO 717-2 worked example, 100–3150 Hz (ΔLw 15 dB). */
const ISO_717_2_COVERING = [3.0, 3.7, 1.9, 3.0, 3.2, 3.5, 4.0, 6.1, 6.7, 7.0, 7.7, 10.8, 15.2, 20.3, 25.4, 23.2];

function extended(values16: readonly number[], low: number): number[] {
  const first = BANDS_HZ.indexOf(100);
  return BANDS_HZ.map((_, i) => (i < first ? low : values16[Math.min(15, i - first)]!));
}

/** Floor coverings: impact improvement ΔL per band 50–5000 Hz. */
export const coverings: Covering[] = [
  {
    id: "covering-carpet-underlay", name: "Carpet on foam underlay", thicknessMm: 18,
    deltaLDb: [0, 0, 1, 2, 3, 5, 8, 12, 16, 20, 24, 28, 32, 36, 40, 44, 47, 50, 52, 53, 54],
    source: { kind: "typical", note: "A typical improvement curve for carpet on foam underlay (from memory, not a test): little below 200 Hz, about 12 dB per octave above (ΔLw 24 dB by ISO 717-2). On a joist floor carpet and pad add roughly 25–30 IIC points (Harris, Handbook of Acoustical Measurements and Noise Control)." },
  },
  {
    id: "covering-iso-example", name: "Soft covering (the ISO 717-2 example)", thicknessMm: 5,
    deltaLDb: rounded(extended(ISO_717_2_COVERING, 0)),
    source: { kind: "published", note: "ΔL 100–3150 Hz of the ISO 717-2 worked example (ΔLw 15 dB); 50–80 Hz taken as 0 and 4000–5000 Hz held at the 3150 Hz value." },
  },
  {
    id: "covering-vinyl", name: "Vinyl sheet", thicknessMm: 2,
    deltaLDb: rounded(extended(ISO_717_2_COVERING, 0).map((v) => v * 0.3)),
    source: { kind: "typical", note: "ISO 717-2 example shape scaled to 30 % (ΔLw 5 dB), a typical assumption for thin resilient sheet." },
  },
];

/** Duct silencers and baffles: insertion loss per band 50–5000 Hz. */
export const silencers: Silencer[] = [
  {
    id: "silencer-splitter-900", name: "Splitter silencer, 900 mm", lengthM: 0.9,
    insertionLossDb: rounded(thirdOctavesFromOctaves(OCTAVES_HZ, [4, 7, 13, 21, 27, 27, 20, 15])),
    source: { kind: "typical", note: "Octave insertion loss of a typical 900 mm splitter silencer (a typical assumption, not a product test), interpolated to third-octave bands." },
  },
  {
    id: "silencer-lined-bend", name: "Lined bend (baffle box)", lengthM: 0.6,
    insertionLossDb: rounded(thirdOctavesFromOctaves(OCTAVES_HZ, [1, 2, 4, 8, 12, 14, 14, 12])),
    source: { kind: "typical", note: "Octave insertion loss of a typical lined bend (a typical assumption), interpolated to third-octave bands." },
  },
];
