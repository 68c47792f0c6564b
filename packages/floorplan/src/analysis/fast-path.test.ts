// The analysis skips the engine's schema pass for builder output and the engine stops each band
// on its own: these tests hold both to what the strict path and plain linear algebra give.
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { parseNetwork } from "@hushmark/acoustics";
import { denseLevels } from "../../test/dense-levels.js";
import { buildNetwork } from "../builder/build-network.js";
import { constructionCatalogue } from "../catalogue/catalogue.js";
import { demoPlans } from "../demo/demo-plans.js";
import { elementsOfType } from "../document/elements.js";
import { generateSyntheticBuilding } from "../synthetic/generate.js";
import { solvePlan } from "./analyse.js";

const loud = new Array<number>(21).fill(90);

describe("the builder's network needs no schema pass", () => {
  it("parses to exactly itself, for random synthetic buildings", () => {
    fc.assert(
      fc.property(fc.integer({ min: 2, max: 60 }), fc.integer({ min: 1, max: 3 }), fc.integer({ min: 0, max: 1e6 }), fc.boolean(), (rooms, levels, seed, tiles) => {
        const plan = generateSyntheticBuilding({ rooms, levels, seed, ...(tiles ? { tileCeilingShare: 1 } : {}) });
        const built = buildNetwork(plan, constructionCatalogue, { sources: [{ type: "airborne", spaceId: "r0-0-0", levelsDb: loud }] });
        if (!built.ok) throw new Error(built.problems[0]!.message);
        const parsed = parseNetwork(built.network);
        expect(parsed.ok ? [] : parsed.issues.slice(0, 3)).toEqual([]);
        if (parsed.ok) expect(parsed.value).toEqual(built.network);
      }),
      { numRuns: 20 },
    );
  });

  it("parses to exactly itself for the demo plans, airborne and impact", () => {
    for (const demo of demoPlans()) {
      const rooms = elementsOfType(demo.plan, "room");
      for (const sources of [[{ type: "airborne" as const, spaceId: rooms[0]!.id, levelsDb: loud }], rooms.map((r) => ({ type: "impact" as const, roomId: r.id }))]) {
        const built = buildNetwork(demo.plan, constructionCatalogue, { sources });
        if (!built.ok) throw new Error(built.problems[0]!.message);
        const parsed = parseNetwork(built.network);
        expect(parsed.ok && parsed.value).toEqual(built.network);
      }
    }
  });
});

describe("solvePlan against dense linear algebra on a synthetic building", () => {
  it("gives every space's band levels within 1e-6 dB of Gaussian elimination", () => {
    // Lay-in tile ceilings couple whole rows through the voids: the slowest case for the sweeps.
    const plan = generateSyntheticBuilding({ rooms: 90, levels: 3, seed: 11, tileCeilingShare: 1 });
    const rooms = elementsOfType(plan, "room");
    const r = solvePlan(plan, constructionCatalogue, { source: { spaceId: rooms[0]!.id, spectrumId: "music-amplified-bass" }, receiver: rooms.at(-1)!.id, k: 3 });
    if (!r.ok) throw new Error(r.problems[0]!.message);
    const raw = r.built.network;
    expect(raw.links.some((l) => l.type === "flanking")).toBe(true);
    const dense = denseLevels(raw);
    let compared = 0;
    for (const s of r.result.spaces) {
      const expected = dense.get(s.id)!;
      s.levelsDb.forEach((v, b) => {
        // The engine ignores energies 250 dB below the source (docs/acoustics-model.md).
        if (!(expected[b]! > -150)) return;
        expect(Math.abs(v - expected[b]!), `${s.id} band ${b}`).toBeLessThan(1e-6);
        compared++;
      });
    }
    expect(compared).toBeGreaterThan(90 * 21 * 0.9);
    // The exact gain of the two strongest links: a dense re-solve without each of them.
    const rx = r.result.receiver;
    for (const link of r.result.links.slice(0, 2)) {
      expect(link.gainIfPerfectByBandDb).toBeDefined();
      const without = denseLevels({ ...raw, links: raw.links.filter((l) => l.id !== link.id) }).get(rx)!;
      link.gainIfPerfectByBandDb!.forEach((g, b) => {
        if (r.result.levelsDb[b]! > -150) expect(Math.abs(g - (r.result.levelsDb[b]! - without[b]!)), `${link.id} band ${b}`).toBeLessThan(1e-6);
      });
    }
  });
});
