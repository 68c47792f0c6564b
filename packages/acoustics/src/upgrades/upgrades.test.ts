import { describe, expect, it } from "vitest";
import { parseNetwork } from "../network/parse.js";
import { solveNetwork } from "../network/solve.js";
import type { Network } from "../network/schema.js";
import { fernhollowNetwork, fernhollowOptions } from "../../test/fernhollow.js";
import { parseUpgradeOptions } from "./parse.js";
import { UpgradePlanner } from "./planner.js";
import { evaluateUpgrades, optionsAlone, evaluateCombination } from "./evaluate.js";
import { bestWithinLimits } from "./search.js";
import { costLevelFrontier } from "./pareto.js";
import { applyAction } from "./apply.js";
import type { UpgradeOption } from "./schema.js";
import { withinLimits } from "./eligibility.js";
import { LEVEL_TOLERANCE_DB } from "./objective.js";

function parsed(raw: unknown): Network {
  const p = parseNetwork(raw);
  if (!p.ok) throw new Error(JSON.stringify(p.issues));
  return p.value;
}

function options(net: Network, raw: unknown = fernhollowOptions()): UpgradeOption[] {
  const p = parseUpgradeOptions(raw, net);
  if (!p.ok) throw new Error(JSON.stringify(p.issues));
  return p.value.options;
}

const net = parsed(fernhollowNetwork());
const request = { source: "grinder", receiver: "control" } as const;

/** Receiver dB(A) with options applied by rewriting the network and solving it from scratch. */
function resolvedDba(network: Network, opts: readonly UpgradeOption[], source: string, receiver: string): number {
  const links = network.links.map((l) => opts.filter((o) => o.link === l.id).reduce((link, o) => applyAction(link, o.action), l));
  return solveNetwork({ ...network, links }, { source, receiver, k: 1, gains: 0 }).dba;
}

describe("each option alone", () => {
  it("matches a fresh solve of the changed network", () => {
    for (const src of ["grinder", "back-room", "tram", "dancing"]) {
      const planner = new UpgradePlanner(net, options(net), { source: src, receiver: "control" });
      for (const o of optionsAlone(planner)) {
        const opt = planner.prepared.find((p) => p.option.id === o.id)!.option;
        expect(o.dba).toBeCloseTo(resolvedDba(net, [opt], src, "control"), 6);
        expect(o.gainDb).toBeCloseTo(planner.baseDba - o.dba, 9);
      }
    }
  });
  it("prices options as fixed + per m² + per item and counts floor area lost", () => {
    const planner = new UpgradePlanner(net, options(net), request);
    const alone = new Map(optionsAlone(planner).map((o) => [o.id, o]));
    expect(alone.get("seal-gap")!.cost).toBe(40 + 5 * 4);
    expect(alone.get("party-lining")!.cost).toBeCloseTo(300 + 85 * 12, 9);
    expect(alone.get("party-lining")!.floorAreaLostM2).toBeCloseTo(0.5, 9);
    expect(alone.get("ceiling-barrier")!.cost).toBeCloseTo(45 * 18, 9);
    expect(alone.get("solid-door")!.gainPerCostDb).toBeCloseTo(alone.get("solid-door")!.gainDb / 650, 12);
  });
  it("evaluates a chosen combination like a fresh solve", () => {
    const planner = new UpgradePlanner(net, options(net), request);
    const ids = ["seal-gap", "ceiling-barrier", "duct-liner"];
    const r = evaluateCombination(planner, ids);
    const opts = planner.prepared.filter((p) => ids.includes(p.option.id)).map((p) => p.option);
    expect(r.dba).toBeCloseTo(resolvedDba(net, opts, "grinder", "control"), 6);
    expect(r.cost).toBeCloseTo(60 + 810 + 420, 9);
  });
});

