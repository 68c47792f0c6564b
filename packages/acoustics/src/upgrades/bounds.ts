/**
 * Lower bounds on the receiver energy reachable from a partial selection, for branch and bound.
 *
 * 1. Envelope: the current selection (clipped to never raise transmission) plus, on every
 *    remaining link, the band-wise lowest transmission of its options. By monotonicity of the
 *    power balance no completion can do better, whatever the limits.
 * 2. Knapsack: every walk's energy reduction by a set of changes is at most the sum of the
 *    reductions by each change alone (1 − Π fᵢ ≤ Σ (1 − fᵢ) for factors fᵢ ∈ [0, 1]), and a change
 *    removes no more after other reductions than at the start. So the energy is at least the
 *    current one minus the largest sum of single-option reductions the limits allow, bounded by
 *    a fractional knapsack (per link: largest reduction, cheapest cost).
 */
import type { LinkWeightChange, InjectionChange, Perturbation } from "../network/perturb.js";
import type { UpgradePlanner } from "./planner.js";
import type { SearchLimits } from "./eligibility.js";

/** Band-wise lowest transmission over a group of options (each clipped to the base). */
export function groupEnvelope(planner: UpgradePlanner, group: readonly number[]): Perturbation {
  const parts = group.map((i) => planner.perturbation([i], true));
  const first = parts[0] as Perturbation;
  const links: LinkWeightChange[] = first.links.map((ch) => ({ link: ch.link, weight: Float64Array.from(ch.weight) }));
  const injections: InjectionChange[] = (first.injections ?? []).map((inj) => ({ node: inj.node, delta: Float64Array.from(inj.delta) }));
  for (const p of parts.slice(1)) {
    p.links.forEach((ch, k) => ch.weight.forEach((w, b) => (links[k]!.weight[b] = Math.min(links[k]!.weight[b]!, w))));
    (p.injections ?? []).forEach((inj, k) => inj.delta.forEach((d, b) => (injections[k]!.delta[b] = Math.min(injections[k]!.delta[b]!, d))));
  }
  return { links, injections };
}

/** Merge perturbations on different links. */
export function mergePerturbations(ps: readonly Perturbation[]): Perturbation {
  return { links: ps.flatMap((p) => p.links), injections: ps.flatMap((p) => p.injections ?? []) };
}

interface Item {
  readonly value: number;
  readonly weight: number;
}

/** Fractional knapsack: the largest value of items with total weight ≤ capacity (items may be split). */
export function fractionalKnapsack(items: readonly Item[], capacity: number): number {
  const sorted = [...items].sort((a, b) => b.value * a.weight - a.value * b.weight);
  let room = capacity;
  let total = 0;
  for (const it of sorted) {
    if (it.value <= 0) continue;
    if (it.weight <= room) {
      total += it.value;
      room -= it.weight;
    } else {
      if (it.weight > 0) total += (it.value * room) / it.weight;
      break;
    }
  }
  return total;
}

export interface GroupSummary {
  /** Largest single-option reduction per band (clipped), energy. */
  readonly reduction: Float64Array;
  readonly reductionA: number;
  readonly minCost: number;
  readonly minLabour: number;
  readonly minArea: number;
}

/** Per group: the largest clipped single reduction and the smallest cost, labour and area. */
export function summariseGroups(planner: UpgradePlanner, groups: readonly (readonly number[])[], clippedSingle: readonly Float64Array[]): GroupSummary[] {
  const B = planner.c.B;
  return groups.map((g) => {
    const reduction = new Float64Array(B);
    for (const i of g) for (let b = 0; b < B; b++) reduction[b] = Math.max(reduction[b]!, planner.baseEnergy[b]! - clippedSingle[i]![b]!);
    const t = g.map((i) => planner.totals([i]));
    return {
      reduction,
      reductionA: planner.aEnergy(reduction),
      minCost: Math.min(...t.map((x) => x.cost)),
      minLabour: Math.min(...t.map((x) => x.labourH)),
      minArea: Math.min(...t.map((x) => x.floorAreaLostM2)),
    };
  });
}

/** Upper bound on the summed single reductions of the remaining groups under the remaining limits. */
export function reductionBound(
  summaries: readonly GroupSummary[],
  remaining: readonly number[],
  room: { cost: number; labourH: number; areaM2: number },
  limits: SearchLimits,
  value: (s: GroupSummary) => number,
): number {
  const all = remaining.reduce((s, g) => s + value(summaries[g]!), 0);
  let best = all;
  const items = (w: (s: GroupSummary) => number) => remaining.map((g) => ({ value: value(summaries[g]!), weight: w(summaries[g]!) }));
  if (limits.budget !== undefined) best = Math.min(best, fractionalKnapsack(items((s) => s.minCost), Math.max(0, room.cost)));
  if (limits.labourH !== undefined) best = Math.min(best, fractionalKnapsack(items((s) => s.minLabour), Math.max(0, room.labourH)));
  if (limits.floorAreaM2 !== undefined) best = Math.min(best, fractionalKnapsack(items((s) => s.minArea), Math.max(0, room.areaM2)));
  return best;
}
