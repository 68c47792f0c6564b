import { describe, expect, it } from "vitest";
import { criticalFrequencyFromProductHz, criticalFrequencyHz, bendingStiffnessNm, H_FC_PRODUCTS_M_HZ, massLawFieldDb, massLawNormalDb, singleLeafTlDb } from "./single-leaf.js";
import { doubleLeafTlDb, massAirMassResonanceHz } from "./double-leaf.js";
import { compositeTransmissionLossDb } from "./composite.js";
import { apparentReductionIndexDb, flankingReductionIndexDb, vibrationReductionIndexDb, vibrationReductionIndexMinDb, massRatioM } from "./flanking.js";
import { catalogueTl, CONSTRUCTION_CATALOGUE } from "./catalogue.js";
import { ratingStc } from "../ratings/stc.js";

describe("mass law", () => {
  it("gives the normal-incidence TL of 10 kg/m² at 200 Hz", () => {
    // engine-notes lists 23.51 dB [pub], but its own formula with ρ0c0 = 415 (1.21 × 343) gives
    // 23.62, as does its own approximation 20·lg(mf) − 42.4 (−42.4 = 20·lg(π/415)); 23.51 needs
    // ρ0c0 ≈ 420. We follow the formula and report the discrepancy.
    expect(massLawNormalDb(10, 200)).toBeCloseTo(23.62, 2);
    expect(massLawNormalDb(10, 200)).toBeCloseTo(20 * Math.log10(2000) - 42.4, 1);
    expect(massLawNormalDb(10, 200, 420.4)).toBeCloseTo(23.51, 2); // the notes' value at ρ0c0 ≈ 420
  });
  it("rises 6 dB per doubling of mass or frequency", () => {
    expect(massLawFieldDb(20, 500) - massLawFieldDb(10, 500)).toBeCloseTo(6.02, 2);
    expect(massLawFieldDb(10, 1000) - massLawFieldDb(10, 500)).toBeCloseTo(6.02, 2);
    expect(massLawFieldDb(10, 200)).toBeCloseTo(19.02, 2); // 20·lg(m·f) − 47 [pub in engine-notes]
  });
});

describe("coincidence", () => {
  it("gives critical frequencies from h·fc products (Hopkins, Sound Insulation, 2007, Table A2)", () => {
    expect(criticalFrequencyFromProductHz(H_FC_PRODUCTS_M_HZ.gypsumBoard, 0.0125)).toBeCloseTo(3480, 0); // Hopkins Table A2
    expect(criticalFrequencyFromProductHz(H_FC_PRODUCTS_M_HZ.glass, 0.006)).toBeCloseTo(2083, 0); // Hopkins Table A2 (≈ 2080 Hz)
    expect(criticalFrequencyFromProductHz(H_FC_PRODUCTS_M_HZ.concrete, 0.15)).toBeCloseTo(114, 0); // Hopkins Table A2
  });
  it("gives fc from stiffness: 6 mm glass (E 70 GPa, ρ 2500 kg/m³) near 2 kHz", () => {
    // [derived] fc = c²/(2π)·√(m/B) with textbook glass properties; consistent with h·fc = 12.5
    const fc = criticalFrequencyHz(2500 * 0.006, bendingStiffnessNm(70e9, 0.006, 0.22));
    expect(fc).toBeGreaterThan(1950);
    expect(fc).toBeLessThan(2200);
  });
  it("dips at coincidence and recovers above it (Sharp's method)", () => {
    const glass = { surfaceDensityKgM2: 15, criticalFrequencyHz: 2083, lossFactor: 0.01 };
    const below = singleLeafTlDb(glass, 500);
    const at = singleLeafTlDb(glass, 2083);
    const above = singleLeafTlDb(glass, 8000);
    expect(below).toBeCloseTo(20 * Math.log10((Math.PI * 500 * 15) / (1.21 * 343)) - 5.5, 6);
    expect(at).toBeLessThan(singleLeafTlDb(glass, 1000));
    expect(above).toBeGreaterThan(at);
    expect(above).toBeLessThanOrEqual(massLawNormalDb(15, 8000));
  });
});

describe("double leaf", () => {
  it("gives the mass–air–mass resonance", () => {
    // engine-notes [derived]: two 10 kg/m² leaves, 90 mm cavity → 89.5 Hz; 4-16-4 glazing → 212 Hz
    expect(massAirMassResonanceHz(10, 10, 0.09)).toBeCloseTo(89.5, 1);
    expect(massAirMassResonanceHz(10, 10, 0.016)).toBeCloseTo(212, 0);
    // ≈ 60·√((1/m1 + 1/m2)/d) [memory for the form]
    expect(massAirMassResonanceHz(10, 10, 0.09) / (60 * Math.sqrt(0.2 / 0.09))).toBeCloseTo(1, 2);
  });
  it("beats the same mass as one leaf well above resonance", () => {
    const leaf = { surfaceDensityKgM2: 10, criticalFrequencyHz: 3480, lossFactor: 0.02 };
    const input = { leaf1: leaf, leaf2: leaf, cavityM: 0.09, cavityAbsorption: true };
    const single = singleLeafTlDb({ ...leaf, surfaceDensityKgM2: 20 }, 1000);
    expect(doubleLeafTlDb(input, 1000)).toBeGreaterThan(single + 10);
    expect(doubleLeafTlDb(input, 50)).toBeCloseTo(20 * Math.log10(20 * 50) - 47, 6);
    expect(doubleLeafTlDb({ ...input, cavityAbsorption: false }, 1000)).toBeLessThan(doubleLeafTlDb(input, 1000));
  });
});

