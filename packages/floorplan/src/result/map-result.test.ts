import { describe, expect, it } from "vitest";
import { constructionCatalogue } from "../catalogue/catalogue.js";
import { groundLevel, planWith, rect } from "../../test/plan-fixtures.js";
import { buildNetwork } from "../builder/build-network.js";
import { mapResultToPlan } from "./map-result.js";
import type { SolveResultLike } from "./types.js";

const room = (id: string, x: number) => ({ type: "room" as const, id, levelId: "L0", name: `Room ${id}`, use: "office" as const, outline: rect(id, x, 0, 4, 5), finish: { kind: "rt60" as const, rt60S: 0.5 } });
const plan = planWith([
  groundLevel, room("A", 0), room("B", 4),
  { type: "door", id: "D", name: "Connecting door", wallRef: "A:Ab", offsetM: 1, widthM: 0.9, heightM: 2.0, constructionId: "door-solid-core-sealed", leaks: { undercutMm: 10, perimeterGapMm: 0, sealsCracked: false } },
]);
const built = buildNetwork(plan, constructionCatalogue, { flanking: false });
if (!built.ok) throw new Error("fixture plan must build");
const WALL = "wall:A:Ab|B:Bd";

/** A result in which every band at the receiver comes through the shared wall (share 1). */
const result: SolveResultLike = {
  levelsDb: new Array(21).fill(40),
  links: [{ id: WALL, share: 1, shareByBand: new Array(21).fill(1), gainIfPerfectDb: 30 }],
  paths: [{ rank: 1, kind: "airborne", spaces: ["A", "B"], links: [WALL], share: 1, dba: 50 }],
};

describe("mapResultToPlan", () => {
  const mapped = mapResultToPlan(plan, built, result);
  const byId = Object.fromEntries(mapped.elements.map((e) => [e.elementId, e]));

  it("splits a wall's share between the wall, the door leaf and its undercut by τ·S", () => {
    const wall = constructionCatalogue.constructions["stud-wood-1x1-gypsum"]!.tlDb;
    const door = constructionCatalogue.constructions["door-solid-core-sealed"]!.tlDb;
    const b = 10; // 500 Hz
    const tauS = { wall: 10.7 * 10 ** (-wall[b]! / 10), leaf: 1.791 * 10 ** (-door[b]! / 10), gap: 0.009 };
    const total = tauS.wall + tauS.leaf + tauS.gap;
    expect(byId["D"]!.shareByBand[b]).toBeCloseTo((tauS.leaf + tauS.gap) / total, 9);
    expect(byId["A:Ab|B:Bd"]!.shareByBand[b]).toBeCloseTo(tauS.wall / total, 9);
    for (let k = 0; k < 21; k++) expect(byId["D"]!.shareByBand[k]! + byId["A:Ab|B:Bd"]!.shareByBand[k]!).toBeCloseTo(1, 9);
  });

  it("estimates a part's gain-if-perfect as −10·lg(1 − share) and marks it as an estimate", () => {
    const d = byId["D"]!;
    expect(d.gainExact).toBe(false);
    // Flat receiver levels: the A-weighted gain is the A-weighted mean of the per-band remainders.
    const aw = [-30.2, -26.2, -22.5, -19.1, -16.1, -13.4, -10.9, -8.6, -6.6, -4.8, -3.2, -1.9, -0.8, 0, 0.6, 1.0, 1.2, 1.3, 1.2, 1.0, 0.5].map((a) => 10 ** (a / 10));
    const remaining = d.shareByBand.reduce((s, sh, k) => s + aw[k]! * (1 - sh), 0) / aw.reduce((s, w) => s + w, 0);
    expect(d.gainIfPerfectDb).toBeCloseTo(-10 * Math.log10(remaining), 9);
    expect(mapped.elements[0]!.share).toBeGreaterThanOrEqual(mapped.elements[1]!.share);
  });

  it("draws the path from room centre through the door to the other room centre", () => {
    const path = mapped.paths[0]!;
    const strongest = byId["D"]!.share > byId["A:Ab|B:Bd"]!.share ? "D" : "A:Ab|B:Bd";
    expect(path.steps).toEqual([
      { kind: "space", spaceId: "A" },
      { kind: "element", elementId: strongest, linkId: WALL, refs: ["A:Ab|B:Bd", "D"] },
      { kind: "space", spaceId: "B" },
    ]);
    expect(path.polyline[0]).toMatchObject({ x: 2, y: 2.5, levelId: "L0" });
    expect(path.polyline[2]).toMatchObject({ x: 6, y: 2.5, levelId: "L0" });
    // The crossing point is the door's centre (1.45 m along the wall) or the wall's midpoint.
    expect(path.polyline[1]).toMatchObject(strongest === "D" ? { x: 4, y: 1.45 } : { x: 4, y: 2.5 });
  });

  it("takes the engine's exact gain for an element that is a whole link", () => {
    const floorless = mapResultToPlan(plan, built, {
      ...result,
      links: [{ id: "wall:A:Aa|0", share: 0.5, shareByBand: new Array(21).fill(0.5), gainIfPerfectDb: 3.01 }],
    });
    expect(floorless.elements[0]).toMatchObject({ elementId: "A:Aa|0", gainExact: true, gainIfPerfectDb: 3.01 });
  });
});
