/** Which options a search may use under the client's limits, grouped by link (at most one per link). */
import type { UpgradePlanner } from "./planner.js";
import type { UpgradeFlag } from "./schema.js";
import { LEVEL_TOLERANCE_DB, QUIETER } from "./objective.js";

export interface SearchLimits {
  /** Money, currency units. */
  readonly budget?: number;
  readonly floorAreaM2?: number;
  readonly labourH?: number;
  /** Flags the client accepts; omitted: all. */
  readonly allowedFlags?: readonly UpgradeFlag[];
}

export interface Eligibility {
  /** Option indices per link, each group sorted by single-option gain (best first); groups sorted likewise. */
  readonly groups: readonly (readonly number[])[];
  readonly excluded: readonly { readonly id: string; readonly reason: string }[];
}

const EPS = 1e-9;

/** True when the totals fit the limits. */
export function withinLimits(t: { cost: number; labourH: number; floorAreaLostM2: number }, limits: SearchLimits): boolean {
  return (
    (limits.budget === undefined || t.cost <= limits.budget + EPS) &&
    (limits.labourH === undefined || t.labourH <= limits.labourH + EPS) &&
    (limits.floorAreaM2 === undefined || t.floorAreaLostM2 <= limits.floorAreaM2 + EPS)
  );
}

/** Options a search may use, and why the others are left out. */
export function eligibleOptions(planner: UpgradePlanner, limits: SearchLimits, singleAEnergy: readonly number[]): Eligibility {
  const excluded: { id: string; reason: string }[] = [];
  const byLink = new Map<number, number[]>();
  planner.prepared.forEach((p, i) => {
    const banned = limits.allowedFlags ? p.option.flags.filter((f) => !limits.allowedFlags!.includes(f)) : [];
    if (banned.length > 0) return excluded.push({ id: p.option.id, reason: `flag not allowed: ${banned.join(", ")}` });
    if (!withinLimits(planner.totals([i]), limits)) return excluded.push({ id: p.option.id, reason: "alone it exceeds the limits" });
    if (!(singleAEnergy[i]! < planner.baseAEnergy * QUIETER)) {
      return excluded.push({ id: p.option.id, reason: `lowers the received level by less than ${LEVEL_TOLERANCE_DB} dB` });
    }
    byLink.set(p.link, [...(byLink.get(p.link) ?? []), i]);
  });
  const groups = [...byLink.values()].map((g) => [...g].sort((a, b) => singleAEnergy[a]! - singleAEnergy[b]!));
  groups.sort((a, b) => singleAEnergy[a[0]!]! - singleAEnergy[b[0]!]!);
  return { groups, excluded };
}