describe("cautions and flags", () => {
  it("derives cautions from what the option touches", () => {
    const planner = new UpgradePlanner(net, options(net), request);
    const codes = (id: string) => planner.prepared.find((p) => p.option.id === id)!.cautions.map((c) => c.code);
    expect(codes("party-lining")).toContain("old-building"); // built 1962
    expect(codes("party-lining")).toContain("electrical");
    expect(codes("register-cover")).toContain("combustion-air");
    expect(codes("ceiling-barrier")).toContain("structural-load");
    expect(codes("resilient-ceiling")).toContain("structural-load");
    const rated = parseUpgradeOptions([{ id: "x", link: "booth-wall", action: { kind: "add-layer", delta_tl_db: 5 } }], net);
    if (!rated.ok) throw new Error("options");
    const p = new UpgradePlanner(net, rated.value.options, request);
    expect(p.prepared[0]!.cautions.map((c) => c.code)).toContain("fire-rated");
  });
  it("warns about escape openings for window work in sleeping rooms", () => {
    const raw = fernhollowNetwork();
    raw.spaces.find((s) => s.id === "control")!.sleeping_room = true;
    const n2 = parsed(raw);
    const planner = new UpgradePlanner(n2, options(n2), request);
    expect(planner.prepared.find((p) => p.option.id === "window-insert")!.cautions.map((c) => c.code)).toContain("escape-opening");
  });
  it("leaves out options with flags the client does not allow", () => {
    const planner = new UpgradePlanner(net, options(net), request);
    const r = bestWithinLimits(planner, { allowedFlags: ["changes-appearance"] });
    expect(r.chosen).not.toContain("cafe-ceiling-barrier");
    expect(r.excluded.map((e) => e.id)).toContain("cafe-ceiling-barrier");
  });
});

/** Every combination with at most one option per link, by brute force. */
function bruteForce(planner: UpgradePlanner, limits: Parameters<typeof withinLimits>[1]) {
  const byLink = new Map<number, number[]>();
  planner.prepared.forEach((p, i) => {
    const allowed = !limits.allowedFlags || p.option.flags.every((f) => limits.allowedFlags!.includes(f));
    if (allowed) byLink.set(p.link, [...(byLink.get(p.link) ?? []), i]);
  });
  const groups = [...byLink.values()];
  const all: { chosen: number[]; a: number; cost: number; meets: boolean }[] = [];
  const walk = (g: number, chosen: number[]) => {
    if (g === groups.length) {
      if (!withinLimits(planner.totals(chosen), limits)) return;
      const e = planner.receiverEnergy(chosen);
      all.push({ chosen, a: planner.aEnergy(e), cost: planner.totals(chosen).cost, meets: planner.meetsTarget(e) });
      return;
    }
    walk(g + 1, chosen);
    for (const i of groups[g]!) walk(g + 1, [...chosen, i]);
  };
  walk(0, []);
  return all;
}

/** How many dB the chosen combination is above the A-weighted energy `best`. */
function dbAbove(planner: UpgradePlanner, chosen: readonly string[], best: number): number {
  const indices = planner.prepared.flatMap((p, i) => (chosen.includes(p.option.id) ? [i] : []));
  return 10 * Math.log10(planner.aEnergy(planner.receiverEnergy(indices)) / best);
}

