/**
 * evaluateUpgrades: each option alone (gain at the receiver, per currency unit), the best
 * combination within the limits, and the cost–level frontier.
 */
import type { Network } from "../network/schema.js";
import type { Target } from "../network/targets.js";
import { ratingNc } from "../ratings/nc.js";
import { spectrum, type Spectrum } from "../bands/spectrum.js";
import { energyToDb } from "../bands/levels.js";
import { shortfall, type Shortfall } from "../network/targets.js";
import type { SearchLimits } from "./eligibility.js";
import { costLevelFrontier, type Frontier } from "./pareto.js";
import { UpgradePlanner, type CombinationResult } from "./planner.js";
import type { UpgradeOption } from "./schema.js";
import { bestWithinLimits, type BestResult, type SearchOptions } from "./search.js";

export interface OptionAlone extends CombinationResult {
  readonly id: string;
  readonly name?: string;
  readonly link: string;
  /** A-weighted gain per currency unit, dB; null for a free option. */
  readonly gainPerCostDb: number | null;
  readonly notes: readonly string[];
}

export interface UpgradeReport {
  readonly base: { readonly levelsDb: readonly number[]; readonly dba: number; readonly nc: number; readonly shortfall?: Shortfall };
  readonly options: readonly OptionAlone[];
  readonly best: BestResult;
  readonly frontier?: Frontier;
  /** The combination asked for with `combine`. */
  readonly combination?: CombinationResult;
}

export interface UpgradeReportRequest {
  readonly source?: string;
  readonly receiver: string;
  readonly target?: Target;
  readonly limits?: SearchLimits;
  readonly search?: SearchOptions;
  /** Compute the cost–level frontier (default true). */
  readonly frontier?: boolean;
  /** Option ids to evaluate together as a chosen combination. */
  readonly combine?: readonly string[];
}

/** Each option alone, in the order given. */
export function optionsAlone(planner: UpgradePlanner): OptionAlone[] {
  return planner.prepared.map((p, i) => {
    const r = planner.describe([i]);
    const estimate = p.option.action.kind === "replace-part" && p.option.action.estimate ? ["the new construction's TL is an estimate"] : [];
    return {
      ...r,
      id: p.option.id,
      ...(p.option.name !== undefined ? { name: p.option.name } : {}),
      link: p.option.link,
      gainPerCostDb: r.cost > 0 ? r.gainDb / r.cost : null,
      notes: [...p.costs.notes, ...estimate],
    };
  });
}

/** The full upgrade report for a network and its options. */
export function evaluateUpgrades(network: Network, options: readonly UpgradeOption[], request: UpgradeReportRequest): UpgradeReport {
  const planner = new UpgradePlanner(network, options, request);
  const levels = spectrum(planner.c.bands, Array.from(planner.baseEnergy, energyToDb)) as Spectrum;
  return {
    base: {
      levelsDb: levels.values,
      dba: planner.baseDba,
      nc: ratingNc(levels).value,
      ...(request.target ? { shortfall: shortfall(request.target, levels, planner.baseDba) } : {}),
    },
    options: optionsAlone(planner),
    best: bestWithinLimits(planner, request.limits ?? {}, request.search ?? {}),
    ...(request.frontier === false ? {} : { frontier: costLevelFrontier(planner, request.limits ?? {}) }),
    ...(request.combine ? { combination: evaluateCombination(planner, request.combine) } : {}),
  };
}

/** One chosen combination of option ids. */
export function evaluateCombination(planner: UpgradePlanner, ids: readonly string[]): CombinationResult {
  const indices = ids.map((id) => {
    const i = planner.prepared.findIndex((p) => p.option.id === id);
    if (i < 0) throw new RangeError(`no option "${id}"`);
    return i;
  });
  return planner.describe(indices);
}
