import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { constructionCatalogue, fernhollowStudioPlan } from "@hushmark/floorplan";
import { priceBookItemSchema, type PriceBookItem, type ScenarioSetup, type UpgradeFlagName } from "@hushmark/schemas";
import { DEMO_PRICE_BOOK } from "../price-book/demo-price-book.js";
import { runOptionSearch } from "./option-search.js";
import { evaluateScenario } from "./scenario-evaluate.js";

const items: PriceBookItem[] = DEMO_PRICE_BOOK.map((i, k) => priceBookItemSchema.parse({ ...i, id: `00000000-0000-4000-8000-${String(k).padStart(12, "0")}`, updatedAt: "2026-01-01T00:00:00.000Z" }));
const plan = fernhollowStudioPlan();
const setup: ScenarioSetup = { planVersion: 1, source: { kind: "airborne", spaceId: "cafe", spectrum: { kind: "library", id: "speech-raised" } }, receiverId: "record", target: { kind: "nc", nc: 20 } };
const elementIds = ["door-studio", "outlet-party", "supply-duct", "shopfront", "cafe:cafe4|record:record2"];
const FLAGS: UpgradeFlagName[] = ["blocks-daylight", "reduces-ventilation", "structural-work", "neighbour-access", "changes-appearance"];

function search(limits: Parameters<typeof runOptionSearch>[0]["limits"]) {
  const r = runOptionSearch({ document: plan, setup, elementIds, items, limits, catalogue: constructionCatalogue });
  if (!r.ok) throw new Error(r.message);
  return r.result;
}

describe("option search over the demo plan and price book", () => {
  const open = search({});

  it("ranks single upgrades by the dB they gain, each equal to evaluating it alone as a scenario", () => {
    const gains = open.ranking.map((r) => r.gainDb);
    expect([...gains].sort((a, b) => b - a)).toEqual(gains);
    for (const r of open.ranking.slice(0, 4)) {
      const item = items.find((i) => i.id === r.priceBookItemId)!;
      const ev = evaluateScenario(plan, setup, [{ key: "x", item, elementId: r.elementId }], constructionCatalogue);
      if (!ev.ok) throw new Error(ev.message);
      expect(ev.evaluation.after.dba).toBeCloseTo(r.dba, 9);
      // Scenario lines are rounded to cents (materials and labour each); the engine's cost is exact.
      expect(Math.abs(ev.evaluation.totals.cost - r.cost)).toBeLessThanOrEqual(0.011);
    }
  });

  it("gives a frontier that is cheaper-and-louder to dearer-and-quieter", () => {
    const pts = open.frontier.points;
    expect(pts.length).toBeGreaterThan(2);
    for (let i = 1; i < pts.length; i++) {
      expect(pts[i]!.cost).toBeGreaterThanOrEqual(pts[i - 1]!.cost);
      expect(pts[i]!.dba).toBeLessThan(pts[i - 1]!.dba);
    }
  });

  it("respects every limit: budget, floor area, labour and allowed flags (property)", () => {
    fc.assert(
      fc.property(
        fc.record({
          budget: fc.option(fc.integer({ min: 0, max: 6000 }), { nil: undefined }),
          floorAreaM2: fc.option(fc.double({ min: 0, max: 1, noNaN: true }), { nil: undefined }),
          labourHours: fc.option(fc.integer({ min: 0, max: 40 }), { nil: undefined }),
          allowedFlags: fc.option(fc.subarray(FLAGS), { nil: undefined }),
        }),
        (raw) => {
          const limits = Object.fromEntries(Object.entries(raw).filter(([, v]) => v !== undefined));
          const best = search(limits).best;
          if (raw.budget !== undefined) expect(best.cost).toBeLessThanOrEqual(raw.budget + 1e-6);
          if (raw.floorAreaM2 !== undefined) expect(best.floorAreaLostM2).toBeLessThanOrEqual(raw.floorAreaM2 + 1e-9);
          if (raw.labourHours !== undefined) expect(best.labourHours).toBeLessThanOrEqual(raw.labourHours + 1e-9);
          const chosen = best.items.map((c) => items.find((i) => i.id === c.priceBookItemId)!);
          if (raw.allowedFlags) for (const item of chosen) for (const f of item.flags) expect(raw.allowedFlags).toContain(f);
          // The chosen set, evaluated as a scenario, gives the search's own figures.
          const ev = evaluateScenario(plan, setup, best.items.map((c, k) => ({ key: `k${k}`, item: chosen[k]!, elementId: c.elementId })), constructionCatalogue);
          if (!ev.ok) throw new Error(ev.message);
          expect(ev.evaluation.after.dba).toBeCloseTo(best.dba, 6);
          expect(Math.abs(ev.evaluation.totals.cost - best.cost)).toBeLessThanOrEqual(0.011 * best.items.length);
        },
      ),
      { numRuns: 25, seed: 7 },
    );
  });

  it("explains why a quieter set was not chosen when the budget stops it", () => {
    const tight = search({ budget: 300 });
    const quieter = tight.best.alternatives.find((a) => a.dba < tight.best.dba);
    expect(quieter?.whyNot).toMatch(/over the budget of 300\.00/);
    expect(quieter!.cost).toBeGreaterThan(300);
  });
});