describe("best within limits", () => {
  for (const budget of [100, 700, 1500, 3000, 100000]) {
    it(`gains the most for a budget of ${budget}, as brute force does`, () => {
      const planner = new UpgradePlanner(net, options(net), request);
      const r = bestWithinLimits(planner, { budget });
      expect(r.exact).toBe(true);
      const best = Math.min(...bruteForce(planner, { budget }).map((c) => c.a));
      // Levels within LEVEL_TOLERANCE_DB (0.01 dB) count as equal: then the cheaper wins.
      expect(dbAbove(planner, r.chosen, best)).toBeLessThanOrEqual(LEVEL_TOLERANCE_DB + 1e-9);
      expect(r.result.cost).toBeLessThanOrEqual(budget + 1e-9);
    });
  }
  for (const dba of [45, 40, 35]) {
    it(`reaches ${dba} dB(A) at the least cost, as brute force does`, () => {
      const planner = new UpgradePlanner(net, options(net), { ...request, target: { kind: "level", dba } });
      const r = bestWithinLimits(planner, { labourH: 40 });
      const all = bruteForce(planner, { labourH: 40 });
      const meeting = all.filter((c) => c.meets);
      expect(r.reachesTarget).toBe(meeting.length > 0);
      if (meeting.length > 0) expect(r.result.cost).toBeCloseTo(Math.min(...meeting.map((c) => c.cost)), 6);
      else expect(dbAbove(planner, r.chosen, Math.min(...all.map((c) => c.a)))).toBeLessThanOrEqual(LEVEL_TOLERANCE_DB + 1e-9);
    });
  }
  it("falls back to the documented heuristic beyond the exact size", () => {
    const planner = new UpgradePlanner(net, options(net), request);
    const r = bestWithinLimits(planner, { budget: 1500 }, { exactUpTo: 3 });
    expect(r.method).toBe("heuristic");
    expect(r.exact).toBe(false);
    expect(r.result.cost).toBeLessThanOrEqual(1500);
    expect(r.result.gainDb).toBeGreaterThan(0);
  });
});

describe("cost–level frontier", () => {
  it("is non-dominated and exact for small option sets", () => {
    const planner = new UpgradePlanner(net, options(net), request);
    const f = costLevelFrontier(planner);
    expect(f.exact).toBe(true);
    for (let i = 1; i < f.points.length; i++) {
      expect(f.points[i]!.cost).toBeGreaterThan(f.points[i - 1]!.cost);
      expect(f.points[i]!.dba).toBeLessThan(f.points[i - 1]!.dba);
    }
    expect(f.points[0]!.cost).toBe(0);
  });
  it("samples when there are too many combinations, staying non-dominated", () => {
    const planner = new UpgradePlanner(net, options(net), request);
    const f = costLevelFrontier(planner, {}, 10, 4);
    expect(f.exact).toBe(false);
    for (let i = 1; i < f.points.length; i++) expect(f.points[i]!.dba).toBeLessThan(f.points[i - 1]!.dba);
  });
});

describe("the report and the options file", () => {
  it("reports base, options alone, best and frontier", () => {
    const r = evaluateUpgrades(net, options(net), { ...request, target: { kind: "reduction", db: 6 }, limits: { budget: 2500 } });
    expect(r.options).toHaveLength(fernhollowOptions().length);
    expect(r.base.shortfall!.shortfallDb).toBeCloseTo(6, 9);
    expect(r.best.result.cost).toBeLessThanOrEqual(2500);
    expect(r.frontier!.points.length).toBeGreaterThan(1);
  });
  it("names what is wrong and where", () => {
    const bad = fernhollowOptions() as any[];
    bad[0].link = "nowhere";
    bad[1].action.part = "window";
    bad[2].action.tl_db = [1, 2];
    bad[3].action.part = "wall";
    bad.push({ ...bad[4] });
    const p = parseUpgradeOptions(bad, net);
    if (p.ok) throw new Error("expected issues");
    const byPath = new Map(p.issues.map((i) => [i.path, i.message]));
    expect(byPath.get("$[0].link")).toMatch(/no link "nowhere"/);
    expect(byPath.get("$[1].action.part")).toMatch(/no part "window"/);
    expect(byPath.get("$[2].action.tl_db")).toMatch(/has 2 values/);
    expect(byPath.get("$[3].action.part")).toMatch(/not an open gap/);
    expect(byPath.get(`$[${bad.length - 1}].id`)).toMatch(/duplicate option id/);
    const shape = parseUpgradeOptions({ options: [{ id: "a", link: "duct", action: { kind: "paint" } }] }, net);
    if (shape.ok) throw new Error("expected issues");
    expect(shape.issues[0]!.path).toBe("$.options[0].action.kind");
  });
});
