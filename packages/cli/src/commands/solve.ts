/** `hushmark solve NETWORK.json --source ID --receiver ID [--json]`: levels, paths and weakest links. */
import { solveNetwork, type SolveResult } from "@hushmark/acoustics";
import { numberOption, parseArgs, requiredOption } from "../args.js";
import { dbText, jsonText, num, table } from "../format.js";
import { loadNetwork, targetFromArgs, TARGET_OPTIONS, withNetworkErrors } from "../load.js";
import type { Command } from "./command.js";

const SPEC = { positionals: ["NETWORK.json"], options: ["source", "receiver", "k", ...TARGET_OPTIONS], flags: ["json"] };

/** The solve result as the command line's JSON (keys: levels_db, dba, nc, paths, gain_if_perfect_db). */
export function solveJson(r: SolveResult) {
  return {
    receiver: r.receiver,
    sources: r.sources,
    bands: r.bands,
    frequencies_hz: r.frequenciesHz,
    levels_db: r.levelsDb.map((v) => num(v)),
    dba: num(r.dba),
    nc: r.nc.value,
    paths: r.paths.map((p) => ({
      rank: p.rank,
      source: p.source,
      kind: p.kind,
      spaces: p.spaces,
      links: p.links,
      levels_db: p.levelsDb.map((v) => num(v)),
      dba: num(p.dba),
      share: num(p.share, 4),
    })),
    paths_truncated: r.pathsTruncated,
    gain_if_perfect_db: Object.fromEntries(r.links.filter((l) => l.gainIfPerfectDb !== undefined).map((l) => [l.id, num(l.gainIfPerfectDb!)])),
    links: r.links.map((l) => ({ id: l.id, share: num(l.share, 4), ...(l.gainIfPerfectDb !== undefined ? { gain_if_perfect_db: num(l.gainIfPerfectDb) } : {}) })),
    ...(r.shortfall ? { shortfall: { shortfall_db: num(r.shortfall.shortfallDb), met: r.shortfall.met, detail: r.shortfall.detail } } : {}),
    warnings: r.warnings,
  };
}

function gainText(g: number | undefined): string {
  if (g === undefined) return "";
  return Number.isFinite(g) ? `−${g.toFixed(1)} dB` : "all of it";
}

function solveText(r: SolveResult): string {
  const out: string[] = [];
  out.push(`Receiver "${r.receiver}" from ${r.sources.join(", ")}: ${dbText(r.dba)} dB(A), NC-${r.nc.value}${r.nc.belowRange ? " (below NC-15)" : ""}`);
  out.push("");
  out.push(table(["band Hz", ...r.frequenciesHz.map(String)], [["dB", ...r.levelsDb.map((v) => dbText(v))]]));
  out.push("Paths (strongest first):");
  out.push(table(["#", "dB(A)", "share", "via"], r.paths.map((p) => [String(p.rank), dbText(p.dba), `${(100 * p.share).toFixed(1)} %`, `${p.spaces.join(" → ")}  [${p.links.join(", ")}]`])));
  out.push("Where the sound gets through:");
  const rows = r.links.filter((l) => l.share > 0).slice(0, 20).map((l) => [l.id, `${(100 * l.share).toFixed(1)} %`, gainText(l.gainIfPerfectDb)]);
  out.push(table(["link", "share", "if perfect"], rows));
  if (r.shortfall) out.push(`Target: ${r.shortfall.met ? "met" : `short by ${r.shortfall.shortfallDb.toFixed(1)} dB`} (${r.shortfall.detail})`);
  for (const w of r.warnings) out.push(`warning: ${w}`);
  return out.join("\n") + "\n";
}

export const solveCommand: Command = {
  name: "solve",
  summary: "levels at a receiver, the strongest paths and each link's share and gain if perfect",
  usage: "solve NETWORK.json --source ID --receiver ID [--k N] [--target-dba X | --target-nc N | --target-reduction DB] [--json]",
  run(argv, io) {
    const args = parseArgs(argv, SPEC, "solve");
    const file = args.positionals[0] as string;
    const receiver = requiredOption(args, "receiver", "solve");
    const k = numberOption(args, "k", "solve", 1) ?? 10;
    const target = targetFromArgs(args, "solve");
    const network = loadNetwork(io, file);
    const source = args.options.get("source");
    const r = withNetworkErrors(file, () => solveNetwork(network, { receiver, k: Math.floor(k), ...(source !== undefined ? { source } : {}), ...(target ? { target } : {}) }));
    io.stdout(args.flags.has("json") ? jsonText(solveJson(r)) : solveText(r));
    return 0;
  },
};
