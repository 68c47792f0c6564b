/**
 * `hushmark upgrades NETWORK.json OPTIONS.json --source ID --receiver ID [--budget N] [--json]`:
 * each option alone, the best combination within the limits, and the cost–level frontier.
 */
import {
  evaluateUpgrades,
  upgradeFlagSchema,
  type CombinationResult,
  type SearchLimits,
  type UpgradeFlag,
  type UpgradeOption,
  type UpgradeReport,
} from "@hushmark/acoustics";
import { numberOption, parseArgs, requiredOption, type ParsedArgs } from "../args.js";
import { UsageError } from "../errors.js";
import { dbText, jsonText, num, table } from "../format.js";
import { loadNetwork, loadOptions, targetFromArgs, TARGET_OPTIONS, withNetworkErrors } from "../load.js";
import type { Command } from "./command.js";

const SPEC = {
  positionals: ["NETWORK.json", "OPTIONS.json"],
  options: ["source", "receiver", "budget", "area", "labour", "allow-flags", "combine", ...TARGET_OPTIONS],
  flags: ["json"],
};

function flagsOption(args: ParsedArgs): UpgradeFlag[] | undefined {
  const raw = args.options.get("allow-flags");
  if (raw === undefined) return undefined;
  return raw.split(",").map((f) => f.trim()).filter((f) => f !== "").map((f) => {
    const p = upgradeFlagSchema.safeParse(f);
    if (!p.success) throw new UsageError(`--allow-flags: unknown flag "${f}" (flags: ${upgradeFlagSchema.options.join(", ")})`, "upgrades");
    return p.data;
  });
}

function limitsFrom(args: ParsedArgs, file: SearchLimits): SearchLimits {
  const budget = numberOption(args, "budget", "upgrades", 0) ?? file.budget;
  const floorAreaM2 = numberOption(args, "area", "upgrades", 0) ?? file.floorAreaM2;
  const labourH = numberOption(args, "labour", "upgrades", 0) ?? file.labourH;
  const allowedFlags = flagsOption(args) ?? file.allowedFlags;
  return {
    ...(budget !== undefined ? { budget } : {}),
    ...(floorAreaM2 !== undefined ? { floorAreaM2 } : {}),
    ...(labourH !== undefined ? { labourH } : {}),
    ...(allowedFlags !== undefined ? { allowedFlags } : {}),
  };
}

/** The option ids named by --combine (comma-separated), checked against the options file. */
function combineIds(args: ParsedArgs, options: readonly UpgradeOption[]): string[] | undefined {
  const raw = args.options.get("combine");
  if (raw === undefined) return undefined;
  const ids = raw.split(",").map((s) => s.trim()).filter((s) => s !== "");
  const unknown = ids.filter((id) => !options.some((o) => o.id === id));
  if (unknown.length > 0) throw new UsageError(`--combine: no option ${unknown.map((u) => `"${u}"`).join(", ")} in the options file`, "upgrades");
  return ids;
}

function combinationJson(c: CombinationResult) {
  return {
    options: c.options,
    levels_db: c.levelsDb.map((v) => num(v)),
    dba: num(c.dba),
    gain_db: num(c.gainDb),
    nc: c.nc,
    cost: num(c.cost),
    labour_h: num(c.labourH),
    floor_area_lost_m2: num(c.floorAreaLostM2, 3),
    ...(c.shortfall ? { meets_target: c.shortfall.met, shortfall_db: num(c.shortfall.shortfallDb) } : {}),
    flags: c.flags,
    cautions: c.cautions.map((k) => k.text),
  };
}

/** The report as the command line's JSON. */
export function upgradesJson(r: UpgradeReport) {
  return {
    base: { levels_db: r.base.levelsDb.map((v) => num(v)), dba: num(r.base.dba), nc: r.base.nc, ...(r.base.shortfall ? { shortfall_db: num(r.base.shortfall.shortfallDb) } : {}) },
    options: r.options.map((o) => ({
      id: o.id,
      ...(o.name !== undefined ? { name: o.name } : {}),
      link: o.link,
      levels_db: o.levelsDb.map((v) => num(v)),
      dba: num(o.dba),
      gain_db: num(o.gainDb),
      nc: o.nc,
      cost: num(o.cost),
      gain_per_cost_db: o.gainPerCostDb === null ? null : num(o.gainPerCostDb, 6),
      labour_h: num(o.labourH),
      floor_area_lost_m2: num(o.floorAreaLostM2, 3),
      flags: o.flags,
      ...(o.shortfall ? { meets_target: o.shortfall.met, shortfall_db: num(o.shortfall.shortfallDb) } : {}),
      cautions: o.cautions.map((c) => c.text),
      notes: o.notes,
    })),
    best: {
      options: r.best.chosen,
      levels_db: r.best.result.levelsDb.map((v) => num(v)),
      dba: num(r.best.result.dba),
      gain_db: num(r.best.result.gainDb),
      nc: r.best.result.nc,
      cost: num(r.best.result.cost),
      labour_h: num(r.best.result.labourH),
      floor_area_lost_m2: num(r.best.result.floorAreaLostM2, 3),
      reaches_target: r.best.reachesTarget,
      method: r.best.method,
      exact: r.best.exact,
      excluded: r.best.excluded,
      flags: r.best.result.flags,
      cautions: r.best.result.cautions.map((c) => c.text),
    },
    frontier: r.frontier ? { exact: r.frontier.exact, points: r.frontier.points.map((p) => ({ cost: num(p.cost), dba: num(p.dba), options: p.options })) } : undefined,
  };
}

