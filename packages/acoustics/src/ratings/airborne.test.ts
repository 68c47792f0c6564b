import { describe, expect, it } from "vitest";
import { thirdOctaveRange } from "./band-data.js";
import { ratingAstc, ratingStc, STC_CONTOUR_DB } from "./stc.js";
import { ratingRw, RW_REFERENCE_THIRD_DB, RW_REFERENCE_OCTAVE_DB } from "./rw.js";
import { ratingOitc, OITC_REFERENCE_DBA } from "./oitc.js";
import { energySumDb } from "../bands/levels.js";
import { MissingBandsError } from "./band-data.js";

const table = (from: number, to: number, values: readonly number[]) => new Map(thirdOctaveRange(from, to).map((hz, i) => [hz, values[i]!]));

describe("STC (ASTM E413)", () => {
  it("rates the published example", () => {
    // engine-notes [pub] (ASTM E413 procedure example): STC 25, deficiency sum 29
    const tl = [18, 18, 17, 17, 20, 21, 22, 23, 25, 26, 26, 25, 25, 26, 30, 31];
    const r = ratingStc(table(125, 4000, tl));
    expect(r.value).toBe(25);
    expect(r.deviationSumDb).toBe(29);
    expect(r.curveDb[6]).toBe(25);
    expect(r.deviationsDb).toHaveLength(16);
    // STC 26 would give a deficiency sum of 40 (engine-notes [pub])
    const at26 = r.curveDb.map((c, i) => Math.max(0, c + 1 - tl[i]!)).reduce((a, b) => a + b);
    expect(at26).toBe(40);
  });
  it("rates TL equal to the contour at 50 as STC 52", () => {
    // engine-notes [derived] from the ASTM E413 contour
    expect(ratingStc(table(125, 4000, STC_CONTOUR_DB.map((c) => c + 50))).value).toBe(52);
  });
  it("applies the 8 dB rule as an option, on by default", () => {
    const tl = STC_CONTOUR_DB.map((c) => c + 50);
    tl[10] = 30; // one deep dip at 1250 Hz
    expect(ratingStc(table(125, 4000, tl)).maxDeviationDb).toBeLessThanOrEqual(8);
    const noRule = ratingStc(table(125, 4000, tl), { maxDeficiencyRule: false });
    expect(noRule.value).toBeGreaterThan(ratingStc(table(125, 4000, tl)).value);
    expect(noRule.notes.join(" ")).toMatch(/without the 8 dB/);
  });
  it("carries the scope caveat and the field name", () => {
    const r = ratingAstc(table(125, 4000, STC_CONTOUR_DB.map((c) => c + 40)));
    expect(r.name).toBe("ASTC");
    expect(r.notes.join(" ")).toMatch(/not meant for machinery, music/);
  });
  it("says which bands are missing", () => {
    expect(() => ratingStc(table(125, 3150, new Array(15).fill(30)))).toThrow(MissingBandsError);
    expect(() => ratingStc(table(125, 3150, new Array(15).fill(30)))).toThrow(/4000 Hz/);
  });
});

describe("Rw, C, Ctr (ISO 717-1)", () => {
  it("rates the reference curve itself as Rw 54", () => {
    // engine-notes [pub] (ISO 717-1 procedure): R equal to the reference curve → Rw = 54
    const r = ratingRw(table(100, 3150, RW_REFERENCE_THIRD_DB));
    expect(r.value).toBe(54);
    expect(r.deviationSumDb).toBe(32);
  });
  it("computes C and Ctr from the spectra", () => {
    // [derived] by hand with the ISO 717-1 procedure: flat R 40 → Rw 40 (41 would give a 35 dB
    // sum); the spectra are normalised to 0 dB(A), so C = Ctr = 0 for a flat curve.
    const flat = ratingRw(table(100, 3150, new Array(16).fill(40)));
    expect([flat.value, flat.c, flat.ctr]).toEqual([40, 0, 0]);
    // [derived] R rising 2 dB per band from 20 dB: Rw 38, X_A 36.86 (C −1), 32.95 (Ctr −5)
    const r = ratingRw(table(100, 3150, Array.from({ length: 16 }, (_, i) => 20 + 2 * i)));
    expect([r.value, r.c, r.ctr]).toEqual([38, -1, -5]);
  });
  it("gives C50-5000 and Ctr,50-5000 only with 50–5000 Hz data", () => {
    // Extended spectra in engine-notes are from memory (ISO 717-1 Table 4)
    expect(ratingRw(table(100, 3150, new Array(16).fill(40))).c50_5000).toBeUndefined();
    const ext = ratingRw(table(50, 5000, new Array(21).fill(40)));
    expect(ext.c50_5000).toBe(0); // from memory (extended spectra): flat data → 0
    expect(ext.ctr50_5000).toBe(0); // from memory (extended spectra): flat data → 0
  });
  it("rates octave data with the 10 dB sum", () => {
    // engine-notes [pub]: octave reference 36, 45, 52, 55, 56 (ISO 717-1 Table 3)
    const r = ratingRw(new Map([125, 250, 500, 1000, 2000].map((hz, i) => [hz, RW_REFERENCE_OCTAVE_DB[i]!])), { octave: true });
    expect(r.value).toBe(54);
    expect(r.deviationSumDb).toBe(10);
  });
  it("is used for field figures by name", () => {
    expect(ratingRw(table(100, 3150, RW_REFERENCE_THIRD_DB), { name: "R'w" }).name).toBe("R'w");
  });
});

describe("OITC (ASTM E1332)", () => {
  it("gives X for a flat TL of X", () => {
    // engine-notes [derived]; reference levels are memory-grade (from memory)
    expect(ratingOitc(table(80, 4000, new Array(18).fill(30))).value).toBe(30);
    expect(ratingOitc(table(80, 4000, new Array(18).fill(47))).value).toBe(47);
  });
  it("has reference levels summing to 100.13 dB(A)", () => {
    expect(energySumDb([...OITC_REFERENCE_DBA])).toBeCloseTo(100.13, 2); // from memory (memory-grade levels)
  });
});
