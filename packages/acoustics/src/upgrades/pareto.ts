/**
 * The cost–benefit frontier: the Pareto set of (cost, received A-weighted level) over option
 * combinations (at most one option per link, flags and area/labour limits respected; the budget
 * is the chart's axis, so it is not applied). Exact by enumeration when the combinations are few
 * enough; otherwise sampled: the exact best-within-budget at a ladder of budgets plus every single
 * option, then reduced to the non-dominated points.
 */
import { candidate, QUIETER, type Candidate } from "./objective.js";
import { eligibleOptions, withinLimits, type SearchLimits } from "./eligibility.js";
import type { UpgradePlanner } from "./planner.js";
import { bestWithinLimits } from "./search.js";
import { energyToDb } from "../bands/levels.js";

export interface FrontierPoint {
  readonly cost: number;
  readonly dba: number;
  readonly options: readonly string[];
}

export interface Frontier {
  readonly points: readonly FrontierPoint[];
  readonly exact: boolean;
  readonly combinationsEvaluated: number;
}

function enumerate(planner: UpgradePlanner, groups: readonly (readonly number[])[], limits: SearchLimits): Candidate[] {
  const out: Candidate[] = [];
  const walk = (g: number, chosen: number[]) => {
    if (g === groups.length) {
      out.push(candidate(planner, chosen, planner.receiverEnergy(chosen)));
      return;
    }
    walk(g + 1, chosen);
    for (const i of groups[g]!) {
      const next = [...chosen, i];
      if (withinLimits(planner.totals(next), limits)) walk(g + 1, next);
    }
  };
  walk(0, []);
  return out;
}

/** Non-dominated points: cheapest first, each meaningfully quieter (LEVEL_TOLERANCE_DB) than every cheaper one. */
export function nonDominated(planner: UpgradePlanner, cands: readonly Candidate[]): FrontierPoint[] {
  const sorted = [...cands].sort((a, b) => a.cost - b.cost || a.aEnergy - b.aEnergy);
  const out: FrontierPoint[] = [];
  let quietest = Infinity;
  for (const c of sorted) {
    if (c.aEnergy < quietest * QUIETER) {
      quietest = c.aEnergy;
      out.push({ cost: c.cost, dba: energyToDb(c.aEnergy), options: c.chosen.map((i) => planner.prepared[i]!.option.id) });
    }
  }
  return out;
}

/** The cost–level frontier (see the module comment). */
export function costLevelFrontier(planner: UpgradePlanner, limits: SearchLimits = {}, maxCombinations = 4096, budgetSteps = 12): Frontier {
  const free = planner.withoutTarget();
  const { budget: _budget, ...rest } = limits;
  const singles = free.prepared.map((_, i) => candidate(free, [i], free.receiverEnergy([i])));
  const { groups } = eligibleOptions(free, rest, singles.map((c) => c.aEnergy));
  const combinations = groups.reduce((n, g) => n * (g.length + 1), 1);
  if (combinations <= maxCombinations) {
    const all = enumerate(free, groups, rest);
    return { points: nonDominated(free, all), exact: true, combinationsEvaluated: all.length };
  }
  const cands: Candidate[] = [candidate(free, [], free.baseEnergy), ...groups.flat().map((i) => singles[i]!)];
  const total = groups.reduce((s, g) => s + Math.max(...g.map((i) => free.totals([i]).cost)), 0);
  for (let k = 1; k <= budgetSteps; k++) {
    const r = bestWithinLimits(free, { ...rest, budget: (total * k) / budgetSteps }, { maxNodes: 20_000 });
    const ids = new Set(r.chosen);
    const chosen = free.prepared.flatMap((p, i) => (ids.has(p.option.id) ? [i] : []));
    cands.push(candidate(free, chosen, free.receiverEnergy(chosen)));
  }
  return { points: nonDominated(free, cands), exact: false, combinationsEvaluated: cands.length };
}
