/**
 * The heuristic for large option sets (beyond the exact search's size): greedy by A-weighted gain
 * per cost with exact re-evaluation of every marginal gain, compared with the best single option,
 * then a local search that swaps, adds or drops one option while that improves the objective.
 * No optimality guarantee; each step is an exact evaluation.
 */
import { better, candidate, QUIETER, type Candidate } from "./objective.js";
import type { UpgradePlanner } from "./planner.js";
import { withinLimits, type SearchLimits } from "./eligibility.js";

function fits(planner: UpgradePlanner, chosen: readonly number[], limits: SearchLimits): boolean {
  return withinLimits(planner.totals(chosen), limits);
}

function linksOf(planner: UpgradePlanner, chosen: readonly number[]): Set<number> {
  return new Set(chosen.map((i) => planner.prepared[i]!.link));
}

/** Greedy selection: repeatedly the option with the best exact marginal gain per cost. */
export function greedySelection(planner: UpgradePlanner, options: readonly number[], limits: SearchLimits): Candidate {
  let current = candidate(planner, [], planner.baseEnergy);
  for (;;) {
    if (current.meets) return current;
    const used = linksOf(planner, current.chosen);
    let best: { c: Candidate; score: number } | undefined;
    for (const i of options) {
      if (used.has(planner.prepared[i]!.link)) continue;
      const chosen = [...current.chosen, i];
      if (!fits(planner, chosen, limits)) continue;
      const c = candidate(planner, chosen, planner.receiverEnergy(chosen));
      const gain = current.aEnergy - c.aEnergy;
      if (c.aEnergy >= current.aEnergy * QUIETER && !c.meets) continue;
      const cost = planner.totals([i]).cost;
      const score = (c.meets ? 1e300 : 0) + gain / Math.max(cost, 1e-9);
      if (best === undefined || score > best.score) best = { c, score };
    }
    if (best === undefined) return current;
    current = best.c;
  }
}

/** One-option moves (drop, add, swap) while they improve; at most `maxRounds` rounds. */
export function localImprovement(planner: UpgradePlanner, start: Candidate, options: readonly number[], limits: SearchLimits, maxRounds = 20): Candidate {
  let current = start;
  for (let round = 0; round < maxRounds; round++) {
    let improved = false;
    const moves: number[][] = [];
    const chosen = current.chosen;
    chosen.forEach((_, k) => moves.push(chosen.filter((__, j) => j !== k)));
    for (const i of options) {
      if (chosen.includes(i)) continue;
      const link = planner.prepared[i]!.link;
      const rest = chosen.filter((j) => planner.prepared[j]!.link !== link);
      moves.push([...rest, i]);
    }
    for (const m of moves) {
      if (!fits(planner, m, limits)) continue;
      const c = candidate(planner, m, planner.receiverEnergy(m));
      if (better(c, current)) {
        current = c;
        improved = true;
      }
    }
    if (!improved) break;
  }
  return current;
}

/** The heuristic's answer: the better of greedy and the best single option, locally improved. */
export function heuristicBest(planner: UpgradePlanner, options: readonly number[], limits: SearchLimits, singles: readonly Candidate[]): Candidate {
  let best = greedySelection(planner, options, limits);
  for (const i of options) if (better(singles[i]!, best)) best = singles[i]!;
  return localImprovement(planner, best, options, limits);
}
