import { describe, expect, it } from "vitest";
import { constructionCatalogue } from "../catalogue/catalogue.js";
import { elementsOfType } from "../document/elements.js";
import { serializePlan } from "../document/serialize.js";
import { validatePlan } from "../validation/validate.js";
import { generateSyntheticBuilding } from "./generate.js";
import { buildNetwork } from "../builder/build-network.js";

describe("generateSyntheticBuilding", () => {
  it("makes exactly the rooms asked for, on the levels asked for, with no problems", () => {
    const plan = generateSyntheticBuilding({ rooms: 500, levels: 3, seed: 7 });
    expect(elementsOfType(plan, "room")).toHaveLength(500);
    expect(elementsOfType(plan, "level")).toHaveLength(3);
    expect(validatePlan(plan, constructionCatalogue)).toEqual([]);
  });

  it("is the same plan for the same seed and another for another seed", () => {
    const a = serializePlan(generateSyntheticBuilding({ rooms: 40, levels: 2, seed: 1 }));
    expect(serializePlan(generateSyntheticBuilding({ rooms: 40, levels: 2, seed: 1 }))).toBe(a);
    expect(serializePlan(generateSyntheticBuilding({ rooms: 40, levels: 2, seed: 2 }))).not.toBe(a);
  });

  it("builds into a network with walls, floors, voids and ducts", () => {
    const r = buildNetwork(generateSyntheticBuilding({ rooms: 60, levels: 3, seed: 3 }), constructionCatalogue);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    const types = new Set(r.network.links!.map((l) => l.type));
    expect([...types].sort()).toEqual(["flanking", "floor", "partition", "vent"]);
  });
});

import fc from "fast-check";
import { parseNetwork, solveNetwork } from "@hushmark/acoustics";

describe("builder on random synthetic buildings (property)", () => {
  it("always gives a network the engine accepts and can solve", () => {
    fc.assert(
      fc.property(fc.integer({ min: 2, max: 40 }), fc.integer({ min: 1, max: 3 }), fc.integer({ min: 0, max: 1e6 }), (rooms, levels, seed) => {
        const plan = generateSyntheticBuilding({ rooms, levels, seed });
        const r = buildNetwork(plan, constructionCatalogue, { sources: [{ type: "airborne", spaceId: "r0-0-0", levelsDb: new Array(21).fill(80) }] });
        expect(r.ok).toBe(true);
        if (!r.ok) return;
        const parsed = parseNetwork(r.network);
        expect(parsed.ok ? [] : parsed.issues.slice(0, 3)).toEqual([]);
        if (!parsed.ok) return;
        const receiver = elementsOfType(plan, "room").at(-1)!.id;
        const solved = solveNetwork(parsed.value, { receiver, k: 2, gains: 2 });
        expect(solved.levelsDb.every((l) => Number.isFinite(l) || l === -Infinity)).toBe(true);
      }),
      { numRuns: 25 },
    );
  });
});
