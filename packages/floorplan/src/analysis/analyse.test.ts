import { describe, expect, it } from "vitest";
import { constructionCatalogue } from "../catalogue/catalogue.js";
import { catalogueWith, type Construction } from "../catalogue/types.js";
import { groundLevel, planWith, rect } from "../../test/plan-fixtures.js";
import { solvePlan } from "./analyse.js";

const flat = (id: string, category: Construction["category"], tl: number): Construction => ({
  id, name: `${tl} dB everywhere`, category, thicknessMm: 100, surfaceDensityKgM2: 100, tlDb: new Array(21).fill(tl), source: { kind: "typical", note: "test construction" },
});
const catalogue = catalogueWith(constructionCatalogue, { constructions: [flat("test-wall-45", "wall", 45), flat("test-wall-50", "wall", 50), flat("test-door-20", "door", 20)] });

/** Two 4 m × 4 m rooms, 2.5 m high, side by side: the shared wall is 4 m × 2.5 m = 10 m². */
function twoRooms(wallId: string, extra: Parameters<typeof planWith>[0] = []) {
  const room = (id: string, x: number) => ({ type: "room" as const, id, levelId: "L0", name: id, use: "office" as const, outline: rect(id, x, 0, 4, 4), finish: { kind: "absorption" as const, absorptionM2: 20 } });
  return planWith([groundLevel, room("A", 0), room("B", 4), ...extra], {
    defaults: {
      interiorWallConstructionId: wallId, exteriorWallConstructionId: "masonry-brick-100", floorConstructionId: "floor-concrete-200",
      ceilingConstructionId: "ceiling-gypsum-12-5", exteriorFaces: { kind: "none" },
    },
  });
}
const source = { spaceId: "A", levelsDb: new Array(21).fill(90) };

describe("solvePlan against hand calculations", () => {
  it("gives L2 = L1 − TL + 10·lg(S/A2) for one wall between two rooms", () => {
    const r = solvePlan(twoRooms("test-wall-45"), catalogue, { source, receiver: "B", flanking: false });
    if (!r.ok) throw new Error(r.problems[0]!.message);
    // engine-notes.md [derived]: L1 90, TL 45, S 10 m², A2 20 m² → L2 = 42.0 dB (41.99) in every band.
    for (const l of r.result.levelsDb) {
      expect(l).toBeCloseTo(90 - 45 + 10 * Math.log10(10 / 20), 6);
      expect(l).toBeCloseTo(42.0, 1);
    }
  });

  it("matches the composite formula for a door with an undercut", () => {
    const door = { type: "door" as const, id: "D", wallRef: "A:Ab", offsetM: 1.5, widthM: 1.0, heightM: 2.0, constructionId: "test-door-20", leaks: { undercutMm: 10, perimeterGapMm: 0, sealsCracked: false } };
    const r = solvePlan(twoRooms("test-wall-50", [door]), catalogue, { source, receiver: "B", flanking: false });
    if (!r.ok) throw new Error(r.problems[0]!.message);
    // Composite TLc = −10·lg(Σ τi·Si / S) (engine-notes.md [pub]): wall 8 m² at 50 dB, leaf
    // 1.99 m² at 20 dB, undercut 1.0 m × 10 mm = 0.01 m² open (τ = 1), S = 10 m².
    const tauS = 8 * 1e-5 + 1.99 * 1e-2 + 0.01;
    const tlc = -10 * Math.log10(tauS / 10);
    expect(tlc).toBeCloseTo(25.23, 2);
    for (const l of r.result.levelsDb) expect(l).toBeCloseTo(90 - tlc + 10 * Math.log10(10 / 20), 6);
    // Without the undercut the same door gives the 27.0 dB of the textbook check (10 m² at 50 dB with 2 m² at 20 dB).
    const sealed = solvePlan(twoRooms("test-wall-50", [{ ...door, leaks: undefined }]), catalogue, { source, receiver: "B", flanking: false });
    if (!sealed.ok) throw new Error("sealed");
    expect(90 - sealed.result.levelsDb[10]! + 10 * Math.log10(10 / 20)).toBeCloseTo(27.0, 1);
    // The door (leaf and gap) carries most of the sound, the wall around it little.
    expect(r.onPlan.elements[0]).toMatchObject({ elementId: "D", kind: "door", gainExact: true });
    expect(r.onPlan.elements[0]!.share).toBeCloseTo((1.99e-2 + 0.01) / tauS, 3);
    // A perfect door leaves only the 8 m² of wall: gain = 10·lg(τS before / τS after), one hop.
    expect(r.onPlan.elements[0]!.gainIfPerfectDb).toBeCloseTo(10 * Math.log10(tauS / 8e-5), 6);
  });

  it("uses the receiving room's target and reports a missing receiver", () => {
    const plan = twoRooms("test-wall-45");
    const bad = solvePlan(plan, catalogue, { source, receiver: "nowhere" });
    expect(!bad.ok && bad.problems[0]!.message).toContain("nowhere");
    const withTarget = solvePlan(plan, catalogue, { source, receiver: "B", target: { kind: "dba", dba: 30 }, flanking: false });
    if (!withTarget.ok) throw new Error("target");
    expect(withTarget.result.shortfall?.met).toBe(false);
  });
});
