/**
 * A scenario evaluated by the engine: the plan at a version built into its network (the same
 * code as analyses), the upgrades turned into engine options, and the engine's planner giving
 * the received spectrum, dBA, NC, the target's shortfall, costs, area, labour, flags and cautions.
 */
import { aWeightedLevelDb, energyToDb, spectrum, UpgradePlanner, type UpgradeOption } from "@hushmark/acoustics";
import { BANDS_HZ, type Catalogue } from "@hushmark/floorplan";
import type { CautionDto, PriceBookItem, ScenarioEvaluation, ScenarioLine, ScenarioSetup, UpgradeFlagName } from "@hushmark/schemas";
import { engineTarget, prepareNetwork, spaceName, type PreparedNetwork } from "../analyses/compute.js";
import { cents } from "../money/decimal.js";
import { costSplit, upgradeOptionFor, type ElementOnNetwork } from "./upgrade-options.js";

export interface PickedUpgrade {
  key: string;
  item: PriceBookItem;
  elementId: string;
}

export type EvaluationOutcome =
  | { ok: true; evaluation: ScenarioEvaluation }
  | { ok: false; status: 400 | 422; message: string; details?: unknown };

export interface PlannerSetup {
  prepared: Extract<PreparedNetwork, { ok: true }>;
  planner: UpgradePlanner;
  picked: (PickedUpgrade & { element: ElementOnNetwork })[];
}

/** Builds the network and the engine's planner for a set of upgrades; refuses upgrades that do not fit their element. */
export function plannerFor(document: unknown, setup: ScenarioSetup, picks: readonly PickedUpgrade[], catalogue: Catalogue): { ok: true; value: PlannerSetup } | Extract<EvaluationOutcome, { ok: false }> {
  const prepared = prepareNetwork(document, setup, catalogue);
  if (!prepared.ok) return { ok: false, status: prepared.status, message: prepared.message, ...(prepared.problems.length ? { details: prepared.problems } : {}) };
  const options: UpgradeOption[] = [];
  const picked: PlannerSetup["picked"] = [];
  const problems: { path: string; message: string }[] = [];
  picks.forEach((p, i) => {
    const r = upgradeOptionFor(p.key, p.item, p.elementId, prepared.network, catalogue);
    if (!r.ok) problems.push({ path: `items.${i}`, message: r.message });
    else {
      options.push(r.option);
      picked.push({ ...p, element: r.element });
    }
  });
  if (problems.length > 0) return { ok: false, status: 400, message: problems.length === 1 ? problems[0]!.message : "Some upgrades do not fit the elements they are on.", details: problems };
  const target = engineTarget(setup.target);
  const planner = new UpgradePlanner(prepared.network, options, { receiver: setup.receiverId, ...(target ? { target } : {}) });
  return { ok: true, value: { prepared, planner, picked } };
}

const round = (v: number, d = 2) => Math.round(v * 10 ** d) / 10 ** d;

/** The evaluation of every upgrade together (the engine's `describe` of the whole set). */
export function evaluateScenario(document: unknown, setup: ScenarioSetup, picks: readonly PickedUpgrade[], catalogue: Catalogue): EvaluationOutcome {
  const built = plannerFor(document, setup, picks, catalogue);
  if (!built.ok) return built;
  const { planner, picked, prepared } = built.value;
  const all = picked.map((_, i) => i);
  const r = planner.describe(all);
  const base = planner.describe([]);
  const lines: ScenarioLine[] = picked.map((p, i) => {
    const prep = planner.prepared[i]!;
    const split = costSplit(p.item, prep.costs.areaM2);
    return {
      priceBookItemId: p.item.id,
      code: p.item.code,
      name: p.item.name,
      family: p.item.family,
      elementId: p.elementId,
      elementName: p.element.name,
      areaM2: round(prep.costs.areaM2, 3),
      materials: cents(split.materials),
      labour: cents(split.labour),
      total: cents(split.materials) + cents(split.labour),
      labourHours: prep.costs.labourH,
      floorAreaLostM2: round(prep.costs.floorAreaLostM2, 3),
      flags: [...prep.option.flags] as UpgradeFlagName[],
      cautions: prep.cautions.map((c) => ({ code: c.code, text: c.text })),
    };
  });
  const cautions = new Map<string, CautionDto>();
  for (const c of r.cautions) cautions.set(`${c.code}:${c.text}`, { code: c.code, text: c.text });
  const materials = cents(lines.reduce((s, l) => s + l.materials, 0));
  const labour = cents(lines.reduce((s, l) => s + l.labour, 0));
  const t = setup.target;
  return {
    ok: true,
    evaluation: {
      bandsHz: [...BANDS_HZ],
      receiver: { id: setup.receiverId, name: spaceName(prepared.plan, setup.receiverId) },
      source: { id: prepared.sourceId, name: spaceName(prepared.plan, prepared.sourceId), dba: sourceDba(planner, prepared.sourceId) },
      before: { levelsDb: [...base.levelsDb], dba: base.dba, nc: base.nc },
      after: { levelsDb: [...r.levelsDb], dba: r.dba, nc: r.nc, gainDb: r.gainDb },
      target: t && r.shortfall ? { kind: t.kind, value: t.kind === "nc" ? t.nc : t.kind === "dba" ? t.dba : t.reductionDb, met: r.shortfall.met, shortfallDb: r.shortfall.shortfallDb } : null,
      lines,
      totals: { materials, labour, cost: cents(materials + labour), labourHours: r.labourH, floorAreaLostM2: round(r.floorAreaLostM2, 3) },
      flags: [...r.flags] as UpgradeFlagName[],
      cautions: [...cautions.values()],
      notes: planner.prepared.flatMap((p) => p.costs.notes.map((n) => `${p.option.name ?? p.option.id}: ${n}`)),
    },
  };
}

/** The source space's A-weighted level in the solved network, dBA (0 when it is not a solved space). */
function sourceDba(planner: UpgradePlanner, sourceId: string): number {
  const i = planner.c.spaceIndex.get(sourceId);
  if (i === undefined) return 0;
  const B = planner.c.B;
  const e = planner.solved.base.e.slice(i * B, i * B + B);
  const dba = aWeightedLevelDb(spectrum(planner.c.bands, Array.from(e, (v) => energyToDb(Math.max(v, 1e-30)))));
  return Number.isFinite(dba) && dba > 0 ? dba : 0;
}
