import { nonNegative, rounded, thirdOctavesFromOctaves, OCTAVES_HZ } from "./bands.js";
import { criticalFrequencyHz, doubleLeafTlDb, singleLeafTlDb, type Leaf } from "./estimate.js";
import { shiftedToStc } from "./fit.js";
import type { Construction } from "./types.js";

const SPRINGER = "Springer Handbook of Acoustics (2014), Table 11.4";
const BIES = "Bies, Hansen & Howard, Engineering Noise Control, 5th ed., Table 7.6";

/** One 12.7 mm gypsum board: 10 kg/m², fc ≈ 3.4 kHz (Hopkins 2007, Table A2). */
const gypsum = (layers: number): Leaf => ({ massKgM2: 10 * layers, criticalHz: criticalFrequencyHz("gypsum", 0.0127), lossFactor: 0.03 });

/** A curve estimated from physical properties and moved to a published STC. */
function fittedToStc(estimate: number[], stc: number, source: string, model: string): { tlDb: number[]; note: string } {
  const { tlDb, shiftDb } = shiftedToStc(estimate, stc);
  return {
    tlDb: rounded(nonNegative(tlDb)),
    note: `STC ${stc} published in ${source}. Band curve: ${model}, moved ${shiftDb >= 0 ? "+" : ""}${shiftDb} dB so its STC matches (below 125 Hz not below the unshifted estimate where that stays under the 125 Hz value; negative values set to 0 dB); band values are an estimate.`,
  };
}

function stud(id: string, name: string, o: { layers: number; cavityM: number; absorber: boolean; bridgeLimitDb: number; thicknessMm: number; extraKgM2: number; stc?: number; source?: string; tie: string }): Construction {
  const est = doubleLeafTlDb({ leaf1: gypsum(o.layers), leaf2: gypsum(o.layers), cavityM: o.cavityM, absorber: o.absorber, bridgeLimitDb: o.bridgeLimitDb });
  const model = `double-leaf estimate (Sharp) with ${o.layers}×12.7 mm gypsum each side, ${Math.round(o.cavityM * 1000)} mm cavity${o.absorber ? " with insulation" : ""}, ${o.tie}`;
  const mass = 2 * 10 * o.layers + o.extraKgM2;
  if (o.stc !== undefined && o.source) {
    const f = fittedToStc(est, o.stc, o.source, model);
    return { id, name, category: "wall", thicknessMm: o.thicknessMm, surfaceDensityKgM2: mass, tlDb: f.tlDb, source: { kind: "shaped", note: f.note } };
  }
  return { id, name, category: "wall", thicknessMm: o.thicknessMm, surfaceDensityKgM2: mass, tlDb: rounded(est), source: { kind: "estimate", note: `Engine estimate from physical properties: ${model}. No published test behind it.` } };
}

function heavy(id: string, name: string, o: { leaf: Leaf; thicknessMm: number; stc: number; source: string; what: string; category?: "wall" | "floor" }): Construction {
  const f = fittedToStc(singleLeafTlDb(o.leaf), o.stc, o.source, `single-leaf estimate (Sharp) for ${o.what}`);
  return { id, name, category: o.category ?? "wall", thicknessMm: o.thicknessMm, surfaceDensityKgM2: o.leaf.massKgM2, tlDb: f.tlDb, source: { kind: "shaped", note: f.note } };
}

/** Partition walls of the trade, per band 50–5000 Hz. */
export const wallConstructions: Construction[] = [
  stud("stud-wood-1x1-gypsum", "Wood studs, one layer 12.7 mm gypsum each side, empty cavity", { layers: 1, cavityM: 0.09, absorber: false, bridgeLimitDb: 10, thicknessMm: 115, extraKgM2: 3, stc: 33, source: SPRINGER, tie: "rigid wood studs" }),
  stud("stud-wood-1x1-gypsum-insulated", "Wood studs, one layer 12.7 mm gypsum each side, insulated cavity", { layers: 1, cavityM: 0.09, absorber: true, bridgeLimitDb: 10, thicknessMm: 115, extraKgM2: 4, stc: 37, source: SPRINGER, tie: "rigid wood studs" }),
  stud("stud-wood-2x2-gypsum", "Wood studs, two layers 12.7 mm gypsum each side", { layers: 2, cavityM: 0.09, absorber: false, bridgeLimitDb: 10, thicknessMm: 140, extraKgM2: 3, stc: 41, source: SPRINGER, tie: "rigid wood studs" }),
  stud("stud-wood-staggered-insulated", "Staggered wood studs, one layer 12.7 mm gypsum each side, insulated", { layers: 1, cavityM: 0.14, absorber: true, bridgeLimitDb: 18, thicknessMm: 165, extraKgM2: 5, stc: 48, source: SPRINGER, tie: "staggered studs on a shared plate" }),
  stud("stud-steel-1x1-gypsum", "Steel studs, one layer 12.7 mm gypsum each side, empty cavity", { layers: 1, cavityM: 0.09, absorber: false, bridgeLimitDb: 15, thicknessMm: 115, extraKgM2: 1, stc: 39, source: SPRINGER, tie: "light steel studs" }),
  stud("stud-steel-1x1-gypsum-insulated", "Steel studs, one layer 12.7 mm gypsum each side, insulated cavity", { layers: 1, cavityM: 0.09, absorber: true, bridgeLimitDb: 15, thicknessMm: 115, extraKgM2: 2, stc: 45, source: SPRINGER, tie: "light steel studs" }),
  stud("stud-wood-resilient-channel-insulated", "Wood studs, insulated, resilient channel and one layer 12.7 mm gypsum on one side", { layers: 1, cavityM: 0.1, absorber: true, bridgeLimitDb: 20, thicknessMm: 130, extraKgM2: 5, tie: "resilient channel on one side" }),
  stud("stud-double-insulated-2x2", "Double wood studs on separate plates, insulated, two layers 12.7 mm gypsum each side", { layers: 2, cavityM: 0.2, absorber: true, bridgeLimitDb: 40, thicknessMm: 250, extraKgM2: 8, tie: "independent studs (no ties)" }),
  heavy("masonry-block-200", "Concrete masonry block, 200 mm", { leaf: { massKgM2: 210, criticalHz: criticalFrequencyHz("concrete", 0.2), lossFactor: 0.02 }, thicknessMm: 200, stc: 53, source: SPRINGER, what: "a 210 kg/m² block wall" }),
  heavy("masonry-brick-100", "Brick, 100 mm", { leaf: { massKgM2: 190, criticalHz: criticalFrequencyHz("brick", 0.1), lossFactor: 0.02 }, thicknessMm: 100, stc: 45, source: SPRINGER, what: "a 190 kg/m² brick leaf" }),
  {
    id: "concrete-100",
    name: "Concrete wall, 100 mm",
    category: "wall",
    thicknessMm: 100,
    surfaceDensityKgM2: 230,
    tlDb: rounded(thirdOctavesFromOctaves(OCTAVES_HZ, [32, 37, 36, 45, 52, 59, 62, 63])),
    source: { kind: "shaped", note: `Octave values 63–8000 Hz from ${BIES}; third-octave bands interpolated in log-frequency between octave centres, 50 Hz held at the 63 Hz value.` },
  },
  heavy("concrete-200", "Concrete wall, 200 mm", { leaf: { massKgM2: 460, criticalHz: criticalFrequencyHz("concrete", 0.2), lossFactor: 0.02 }, thicknessMm: 200, stc: 50, source: `${SPRINGER} (200 mm concrete slab)`, what: "a 460 kg/m² concrete leaf" }),
];
