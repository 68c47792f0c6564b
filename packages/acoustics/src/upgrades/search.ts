/**
 * "Best within limits": the combination of options (at most one per link) that reaches the target
 * at the least cost, or, when nothing within the limits reaches it, lowers the A-weighted level
 * the most — within a budget, a floor-area limit, a labour limit and the flags the client allows.
 * Exact depth-first branch and bound up to `exactUpTo` eligible options (default 30): each node
 * is evaluated exactly, and pruned with the envelope and knapsack bounds of bounds.ts. Beyond that,
 * or when the node budget runs out, the heuristic of heuristic.ts (reported as not exact).
 */
import { isMonotoneDecrease } from "../network/perturb.js";
import { groupEnvelope, mergePerturbations, reductionBound, summariseGroups, type GroupSummary } from "./bounds.js";
import { eligibleOptions, withinLimits, type SearchLimits } from "./eligibility.js";
import { heuristicBest } from "./heuristic.js";
import { better, candidate, QUIETER, type Candidate } from "./objective.js";
import type { CombinationResult, UpgradePlanner } from "./planner.js";
import { energyToDb } from "../bands/levels.js";
import { spectrum, type Spectrum } from "../bands/spectrum.js";
import { shortfall } from "../network/targets.js";

export interface SearchOptions {
  /** Largest number of eligible options searched exactly (default 30). */
  readonly exactUpTo?: number;
  /** Node budget of the exact search (default 200 000). */
  readonly maxNodes?: number;
}

export interface BestResult {
  readonly chosen: readonly string[];
  readonly result: CombinationResult;
  readonly reachesTarget: boolean;
  readonly method: "branch-and-bound" | "heuristic";
  /** True when the answer is proven optimal. */
  readonly exact: boolean;
  readonly nodes: number;
  readonly evaluations: number;
  readonly excluded: readonly { readonly id: string; readonly reason: string }[];
}

interface Search {
  readonly planner: UpgradePlanner;
  readonly limits: SearchLimits;
  readonly groups: readonly (readonly number[])[];
  readonly summaries: readonly GroupSummary[];
  readonly envelopes: ReturnType<typeof groupEnvelope>[];
  readonly monotone: readonly boolean[];
  readonly maxNodes: number;
  readonly targetMode: boolean;
  best: Candidate | undefined;
  nodes: number;
  evaluations: number;
  aborted: boolean;
}

function meetsLower(s: Search, energy: Float64Array): boolean {
  const { planner } = s;
  if (!planner.request.target) return false;
  const levels = spectrum(planner.c.bands, Array.from(energy, (v) => energyToDb(Math.max(v, 0)))) as Spectrum;
  return shortfall(planner.request.target, levels, planner.baseDba).met;
}

function envelopeEnergy(s: Search, chosen: readonly number[], from: number): Float64Array {
  s.evaluations++;
  const current = chosen.length > 0 ? [s.planner.perturbation(chosen, true)] : [];
  return s.planner.evaluator.receiverEnergy(mergePerturbations([...current, ...s.envelopes.slice(from)]));
}

/** True when no completion of this node can beat the incumbent. */
function prune(s: Search, from: number, chosen: readonly number[], eClip: Float64Array): boolean {
  const { planner, limits, best } = s;
  if (best === undefined) return false;
  const t = planner.totals(chosen);
  const cheaperOnly = s.targetMode && best.meets;
  if (cheaperOnly && t.cost >= best.cost - 1e-9) return true;
  const remaining = s.groups.slice(from).map((_, k) => from + k);
  const budget = cheaperOnly ? Math.min(limits.budget ?? Infinity, best.cost) : limits.budget;
  const room = { cost: (budget ?? Infinity) - t.cost, labourH: (limits.labourH ?? Infinity) - t.labourH, areaM2: (limits.floorAreaM2 ?? Infinity) - t.floorAreaLostM2 };
  const lim = { ...limits, ...(budget !== undefined && Number.isFinite(budget) ? { budget } : {}) };
  // A completion matters if it can be meaningfully quieter, or about as quiet and cheaper.
  const quieter = (aLower: number) => !cheaperOnly && (aLower < best.aEnergy * QUIETER || (aLower < best.aEnergy / QUIETER && t.cost < best.cost - 1e-9));
  const canMeet = (lower: Float64Array) => s.targetMode && meetsLower(s, lower);
  const lowerA = planner.aEnergy(eClip) - reductionBound(s.summaries, remaining, room, lim, (g) => g.reductionA);
  const lowerBands = s.targetMode ? eClip.map((v, b) => Math.max(0, v - reductionBound(s.summaries, remaining, room, lim, (g) => g.reduction[b]!))) : eClip;
  if (!quieter(lowerA) && !canMeet(lowerBands)) return true;
  const env = envelopeEnergy(s, chosen, from);
  return !quieter(planner.aEnergy(env)) && !canMeet(env);
}

function visit(s: Search, from: number, chosen: number[], energy: Float64Array, eClip: Float64Array): void {
  if (s.aborted) return;
  if (++s.nodes > s.maxNodes) {
    s.aborted = true;
    return;
  }
  const here = candidate(s.planner, chosen, energy);
  if (better(here, s.best)) s.best = here;
  if (here.meets || from === s.groups.length) return;
  if (prune(s, from, chosen, eClip)) return;
  for (const i of s.groups[from]!) {
    const next = [...chosen, i];
    if (!withinLimits(s.planner.totals(next), s.limits)) continue;
    s.evaluations++;
    const e = s.planner.receiverEnergy(next);
    const clip = next.every((j) => s.monotone[j]) ? e : s.planner.receiverEnergy(next, true);
    visit(s, from + 1, next, e, clip);
  }
  visit(s, from + 1, chosen, energy, eClip);
}

function finish(planner: UpgradePlanner, best: Candidate, extra: Omit<BestResult, "chosen" | "result" | "reachesTarget">): BestResult {
  return {
    chosen: best.chosen.map((i) => planner.prepared[i]!.option.id),
    result: planner.describe(best.chosen, best.energy),
    reachesTarget: best.meets,
    ...extra,
  };
}

/** Best combination within the limits (see the module comment). */
export function bestWithinLimits(planner: UpgradePlanner, limits: SearchLimits = {}, options: SearchOptions = {}): BestResult {
  const singles = planner.prepared.map((_, i) => candidate(planner, [i], planner.receiverEnergy([i])));
  const { groups, excluded } = eligibleOptions(planner, limits, singles.map((c) => c.aEnergy));
  const eligible = groups.flat();
  const seed = heuristicBest(planner, eligible, limits, singles);
  const base = { nodes: 0, evaluations: 0, excluded };
  if (eligible.length > (options.exactUpTo ?? 30)) return finish(planner, seed, { ...base, method: "heuristic", exact: false });
  const clippedSingles = planner.prepared.map((_, i) => planner.receiverEnergy([i], true));
  const s: Search = {
    planner,
    limits,
    groups,
    summaries: summariseGroups(planner, groups, clippedSingles),
    envelopes: groups.map((g) => groupEnvelope(planner, g)),
    monotone: planner.prepared.map((_, i) => isMonotoneDecrease(planner.c, planner.perturbation([i]))),
    maxNodes: options.maxNodes ?? 200_000,
    targetMode: planner.request.target !== undefined,
    best: seed,
    nodes: 0,
    evaluations: 0,
    aborted: false,
  };
  visit(s, 0, [], planner.baseEnergy, planner.baseEnergy);
  const best = s.best ?? seed;
  return finish(planner, best, { nodes: s.nodes, evaluations: s.evaluations, excluded, method: "branch-and-bound", exact: !s.aborted });
}
