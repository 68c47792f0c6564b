import { nonNegative, OCTAVES_HZ, rounded, thirdOctavesFromOctaves } from "./bands.js";
import { criticalFrequencyHz, doubleLeafTlDb, singleLeafTlDb, type Leaf } from "./estimate.js";
import { shiftedToStc } from "./fit.js";
import type { Construction } from "./types.js";

const SPRINGER = "Springer Handbook of Acoustics (2014), Table 11.4";
const HARRIS = "Harris, Handbook of Acoustical Measurements and Noise Control, 3rd ed.";
const BIES = "Bies, Hansen & Howard, Engineering Noise Control, 5th ed., Table 7.6";

const glass = (mm: number): Leaf => ({ massKgM2: 2.5 * mm, criticalHz: criticalFrequencyHz("glass", mm / 1000), lossFactor: 0.01 });

function fitted(id: string, name: string, category: "door" | "window", o: { estimate: number[]; model: string; stc: number; source: string; thicknessMm: number; massKgM2: number }): Construction {
  const { tlDb, shiftDb } = shiftedToStc(o.estimate, o.stc);
  return {
    id, name, category, thicknessMm: o.thicknessMm, surfaceDensityKgM2: o.massKgM2, tlDb: rounded(nonNegative(tlDb)),
    source: { kind: "shaped", note: `STC ${o.stc} published in ${o.source}. Band curve: ${o.model}, moved ${shiftDb >= 0 ? "+" : ""}${shiftDb} dB so its STC matches (below 125 Hz not below the unshifted estimate where that stays under the 125 Hz value; negative values set to 0 dB); band values are an estimate.` },
  };
}

// Door leaves: "unsealed" values are as hung with the usual gaps, so a door recorded with its
// own undercut and gaps should use the sealed variant to avoid counting the gaps twice.
const hollowLeaf: Leaf = { massKgM2: 9, criticalHz: 4000, lossFactor: 0.03 };
const solidLeaf: Leaf = { massKgM2: 28, criticalHz: 700, lossFactor: 0.03 };
const doorModel = (leaf: Leaf) => `single-leaf estimate (Sharp) for a ${leaf.massKgM2} kg/m² leaf with an assumed critical frequency of ${leaf.criticalHz} Hz`;

/** Doors and glazing of the trade, per band 50–5000 Hz. */
export const openingConstructions: Construction[] = [
  fitted("door-hollow-core", "Hollow-core door, no seals (as hung)", "door", { estimate: singleLeafTlDb(hollowLeaf), model: doorModel(hollowLeaf), stc: 17, source: HARRIS, thicknessMm: 35, massKgM2: 9 }),
  fitted("door-hollow-core-sealed", "Hollow-core door with perimeter seals", "door", { estimate: singleLeafTlDb(hollowLeaf), model: doorModel(hollowLeaf), stc: 20, source: HARRIS, thicknessMm: 35, massKgM2: 9 }),
  fitted("door-solid-core", "Solid-core door, no seals (as hung)", "door", { estimate: singleLeafTlDb(solidLeaf), model: doorModel(solidLeaf), stc: 20, source: HARRIS, thicknessMm: 44, massKgM2: 28 }),
  fitted("door-solid-core-sealed", "Solid-core door with perimeter seals and drop seal", "door", { estimate: singleLeafTlDb(solidLeaf), model: doorModel(solidLeaf), stc: 28, source: HARRIS, thicknessMm: 44, massKgM2: 28 }),
  {
    id: "door-solid-hardwood",
    name: "Solid hardwood door, as hung",
    category: "door",
    thicknessMm: 45,
    surfaceDensityKgM2: 30,
    tlDb: rounded(thirdOctavesFromOctaves(OCTAVES_HZ, [13, 17, 21, 26, 29, 31, 34, 32])),
    source: { kind: "shaped", note: `Octave values 63–8000 Hz from ${BIES}; third-octave bands interpolated in log-frequency between octave centres, 50 Hz held at the 63 Hz value.` },
  },
  fitted("glazing-single-3", "Single glazing, 3 mm", "window", { estimate: singleLeafTlDb(glass(3)), model: "single-leaf estimate (Sharp) for 3 mm glass", stc: 26, source: SPRINGER, thicknessMm: 3, massKgM2: 7.5 }),
  {
    id: "glazing-single-6",
    name: "Single glazing, 6 mm",
    category: "window",
    thicknessMm: 6,
    surfaceDensityKgM2: 15,
    tlDb: rounded(thirdOctavesFromOctaves(OCTAVES_HZ, [17, 11, 24, 28, 32, 27, 35, 39])),
    source: { kind: "shaped", note: `Octave values 63–8000 Hz from ${BIES}; third-octave bands interpolated in log-frequency between octave centres, 50 Hz held at the 63 Hz value.` },
  },
  fitted("glazing-laminated-12-7", "Laminated glass, 12.7 mm", "window", { estimate: singleLeafTlDb({ ...glass(12.7), lossFactor: 0.05 }), model: "single-leaf estimate (Sharp) for 12.7 mm glass with the higher damping of a laminate interlayer (η 0.05)", stc: 40, source: SPRINGER, thicknessMm: 13, massKgM2: 32 }),
  fitted("glazing-double-3-50-3", "Double glazing, 3 mm + 50 mm gap + 3 mm", "window", { estimate: doubleLeafTlDb({ leaf1: glass(3), leaf2: glass(3), cavityM: 0.05, absorber: false, bridgeLimitDb: 25 }), model: "double-leaf estimate (Sharp) for two 3 mm panes on a 50 mm air gap", stc: 37, source: SPRINGER, thicknessMm: 56, massKgM2: 15 }),
  {
    id: "glazing-double-4-16-4",
    name: "Insulating glass unit, 4 mm + 16 mm gap + 4 mm",
    category: "window",
    thicknessMm: 24,
    surfaceDensityKgM2: 20,
    tlDb: rounded(doubleLeafTlDb({ leaf1: glass(4), leaf2: glass(4), cavityM: 0.016, absorber: false, bridgeLimitDb: 20 })),
    source: { kind: "estimate", note: "Engine estimate from physical properties: double-leaf (Sharp) for two 4 mm panes on a 16 mm gap (mass–air–mass resonance ≈ 212 Hz), edge seal limiting the gain to 20 dB over the mass law. No published test behind it." },
  },
];
