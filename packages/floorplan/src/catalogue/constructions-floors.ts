import { BANDS_HZ, nonNegative, rounded } from "./bands.js";
import { criticalFrequencyHz, doubleLeafTlDb, singleLeafTlDb, type Leaf } from "./estimate.js";
import { shiftedToStc } from "./fit.js";
import type { Construction } from "./types.js";

const SPRINGER = "Springer Handbook of Acoustics (2014), Table 11.4";

/** Bare heavy floor of ISO 717-2 Annex C, 100–3150 Hz (Ln,w 79), dB. */
const ISO_717_2_BARE_FLOOR = [62.1, 63.2, 63.5, 66.2, 68.5, 70.0, 71.7, 73.1, 73.8, 73.5, 73.8, 73.3, 73.1, 73.0, 72.4, 71.2];

/** A 100–3150 Hz curve extended to 50–5000 Hz by holding its end values, dB. */
function extended16(values16: readonly number[]): number[] {
  const first = BANDS_HZ.indexOf(100);
  return BANDS_HZ.map((_, i) => values16[Math.min(15, Math.max(0, i - first))]!);
}

/**
 * Typical impact level of a wood-joist floor, dB per band: high at low frequencies where the
 * lightweight floor is weak, falling above 500 Hz (a typical shape, from memory; not a test).
 */
function joistImpactDb(at500Db: number): number[] {
  const shape = [6, 6, 6, 5, 4, 3, 2, 1, 1, 0.5, 0, -1, -2, -3, -4, -5.5, -7, -8.5, -10, -12, -14];
  return shape.map((s) => at500Db + s);
}

const board: Leaf = { massKgM2: 12, criticalHz: 1800, lossFactor: 0.03 }; // 18 mm wood subfloor
const gypsumCeiling = (layers: number): Leaf => ({ massKgM2: 10 * layers, criticalHz: criticalFrequencyHz("gypsum", 0.0127), lossFactor: 0.03 });

function fitted(est: number[], stc: number, model: string): { tlDb: number[]; note: string } {
  const { tlDb, shiftDb } = shiftedToStc(est, stc);
  return { tlDb: rounded(nonNegative(tlDb)), note: `STC ${stc} published in ${SPRINGER}. Band curve: ${model}, moved ${shiftDb >= 0 ? "+" : ""}${shiftDb} dB so its STC matches (below 125 Hz not below the unshifted estimate where that stays under the 125 Hz value; negative values set to 0 dB); band values are an estimate.` };
}

const joistWithCeiling = fitted(doubleLeafTlDb({ leaf1: board, leaf2: gypsumCeiling(1), cavityM: 0.22, absorber: false, bridgeLimitDb: 12 }), 37, "double-leaf estimate (Sharp) for an 18 mm subfloor on 220 mm joists with a 12.7 mm gypsum ceiling fixed to them");
const slab200 = fitted(singleLeafTlDb({ massKgM2: 460, criticalHz: criticalFrequencyHz("concrete", 0.2), lossFactor: 0.02 }), 50, "single-leaf estimate (Sharp) for a 460 kg/m² slab");
const IMPACT_JOIST_NOTE = "Impact levels: a typical wood-joist curve (from memory, not a test), set so that";

/** Floors/ceilings between storeys and ceiling linings under voids, per band 50–5000 Hz. */
export const floorConstructions: Construction[] = [
  {
    id: "floor-wood-joist-gypsum-ceiling", name: "Wood-joist floor with 12.7 mm gypsum ceiling fixed to the joists", category: "floor",
    thicknessMm: 260, surfaceDensityKgM2: 32, tlDb: joistWithCeiling.tlDb, impactLnDb: rounded(joistImpactDb(78)),
    source: { kind: "shaped", note: `${joistWithCeiling.note} ${IMPACT_JOIST_NOTE} Ln is 78 dB at 500 Hz (IIC in the low 30s, common for an uncovered joist floor).` },
  },
  {
    id: "floor-wood-joist-no-ceiling", name: "Wood-joist floor, boards only, no ceiling below", category: "floor",
    thicknessMm: 240, surfaceDensityKgM2: 18, tlDb: rounded(singleLeafTlDb({ ...board, massKgM2: 18 })), impactLnDb: rounded(joistImpactDb(88)),
    source: { kind: "estimate", note: `Engine estimate from physical properties: single-leaf (Sharp) for 18 kg/m² of boards and joists. ${IMPACT_JOIST_NOTE} Ln is 88 dB at 500 Hz. No published test behind it.` },
  },
  {
    id: "floor-wood-joist-resilient-ceiling", name: "Wood-joist floor, insulated, two layers 12.7 mm gypsum on resilient channel", category: "floor",
    thicknessMm: 280, surfaceDensityKgM2: 42,
    tlDb: rounded(doubleLeafTlDb({ leaf1: board, leaf2: gypsumCeiling(2), cavityM: 0.24, absorber: true, bridgeLimitDb: 18 })),
    impactLnDb: rounded(joistImpactDb(66)),
    source: { kind: "estimate", note: `Engine estimate from physical properties: double-leaf (Sharp) for an 18 mm subfloor and 2×12.7 mm gypsum on resilient channel, insulated 240 mm cavity. ${IMPACT_JOIST_NOTE} Ln is 66 dB at 500 Hz. No published test behind it.` },
  },
  {
    id: "floor-concrete-200", name: "Concrete slab, 200 mm", category: "floor",
    thicknessMm: 200, surfaceDensityKgM2: 460, tlDb: slab200.tlDb,
    impactLnDb: rounded(extended16(ISO_717_2_BARE_FLOOR).map((v) => v - 8)),
    source: { kind: "shaped", note: `${slab200.note} Impact levels: the bare-floor curve of the ISO 717-2 Annex C example (Ln,w 79) lowered 8 dB towards the Ln,w ≈ 71 dB that the EN 12354-2 estimate 164 − 35·lg m′ gives for 460 kg/m² (from memory); 50–80 Hz and 4000–5000 Hz held at the end values.` },
  },
  {
    id: "ceiling-gypsum-12-5", name: "Gypsum board ceiling, 12.5 mm, under a void", category: "ceiling",
    thicknessMm: 13, surfaceDensityKgM2: 10, tlDb: rounded(singleLeafTlDb(gypsumCeiling(1))),
    source: { kind: "estimate", note: "Engine estimate from physical properties: single-leaf (Sharp) for 10 kg/m² gypsum board. No published test behind it." },
  },
  {
    id: "ceiling-suspended-tile", name: "Suspended mineral-fibre tile ceiling", category: "ceiling",
    thicknessMm: 15, surfaceDensityKgM2: 4.5, tlDb: rounded(nonNegative(singleLeafTlDb({ massKgM2: 4.5, criticalHz: 6000, lossFactor: 0.05 }).map((v) => v - 3))),
    source: { kind: "estimate", note: "Engine estimate from physical properties: mass law for 4.5 kg/m² tiles less 3 dB for the joints and light fittings of a lay-in grid (common practice). No published test behind it." },
  },
  {
    id: "ceiling-resilient-gypsum-2x", name: "Resilient ceiling: two layers 12.7 mm gypsum on resilient channel", category: "ceiling",
    thicknessMm: 40, surfaceDensityKgM2: 20, tlDb: rounded(singleLeafTlDb(gypsumCeiling(2)).map((v) => v + 3)),
    source: { kind: "estimate", note: "Engine estimate from physical properties: single-leaf (Sharp) for 20 kg/m² gypsum plus 3 dB for the resilient mounting (common practice). No published test behind it." },
  },
];
