import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { parseNetwork } from "../network/parse.js";
import { parseUpgradeOptions } from "./parse.js";
import { UpgradePlanner } from "./planner.js";
import { bestWithinLimits } from "./search.js";
import { withinLimits } from "./eligibility.js";
import { LEVEL_TOLERANCE_DB } from "./objective.js";
import { rising } from "../../test/networks.js";

/** Source and receiver joined by `n` links of comparable strength, two options on each. */
function parallelCase(n: number, tl: number[], gains: number[], costs: number[]) {
  const links = Array.from({ length: n }, (_, i) => ({
    id: `l${i}`,
    between: ["src", "rcv"],
    parts: [{ id: "wall", area_m2: 4, tl_db: rising(tl[i]!, 0.8) }, { id: "gap", area_m2: 0.001, open: true }],
  }));
  const raw = {
    spaces: [{ id: "src", kind: "room", volume_m3: 50, absorption_m2: 20 }, { id: "rcv", kind: "room", volume_m3: 50, absorption_m2: 15 }],
    links,
    sources: [{ space: "src", levels_db: new Array(21).fill(85) }],
  };
  const net = parseNetwork(raw);
  if (!net.ok) throw new Error(JSON.stringify(net.issues));
  const options = links.flatMap((l, i) => [
    { id: `seal${i}`, link: l.id, action: { kind: "seal-leak", part: "gap" }, cost: { fixed: costs[i]! / 4 } },
    { id: `layer${i}`, link: l.id, action: { kind: "add-layer", part: "wall", delta_tl_db: gains[i]! }, cost: { fixed: costs[i]! } },
  ]);
  const parsed = parseUpgradeOptions(options, net.value);
  if (!parsed.ok) throw new Error(JSON.stringify(parsed.issues));
  return { network: net.value, options: parsed.value.options };
}

function bruteBest(planner: UpgradePlanner, budget: number) {
  const groups = new Map<number, number[]>();
  planner.prepared.forEach((p, i) => groups.set(p.link, [...(groups.get(p.link) ?? []), i]));
  const gs = [...groups.values()];
  let bestA = Infinity;
  let cheapestMeeting = Infinity;
  const walk = (g: number, chosen: number[]) => {
    if (g === gs.length) {
      if (!withinLimits(planner.totals(chosen), { budget })) return;
      const e = planner.receiverEnergy(chosen);
      bestA = Math.min(bestA, planner.aEnergy(e));
      if (planner.meetsTarget(e)) cheapestMeeting = Math.min(cheapestMeeting, planner.totals(chosen).cost);
      return;
    }
    walk(g + 1, chosen);
    for (const i of gs[g]!) walk(g + 1, [...chosen, i]);
  };
  walk(0, []);
  return { bestA, cheapestMeeting };
}

describe("branch and bound against brute force (fast-check)", () => {
  it("finds the quietest combination within any budget, or the cheapest that meets a target", () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 2, max: 5 }).chain((n) =>
          fc.record({
            n: fc.constant(n),
            tl: fc.array(fc.double({ min: 25, max: 45, noNaN: true }), { minLength: n, maxLength: n }),
            gains: fc.array(fc.double({ min: 2, max: 20, noNaN: true }), { minLength: n, maxLength: n }),
            costs: fc.array(fc.integer({ min: 50, max: 1000 }), { minLength: n, maxLength: n }),
            budgetShare: fc.double({ min: 0, max: 1, noNaN: true }),
            reduction: fc.double({ min: 1, max: 15, noNaN: true }),
          }),
        ),
        (g) => {
          const { network, options } = parallelCase(g.n, g.tl, g.gains, g.costs);
          const total = g.costs.reduce((s, c) => s + 1.25 * c, 0);
          const budget = total * g.budgetShare;
          const free = new UpgradePlanner(network, options, { receiver: "rcv" });
          const r = bestWithinLimits(free, { budget });
          const brute = bruteBest(free, budget);
          expect(r.exact).toBe(true);
          expect(r.result.cost).toBeLessThanOrEqual(budget + 1e-9);
          expect(10 * Math.log10(free.aEnergy(free.receiverEnergy(indices(free, r.chosen))) / brute.bestA)).toBeLessThanOrEqual(LEVEL_TOLERANCE_DB + 1e-9);
          const targeted = new UpgradePlanner(network, options, { receiver: "rcv", target: { kind: "reduction", db: g.reduction } });
          const t = bestWithinLimits(targeted, { budget });
          const bt = bruteBest(targeted, budget);
          expect(t.reachesTarget).toBe(Number.isFinite(bt.cheapestMeeting));
          if (t.reachesTarget) expect(t.result.cost).toBeCloseTo(bt.cheapestMeeting, 6);
        },
      ),
      { numRuns: 60 },
    );
  });
});

function indices(planner: UpgradePlanner, ids: readonly string[]): number[] {
  return planner.prepared.flatMap((p, i) => (ids.includes(p.option.id) ? [i] : []));
}
