/**
 * What "best" means: with a target, the cheapest combination that reaches it (ties: the quieter);
 * when nothing reaches it (or there is no target), the quietest A-weighted level (ties: the cheaper).
 */
import type { UpgradePlanner } from "./planner.js";

export interface Candidate {
  readonly chosen: readonly number[];
  readonly energy: Float64Array;
  readonly aEnergy: number;
  readonly cost: number;
  readonly meets: boolean;
}

export function candidate(planner: UpgradePlanner, chosen: readonly number[], energy: Float64Array): Candidate {
  return { chosen: [...chosen], energy, aEnergy: planner.aEnergy(energy), cost: planner.totals(chosen).cost, meets: planner.meetsTarget(energy) };
}

const REL = 1e-12;

/** True when a is better than b. */
export function better(a: Candidate, b: Candidate | undefined): boolean {
  if (b === undefined) return true;
  if (a.meets !== b.meets) return a.meets;
  if (a.meets) {
    if (a.cost < b.cost - 1e-9) return true;
    return a.cost <= b.cost + 1e-9 && a.aEnergy < b.aEnergy * (1 - REL);
  }
  if (a.aEnergy < b.aEnergy * (1 - REL)) return true;
  return a.aEnergy <= b.aEnergy * (1 + REL) && a.cost < b.cost - 1e-9;
}
