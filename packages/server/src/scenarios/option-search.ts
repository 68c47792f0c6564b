/**
 * "Which single upgrade helps most", "best within limits" and the cost–level frontier, all by
 * the engine (`bestWithinLimits`, `costLevelFrontier`) over every price book upgrade that fits
 * each chosen element. Pure; runs in a worker thread so a long search can be cancelled.
 */
import { bestWithinLimits, costLevelFrontier, type SearchLimits, type UpgradePlanner } from "@hushmark/acoustics";
import type { Catalogue } from "@hushmark/floorplan";
import type { OptionSearchResult, PriceBookItem, ScenarioSetup, SearchLimitsInput } from "@hushmark/schemas";
import { plannerFor, type PickedUpgrade } from "./scenario-evaluate.js";
import { upgradeOptionFor } from "./upgrade-options.js";

export interface OptionSearchTask {
  document: unknown;
  setup: ScenarioSetup;
  elementIds: string[];
  items: PriceBookItem[];
  limits: SearchLimitsInput;
  catalogue: Catalogue;
}

export type Progress = (phase: string, done: number, total: number) => void;

const LEVEL_STEP_DB = 0.05;

function engineLimits(l: SearchLimitsInput): SearchLimits {
  return {
    ...(l.budget !== undefined ? { budget: l.budget } : {}),
    ...(l.floorAreaM2 !== undefined ? { floorAreaM2: l.floorAreaM2 } : {}),
    ...(l.labourHours !== undefined ? { labourH: l.labourHours } : {}),
    ...(l.allowedFlags ? { allowedFlags: l.allowedFlags } : {}),
  };
}

/** Every price book upgrade that fits each element (keys `i`, in order). */
export function candidatesFor(task: Pick<OptionSearchTask, "document" | "setup" | "elementIds" | "items" | "catalogue">, network: Parameters<typeof upgradeOptionFor>[3]): PickedUpgrade[] {
  const out: PickedUpgrade[] = [];
  for (const elementId of task.elementIds) {
    for (const item of task.items) {
      if (!item.active) continue;
      const key = `c${out.length}`;
      if (upgradeOptionFor(key, item, elementId, network, task.catalogue).ok) out.push({ key, item, elementId });
    }
  }
  return out;
}

export function runOptionSearch(task: OptionSearchTask, progress: Progress = () => {}): { ok: true; result: OptionSearchResult } | { ok: false; status: 400 | 422; message: string } {
  const first = plannerFor(task.document, task.setup, [], task.catalogue);
  if (!first.ok) return first;
  const picks = candidatesFor(task, first.value.prepared.network);
  if (picks.length === 0) return { ok: false, status: 400, message: "No upgrade in the price book fits the chosen elements. Pick other elements or add upgrades to the price book." };
  const built = plannerFor(task.document, task.setup, picks, task.catalogue);
  if (!built.ok) return built;
  const { planner, picked } = built.value;
  const describeKey = (key: string) => {
    const p = picked.find((x) => x.key === key)!;
    return { key, priceBookItemId: p.item.id, elementId: p.elementId, name: p.item.name, elementName: p.element.name };
  };
  const label = (key: string) => `${describeKey(key).name} on ${describeKey(key).elementName}`;

  const ranking: OptionSearchResult["ranking"] = [];
  picked.forEach((p, i) => {
    const r = planner.describe([i]);
    ranking.push({ ...describeKey(p.key), gainDb: r.gainDb, gainPerThousandDb: r.cost > 0 ? (r.gainDb / r.cost) * 1000 : null, cost: r.cost, dba: r.dba });
    progress("singles", i + 1, picked.length);
  });
  ranking.sort((a, b) => b.gainDb - a.gainDb);

  progress("best", 0, 1);
  const limits = engineLimits(task.limits);
  const best = bestWithinLimits(planner, limits);
  progress("frontier", 0, 1);
  const frontier = costLevelFrontier(planner, limits);

  const alternatives: OptionSearchResult["best"]["alternatives"] = [];
  const chosenDba = best.result.dba;
  const quieter = frontier.points.find((p) => p.dba < chosenDba - LEVEL_STEP_DB);
  if (quieter) {
    const over = limits.budget !== undefined && quieter.cost > limits.budget + 1e-9;
    const whyNot = over
      ? `About ${(chosenDba - quieter.dba).toFixed(1)} dB quieter, but it costs ${quieter.cost.toFixed(2)}, over the budget of ${limits.budget!.toFixed(2)}.`
      : best.reachesTarget
        ? `About ${(chosenDba - quieter.dba).toFixed(1)} dB quieter for ${(quieter.cost - best.result.cost).toFixed(2)} more; the chosen set already reaches the target.`
        : `About ${(chosenDba - quieter.dba).toFixed(1)} dB quieter, but it breaks another limit (floor area, labour or allowed flags).`;
    alternatives.push({ items: quieter.options.map(label), dba: quieter.dba, cost: quieter.cost, whyNot });
  }
  const cheaper = [...frontier.points].reverse().find((p) => p.cost < best.result.cost - 1e-9);
  if (cheaper) {
    const missesTarget = task.setup.target && best.reachesTarget;
    alternatives.push({
      items: cheaper.options.map(label),
      dba: cheaper.dba,
      cost: cheaper.cost,
      whyNot: `Saves ${(best.result.cost - cheaper.cost).toFixed(2)} but leaves about ${(cheaper.dba - chosenDba).toFixed(1)} dB more${missesTarget ? ", and the target is not reached" : ""}.`,
    });
  }
  const targetDba = task.setup.target?.kind === "dba" ? task.setup.target.dba : task.setup.target?.kind === "reduction" ? planner.baseDba - task.setup.target.reductionDb : ncTargetDba(planner, frontier.points);
  const base = planner.describe([]);
  return {
    ok: true,
    result: {
      base: { levelsDb: [...base.levelsDb], dba: base.dba, nc: base.nc },
      ranking,
      best: {
        items: best.chosen.map(describeKey),
        dba: best.result.dba,
        gainDb: best.result.gainDb,
        cost: best.result.cost,
        labourHours: best.result.labourH,
        floorAreaLostM2: best.result.floorAreaLostM2,
        reachesTarget: best.reachesTarget,
        exact: best.exact,
        method: best.method,
        excluded: best.excluded.map((e) => ({ key: e.id, name: label(e.id), reason: e.reason })),
        alternatives,
      },
      frontier: { exact: frontier.exact, points: frontier.points.map((p) => ({ cost: p.cost, dba: p.dba, items: p.options.map(label) })) },
      targetDba,
    },
  };
}

/**
 * An NC target has no single dBA figure; on the chart it is drawn at the loudest frontier point
 * that meets it (the engine's shortfall check), or left out when none does.
 */
function ncTargetDba(planner: UpgradePlanner, points: readonly { dba: number; options: readonly string[] }[]): number | null {
  let loudest: number | null = null;
  for (const p of points) {
    const indices = p.options.map((id) => planner.prepared.findIndex((x) => x.option.id === id));
    const r = planner.describe(indices);
    if (r.shortfall?.met && (loudest === null || r.dba > loudest)) loudest = r.dba;
  }
  return loudest;
}