describe("composite transmission loss", () => {
  it("matches the worked examples", () => {
    // engine-notes [derived]: a 10 m² wall (TL 50) containing a 2 m² door (TL 20) → 27.0 dB
    expect(compositeTransmissionLossDb([{ areaM2: 8, tlDb: 50 }, { areaM2: 2, tlDb: 20 }])).toBeCloseTo(27.0, 1);
    // 1 % open area ruins a TL 50 wall → 20.0 dB; 0.1 % → 30.0 dB
    expect(compositeTransmissionLossDb([{ areaM2: 9.9, tlDb: 50 }, { areaM2: 0.1, open: true }])).toBeCloseTo(20.0, 1);
    expect(compositeTransmissionLossDb([{ areaM2: 9.99, tlDb: 50 }, { areaM2: 0.01, open: true }])).toBeCloseTo(30.0, 1);
  });
  it("lies between the smallest and largest part TL", () => {
    const tl = compositeTransmissionLossDb([{ areaM2: 5, tlDb: 45 }, { areaM2: 1, tlDb: 25 }, { areaM2: 3, tlDb: 38 }]);
    expect(tl).toBeGreaterThan(25);
    expect(tl).toBeLessThan(45);
  });
  it("treats a Dn,e element as A0·10^(−Dn,e/10) of transmitting area", () => {
    // τS = 10·10^(−40/10) = 0.001 m² on a 10 m² TL 50 wall: τ = (9.999e-5·… + 1e-3)/10 [derived]
    const tl = compositeTransmissionLossDb([{ areaM2: 10, tlDb: 50 }, { areaM2: 0.01, dneDb: 40 }]);
    expect(tl).toBeCloseTo(-10 * Math.log10((10 * 1e-5 + 1e-3) / 10.01), 6);
  });
});

describe("flanking (ISO 12354-1 simplified)", () => {
  it("gives K_ij of rigid junctions from the mass ratio", () => {
    // ISO 12354-1 Annex E formulas (engine-notes [pub]); equal masses M = 0
    expect(vibrationReductionIndexDb("cross", "straight", 0)).toBeCloseTo(8.7, 6);
    expect(vibrationReductionIndexDb("t", "straight", 0)).toBeCloseTo(5.7, 6);
    const m = massRatioM(400, 100); // lg 4 = 0.602
    expect(vibrationReductionIndexDb("cross", "straight", m)).toBeCloseTo(8.7 + 17.1 * m + 5.7 * m * m, 6);
    expect(vibrationReductionIndexDb("cross", "corner", m)).toBeCloseTo(8.7 + 5.7 * m * m, 6);
    expect(vibrationReductionIndexDb("t", "corner", -m)).toBeCloseTo(5.7 + 5.7 * m * m, 6);
  });
  it("bounds K_ij below and combines paths", () => {
    // [derived] l_f = 2.5 m, S_i = S_j = 10 m²: 10·lg(2.5·0.2) = −3.01 dB
    expect(vibrationReductionIndexMinDb(2.5, 10, 10)).toBeCloseTo(-3.01, 2);
    // [derived] R_ij = (50 + 50)/2 + 0 + 8.7 + 10·lg(10/2.5) = 64.72 dB
    const rij = flankingReductionIndexDb({ riDb: 50, rjDb: 50, deltaRDb: 0, kijDb: 8.7, separatingAreaM2: 10, couplingLengthM: 2.5 });
    expect(rij).toBeCloseTo(64.72, 2);
    expect(apparentReductionIndexDb([50, 50])).toBeCloseTo(46.99, 2);
  });
});

describe("catalogue", () => {
  it("names a source for every entry and labels estimates", () => {
    for (const e of CONSTRUCTION_CATALOGUE) expect(e.source.length).toBeGreaterThan(5);
    const door = catalogueTl("door-solid-sealed", "third-octave");
    expect(door.estimate).toBe(true);
    expect(ratingStc(door.tl).value).toBe(28); // shaped like its published STC (Harris)
    expect(catalogueTl("glass-6mm", "octave").estimate).toBe(false);
    expect(catalogueTl("glass-6mm", "octave").tl.values).toEqual([17, 11, 24, 28, 32, 27, 35, 39]); // Bies, Hansen & Howard Table 7.6
    expect(catalogueTl("glass-6mm", "third-octave").tl.values[1]).toBeCloseTo(17, 6);
  });
});
