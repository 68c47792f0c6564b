/**
 * What "best" means: with a target, the cheapest combination that reaches it (ties: the quieter);
 * when nothing reaches it (or there is no target), the quietest A-weighted level, where levels
 * within LEVEL_TOLERANCE_DB count as equal and the cheaper wins (so an option worth 0.001 dB is
 * never bought).
 */
import type { UpgradePlanner } from "./planner.js";

export interface Candidate {
  readonly chosen: readonly number[];
  readonly energy: Float64Array;
  readonly aEnergy: number;
  readonly cost: number;
  readonly meets: boolean;
}

/** A combination with its receiver energies, A-weighted energy, cost (currency units) and target status. */
export function candidate(planner: UpgradePlanner, chosen: readonly number[], energy: Float64Array): Candidate {
  return { chosen: [...chosen], energy, aEnergy: planner.aEnergy(energy), cost: planner.totals(chosen).cost, meets: planner.meetsTarget(energy) };
}

/** Levels closer than this (dB) are treated as equal by the searches. */
export const LEVEL_TOLERANCE_DB = 0.01;
/** Energy factor of LEVEL_TOLERANCE_DB: a is meaningfully quieter than b when a < b·QUIETER. */
export const QUIETER = Math.pow(10, -LEVEL_TOLERANCE_DB / 10);

/** True when a is better than b. */
export function better(a: Candidate, b: Candidate | undefined): boolean {
  if (b === undefined) return true;
  if (a.meets !== b.meets) return a.meets;
  if (a.meets) {
    if (a.cost < b.cost - 1e-9) return true;
    return a.cost <= b.cost + 1e-9 && a.aEnergy < b.aEnergy * QUIETER;
  }
  if (a.aEnergy < b.aEnergy * QUIETER) return true;
  return a.aEnergy < b.aEnergy / QUIETER && a.cost < b.cost - 1e-9;
}
