/** `hushmark analyze PLAN.json --source NAME_OR_ID --receiver NAME_OR_ID [--spectrum ID | --impact] [--json]`: a plan's analysis, as the API answers it. */
import {
  BANDS_HZ, OUTDOORS_ID, constructionCatalogue, parsePlan, solvePlan, sourceLibrary,
  type Plan, type Problem, type SolvePlanRequest, type Target as PlanTarget,
} from "@hushmark/floorplan";
import { numberOption, parseArgs, requiredOption } from "../args.js";
import { InputError } from "../errors.js";
import { dbText, jsonText, num, table } from "../format.js";
import { readJson } from "../json-file.js";
import { targetFromArgs, TARGET_OPTIONS } from "../load.js";
import type { Command } from "./command.js";

const SPEC = { positionals: ["PLAN.json"], options: ["source", "receiver", "spectrum", "k", ...TARGET_OPTIONS], flags: ["json", "impact"] };
const SPACE_TYPES = new Set(["room", "void", "neighbour"]);

const problemLines = (problems: readonly Problem[]) =>
  problems.filter((p) => p.severity === "error").slice(0, 20).map((p) => `${p.elementId ? `${p.elementId}: ` : ""}${p.message}${p.suggestion ? ` — ${p.suggestion}` : ""}`);

/** A room, void or neighbour by id, or by its name (any case; a unique part of the name is enough). */
function resolveSpace(plan: Plan, wanted: string, option: string, file: string, allowOutdoors: boolean): string {
  if (allowOutdoors && wanted.toLowerCase() === OUTDOORS_ID) return OUTDOORS_ID;
  const spaces = Object.values(plan.elements).filter((e) => SPACE_TYPES.has(e.type)) as { id: string; name: string }[];
  const byId = spaces.find((s) => s.id === wanted);
  if (byId) return byId.id;
  const w = wanted.toLowerCase();
  const exact = spaces.filter((s) => s.name.toLowerCase() === w);
  const partial = exact.length ? exact : spaces.filter((s) => s.name.toLowerCase().includes(w));
  if (partial.length === 1) return partial[0]!.id;
  const list = spaces.map((s) => `${s.id} (${s.name})`);
  throw new InputError(
    partial.length ? `--${option} "${wanted}" matches several spaces; give one of their ids` : `--${option} "${wanted}" is not a room, void or neighbour of this plan`,
    file,
    [`spaces: ${[...list, ...(allowOutdoors ? [OUTDOORS_ID] : [])].join(", ")}`],
  );
}

function planTarget(t: ReturnType<typeof targetFromArgs>): PlanTarget | undefined {
  if (!t) return undefined;
  if (t.kind === "level") return { kind: "dba", dba: t.dba };
  if (t.kind === "nc") return { kind: "nc", nc: t.nc };
  return { kind: "reduction", reductionDb: t.db };
}

export const analyzeCommand: Command = {
  name: "analyze",
  summary: "a plan's analysis: levels at a receiver, the weakest elements and paths, as the API answers",
  usage: "analyze PLAN.json --source NAME_OR_ID --receiver NAME_OR_ID [--spectrum ID | --impact] [--k N] [--target-dba X | --target-nc N | --target-reduction DB] [--json]",
  run(argv, io) {
    const args = parseArgs(argv, SPEC, "analyze");
    const file = args.positionals[0] as string;
    const parsed = parsePlan(readJson(io, file));
    if (!parsed.ok) throw new InputError("this is not a valid plan document", file, problemLines(parsed.problems));
    const plan = parsed.plan;
    const impact = args.flags.has("impact");
    const sourceId = resolveSpace(plan, requiredOption(args, "source", "analyze"), "source", file, !impact);
    const receiver = resolveSpace(plan, requiredOption(args, "receiver", "analyze"), "receiver", file, false);
    const spectrumId = args.options.get("spectrum") ?? (sourceId === OUTDOORS_ID ? "traffic-urban" : "speech-raised");
    if (!impact && !sourceLibrary.some((s) => s.id === spectrumId)) {
      throw new InputError(`--spectrum "${spectrumId}" is not in the source library`, file, [`spectra: ${sourceLibrary.filter((s) => s.kind === "airborne").map((s) => s.id).join(", ")}`]);
    }
    const k = numberOption(args, "k", "analyze", 1) ?? 5;
    const target = planTarget(targetFromArgs(args, "analyze"));
    const request: SolvePlanRequest = { source: impact ? { impactOnRoomId: sourceId } : { spaceId: sourceId, spectrumId }, receiver, k: Math.floor(k), ...(target ? { target } : {}) };
    const solved = solvePlan(plan, constructionCatalogue, request);
    if (!solved.ok) throw new InputError("the plan cannot be analysed", file, problemLines(solved.problems));
    const { result, onPlan, assumptions } = solved;
    const nameOf = (id: string) => (id === OUTDOORS_ID ? "Outdoors" : ((plan.elements[id] as { name?: string } | undefined)?.name ?? id));
    const src = result.spaces.find((s) => s.id === sourceId);
    const out = {
      bandsHz: [...BANDS_HZ],
      source: { id: sourceId, name: nameOf(sourceId), kind: impact ? "impact" : "airborne", spectrum: impact ? null : spectrumId, levelsDb: (src?.levelsDb ?? []).map((v) => num(v)), dba: num(src?.dba ?? NaN) },
      receiver: { id: receiver, name: nameOf(receiver), levelsDb: result.levelsDb.map((v) => num(v)), dba: num(result.dba), nc: result.nc.value },
      target: result.shortfall ? { shortfallDb: num(result.shortfall.shortfallDb), met: result.shortfall.met, detail: result.shortfall.detail } : null,
      elements: onPlan.elements.map((e) => ({ elementId: e.elementId, kind: e.kind, name: e.name, share: num(e.share, 4), gainIfPerfectDb: num(e.gainIfPerfectDb), gainExact: e.gainExact })),
      paths: onPlan.paths.map((p) => ({ rank: p.rank, kind: p.kind, share: num(p.share, 4), dba: num(p.dba), steps: p.steps })),
      assumptions: assumptions.map((a) => ({ code: a.code, elementId: a.elementId || null, message: a.message })),
    };
    if (args.flags.has("json")) {
      io.stdout(jsonText(out));
      return 0;
    }
    const lines = [
      `${out.receiver.name}: ${dbText(result.dba)} dB(A), NC-${result.nc.value}, from ${out.source.name}${impact ? " (footfall on its floor)" : ` (${spectrumId})`}`,
      ...(result.shortfall ? [`Target: ${result.shortfall.met ? "met" : `short by ${result.shortfall.shortfallDb.toFixed(1)} dB`} (${result.shortfall.detail})`] : []),
      "",
      "Where the sound gets through:",
      table(["element", "share", "if perfect"], onPlan.elements.filter((e) => e.share > 0).slice(0, 15).map((e) => [e.name, `${(100 * e.share).toFixed(1)} %`, Number.isFinite(e.gainIfPerfectDb) ? `−${e.gainIfPerfectDb.toFixed(1)} dB${e.gainExact ? "" : " (est.)"}` : "all of it"])),
      ...assumptions.map((a) => `assumed: ${a.message}`),
    ];
    io.stdout(`${lines.join("\n")}\n`);
    return 0;
  },
};
