/**
 * Benchmark of the acoustics engine (`npm run bench` in packages/acoustics). Prints a table and
 * writes bench-results.json. Each figure is the median and 95th percentile of repeated runs, and
 * its ratio to a baseline measured in the same run: a plain loop reading every band of every
 * link of the parsed network once.
 */
import { writeFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { parseNetwork, solveNetwork, UpgradePlanner, bestWithinLimits, parseUpgradeOptions, type Network } from "../src/index.js";
import { syntheticBuilding, withParallelPaths } from "./building.js";
import { syntheticOptions } from "./options.js";

interface Row {
  case: string;
  rooms: number;
  links: number;
  runs: number;
  medianMs: number;
  p95Ms: number;
  baselineMs: number;
  ratio: number;
  note?: string;
}

function quantile(sorted: number[], q: number): number {
  const i = Math.min(sorted.length - 1, Math.ceil(q * sorted.length) - 1);
  return sorted[Math.max(0, i)]!;
}

function time(runs: number, fn: () => unknown, warmup = 2): { median: number; p95: number } {
  for (let i = 0; i < warmup; i++) fn();
  const t: number[] = [];
  for (let i = 0; i < runs; i++) {
    const t0 = performance.now();
    fn();
    t.push(performance.now() - t0);
  }
  t.sort((a, b) => a - b);
  return { median: quantile(t, 0.5), p95: quantile(t, 0.95) };
}

let sink = 0;
/** The floor no solver can beat: read every band of every link once. */
function readEveryBand(net: Network): number {
  let s = 0;
  for (const l of net.links) {
    if (l.type === "partition") for (const p of l.parts) s += "tl_db" in p ? p.tl_db.reduce((a, b) => a + b, 0) : "dne_db" in p ? p.dne_db.reduce((a, b) => a + b, 0) : p.area_m2;
    else if (l.type === "vent") s += l.attenuation_db.reduce((a, b) => a + b, 0);
    else if (l.type === "floor") s += l.tl_db.reduce((a, b) => a + b, 0);
    else s += l.element_i.tl_db.reduce((a, b) => a + b, 0) + l.element_j.tl_db.reduce((a, b) => a + b, 0);
  }
  return s;
}

function parsed(value: unknown): Network {
  const p = parseNetwork(value);
  if (!p.ok) throw new Error(JSON.stringify(p.issues.slice(0, 3)));
  return p.value;
}

function baselineMs(net: Network, runs: number): number {
  return time(runs * 5, () => (sink += readEveryBand(net)), 5).median;
}

const rows: Row[] = [];
function record(name: string, net: Network, runs: number, fn: () => unknown, note?: string) {
  const base = baselineMs(net, runs);
  const t = time(runs, fn);
  rows.push({ case: name, rooms: net.spaces.length, links: net.links.length, runs, medianMs: t.median, p95Ms: t.p95, baselineMs: base, ratio: t.median / base, ...(note ? { note } : {}) });
}

const sizes: [number, number][] = [[10, 200], [100, 100], [1000, 40], [10000, 9]];
for (const [n, runs] of sizes) {
  const b = syntheticBuilding(n);
  const net = parsed(b.network);
  record("full solve, k = 10 paths, shares, top-20 gains", net, runs, () => solveNetwork(net, { source: b.source, receiver: b.receiver, k: 10, gains: 20 }));
}

{
  const b = syntheticBuilding(100);
  const net = parsed(b.network);
  const ranked = solveNetwork(net, { source: b.source, receiver: b.receiver, gains: 0 }).links.map((l) => l.id);
  const opts = (count: number, links: number) => {
    const p = parseUpgradeOptions(syntheticOptions(net, ranked.slice(0, links), count), net);
    if (!p.ok) throw new Error(JSON.stringify(p.issues.slice(0, 3)));
    return p.value.options;
  };
  const fifty = new UpgradePlanner(net, opts(50, 40), { source: b.source, receiver: b.receiver });
  record("50 single-option evaluations (solved base)", net, 50, () => fifty.prepared.forEach((_, i) => fifty.describe([i])));
  record("upgrade planner set-up (base + adjoint solve)", net, 50, () => new UpgradePlanner(net, opts(50, 40), { source: b.source, receiver: b.receiver }));
}

{
  // The search's hard case: 15 links of comparable strength between source and receiver, two
  // options on each, so every option matters.
  const b = withParallelPaths(syntheticBuilding(100), 15);
  const net = parsed(b.network);
  const ranked = solveNetwork(net, { source: b.source, receiver: b.receiver, gains: 0 }).links.map((l) => l.id);
  for (const count of [20, 30]) {
    const p = parseUpgradeOptions(syntheticOptions(net, ranked.slice(0, Math.ceil(count / 2)), count), net);
    if (!p.ok) throw new Error(JSON.stringify(p.issues.slice(0, 3)));
    const planner = new UpgradePlanner(net, p.value.options, { source: b.source, receiver: b.receiver });
    const total = planner.prepared.reduce((s, _, i) => s + planner.totals([i]).cost, 0);
    let last = bestWithinLimits(planner, { budget: total * 0.3 });
    record(`best within limits, ${count} options (budget 30 %)`, net, 5, () => (last = bestWithinLimits(planner, { budget: total * 0.3 })));
    const eligible = count - last.excluded.length;
    rows[rows.length - 1]!.note = `${eligible} eligible, ${last.method}, exact ${last.exact}, ${last.nodes} nodes, ${last.evaluations} evaluations`;
  }
}

const pad = (s: string, n: number) => s.padEnd(n);
console.log(`${pad("case", 50)} ${pad("rooms", 6)} ${pad("links", 6)} ${pad("median ms", 10)} ${pad("p95 ms", 10)} ${pad("baseline ms", 12)} ratio`);
for (const r of rows) {
  console.log(`${pad(r.case, 50)} ${pad(String(r.rooms), 6)} ${pad(String(r.links), 6)} ${pad(r.medianMs.toFixed(2), 10)} ${pad(r.p95Ms.toFixed(2), 10)} ${pad(r.baselineMs.toFixed(4), 12)} ${r.ratio.toFixed(0)}${r.note ? `  (${r.note})` : ""}`);
}
const out = fileURLToPath(new URL("../bench-results.json", import.meta.url));
writeFileSync(out, JSON.stringify({ node: process.version, date: new Date().toISOString(), rows }, null, 2) + "\n");
console.log(`\nwritten ${out}${sink === 0 ? "" : ""}`);