function upgradesText(r: UpgradeReport, limits: SearchLimits): string {
  const out: string[] = [`Now: ${dbText(r.base.dba)} dB(A), NC-${r.base.nc}${r.base.shortfall ? `; target ${r.base.shortfall.met ? "met" : `short by ${r.base.shortfall.shortfallDb.toFixed(1)} dB`}` : ""}`, ""];
  out.push("Each option alone:");
  const rows = [...r.options].sort((a, b) => b.gainDb - a.gainDb).map((o) => [o.id, o.link, `−${o.gainDb.toFixed(1)} dB`, dbText(o.dba), o.cost.toFixed(0), o.gainPerCostDb === null ? "free" : (1000 * o.gainPerCostDb).toFixed(2), o.flags.join(", ")]);
  out.push(table(["option", "link", "gain", "dB(A)", "cost", "dB per 1000", "flags"], rows));
  const b = r.best;
  const lim = [limits.budget !== undefined ? `budget ${limits.budget}` : "", limits.floorAreaM2 !== undefined ? `area ${limits.floorAreaM2} m²` : "", limits.labourH !== undefined ? `labour ${limits.labourH} h` : ""].filter(Boolean).join(", ");
  out.push(`Best combination${lim ? ` within ${lim}` : ""} (${b.method}${b.exact ? ", exact" : ", not proven optimal"}):`);
  out.push(`  ${b.chosen.length > 0 ? b.chosen.join(" + ") : "nothing helps within the limits"}`);
  out.push(`  ${dbText(b.result.dba)} dB(A) (−${b.result.gainDb.toFixed(1)} dB), NC-${b.result.nc}, cost ${b.result.cost.toFixed(0)}, labour ${b.result.labourH.toFixed(1)} h, floor area lost ${b.result.floorAreaLostM2.toFixed(2)} m²${b.result.shortfall ? `, target ${b.reachesTarget ? "reached" : "not reached"}` : ""}`);
  for (const c of b.result.cautions) out.push(`  caution: ${c.text}`);
  for (const e of b.excluded) out.push(`  left out: ${e.id} (${e.reason})`);
  if (r.frontier) {
    out.push("", `Cost against level${r.frontier.exact ? "" : " (sampled)"}:`);
    out.push(table(["cost", "dB(A)", "options"], r.frontier.points.map((p) => [p.cost.toFixed(0), dbText(p.dba), p.options.join(" + ") || "(none)"])));
  }
  return out.join("\n") + "\n";
}

export const upgradesCommand: Command = {
  name: "upgrades",
  summary: "each upgrade option alone, the best combination within limits, and the cost–level frontier",
  usage:
    "upgrades NETWORK.json OPTIONS.json --source ID --receiver ID [--budget N] [--area M2] [--labour H] [--allow-flags a,b] [--combine id,id] [--target-dba X | --target-nc N | --target-reduction DB] [--json]",
  run(argv, io) {
    const args = parseArgs(argv, SPEC, "upgrades");
    const [netFile, optFile] = args.positionals as [string, string];
    const receiver = requiredOption(args, "receiver", "upgrades");
    const network = loadNetwork(io, netFile);
    const set = loadOptions(io, optFile, network);
    const l = set.limits;
    const fileLimits: SearchLimits = {
      ...(l?.budget !== undefined ? { budget: l.budget } : {}),
      ...(l?.floor_area_m2 !== undefined ? { floorAreaM2: l.floor_area_m2 } : {}),
      ...(l?.labour_h !== undefined ? { labourH: l.labour_h } : {}),
      ...(l?.allowed_flags !== undefined ? { allowedFlags: l.allowed_flags } : {}),
    };
    const limits = limitsFrom(args, fileLimits);
    const target = targetFromArgs(args, "upgrades") ?? set.target;
    const source = args.options.get("source");
    const combine = combineIds(args, set.options);
    const request = { receiver, limits, ...(source !== undefined ? { source } : {}), ...(target ? { target } : {}), ...(combine ? { combine } : {}) };
    const report = withNetworkErrors(netFile, () => evaluateUpgrades(network, set.options, request));
    const combo = report.combination;
    if (args.flags.has("json")) {
      io.stdout(jsonText({ ...upgradesJson(report), ...(combo ? { combination: combinationJson(combo) } : {}) }));
      return 0;
    }
    const extra = combo
      ? `\nChosen combination ${combo.options.join(" + ")}: ${dbText(combo.dba)} dB(A) (−${combo.gainDb.toFixed(1)} dB), cost ${combo.cost.toFixed(0)}, labour ${combo.labourH.toFixed(1)} h\n`
      : "";
    io.stdout(upgradesText(report, limits) + extra);
    return 0;
  },
};
