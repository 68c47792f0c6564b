// Times plan → network → solve on a synthetic 500-room, 3-level building (target: median ≤ 150 ms)
// and writes packages/floorplan/bench-results.json. Run: npm run bench (in packages/floorplan).
import { writeFileSync } from "node:fs";
import { cpus } from "node:os";
import { parseNetwork, solveNetwork } from "@hushmark/acoustics";
import { buildNetwork, constructionCatalogue, generateSyntheticBuilding, sourceSpectrum } from "../src/index.js";

const ROOMS = 500, LEVELS = 3, SEED = 7, WARMUP = 3;
const RUNS = Number(process.env.BENCH_RUNS ?? 30);
const source = { type: "airborne" as const, spaceId: "r1-6-6", levelsDb: sourceSpectrum("music-amplified-bass")!.levelsDb };
const receiver = "r1-6-7";

function quantile(sorted: number[], q: number): number {
  return sorted[Math.min(sorted.length - 1, Math.ceil(q * sorted.length) - 1)]!;
}

const times = { build: [] as number[], parse: [] as number[], solve: [] as number[], total: [] as number[] };
let shape = { spaces: 0, links: 0 };
let receiverDba = 0;
for (let i = 0; i < WARMUP + RUNS; i++) {
  // A fresh plan object each run, so no per-plan cache carries over between runs.
  const plan = generateSyntheticBuilding({ rooms: ROOMS, levels: LEVELS, seed: SEED });
  const t0 = performance.now();
  const built = buildNetwork(plan, constructionCatalogue, { sources: [source] });
  if (!built.ok) throw new Error(built.problems[0]!.message);
  const t1 = performance.now();
  const parsed = parseNetwork(built.network);
  if (!parsed.ok) throw new Error(parsed.issues[0]!.message);
  const t2 = performance.now();
  const result = solveNetwork(parsed.value, { receiver });
  const t3 = performance.now();
  if (i < WARMUP) continue;
  times.build.push(t1 - t0);
  times.parse.push(t2 - t1);
  times.solve.push(t3 - t2);
  times.total.push(t3 - t0);
  shape = { spaces: parsed.value.spaces.length, links: parsed.value.links.length };
  receiverDba = result.dba;
}

const summary = Object.fromEntries(
  Object.entries(times).map(([k, v]) => {
    const s = [...v].sort((a, b) => a - b);
    return [k, { medianMs: +quantile(s, 0.5).toFixed(2), p95Ms: +quantile(s, 0.95).toFixed(2), minMs: +s[0]!.toFixed(2) }];
  }),
);
const out = {
  benchmark: "floorplan builder + engine solve",
  plan: { rooms: ROOMS, levels: LEVELS, seed: SEED, ...shape },
  runs: RUNS,
  targetMedianMs: 150,
  ...summary,
  meetsTarget: summary.total!.medianMs <= 150,
  receiverDba: +receiverDba.toFixed(1),
  machine: { node: process.version, cpus: cpus().length },
};
writeFileSync(new URL("../bench-results.json", import.meta.url), `${JSON.stringify(out, null, 2)}\n`);
console.log(`builder + solve, ${ROOMS} rooms on ${LEVELS} levels (${shape.spaces} spaces, ${shape.links} links), ${RUNS} runs`);
for (const [k, v] of Object.entries(summary)) console.log(`  ${k.padEnd(6)} median ${v.medianMs.toFixed(1).padStart(7)} ms   p95 ${v.p95Ms.toFixed(1).padStart(7)} ms`);
console.log(`  target: median ≤ 150 ms → ${out.meetsTarget ? "met" : "NOT met"}`);
