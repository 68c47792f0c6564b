#!/usr/bin/env node
// `npm run bench`: the engine, builder, API and browser benchmarks on a throwaway database, one
// package at a time (so they do not compete for the two cores), collected into docs/benchmarks.md.
import { existsSync, mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { cpus, tmpdir } from "node:os";
import { dirname, join } from "node:path";
import { fileURLToPath } from "node:url";
import { done, fail, step } from "./lib/log.mjs";
import { ensureDatabase, freePort, prepareOwnedDir, startCluster, stopCluster } from "./lib/postgres.mjs";
import { runStatus } from "./lib/run.mjs";
import { buildAll, ensureDependencies } from "./lib/stack.mjs";

const root = join(dirname(fileURLToPath(import.meta.url)), "..");
// `npm run bench -- --only=floorplan` re-runs one package's benchmark and keeps the others' last results.
const only = process.argv.find((a) => a.startsWith("--only="))?.slice("--only=".length);
const tmp = mkdtempSync(join(tmpdir(), "hushmark-bench-"));
let status = 0;
try {
  ensureDependencies(root);
  prepareOwnedDir(tmp);
  const admin = startCluster({ dataDir: join(tmp, "pg"), port: await freePort(55533), logFile: join(tmp, "postgres.log") });
  const databaseUrl = await ensureDatabase(admin, { database: "hushmark_bench", role: "hushmark", password: "bench-only" });
  const e2eUrl = await ensureDatabase(admin, { database: "hushmark_bench_e2e", role: "hushmark", password: "bench-only" });
  buildAll(root, []);
  step("migrating the bench database…");
  runStatus("node", ["packages/server/dist/scripts/migrate.js"], { cwd: root, env: { ...process.env, DATABASE_URL: databaseUrl } });
  const packages = readdirSync(join(root, "packages")).filter((p) => existsSync(join(root, "packages", p, "package.json")));
  for (const pkg of packages) if (!only || pkg === only) rmSync(join(root, "packages", pkg, "bench-results.json"), { force: true });
  step("running benchmarks (turbo run bench, one package at a time)…");
  status = runStatus("npx", ["turbo", "run", "bench", "--concurrency=1", "--continue", "--output-logs=full", ...(only ? [`--filter=@hushmark/${only}`] : [])], {
    cwd: root,
    env: { ...process.env, DATABASE_URL: databaseUrl, HUSHMARK_E2E_DATABASE_URL: e2eUrl, CHROMIUM_PATH: process.env.CHROMIUM_PATH ?? "/usr/bin/chromium", TURBO_TELEMETRY_DISABLED: "1" },
  });
  stopCluster(join(tmp, "pg"));

  const sections = [];
  for (const pkg of packages) {
    const file = join(root, "packages", pkg, "bench-results.json");
    if (!existsSync(file)) continue;
    const data = JSON.parse(readFileSync(file, "utf8"));
    const suites = Array.isArray(data) ? data : data.suites ?? [data];
    for (const suite of suites) {
      const rows = suite.rows ?? suite.results ?? [];
      if (!rows.length) continue;
      const columns = [...new Set(rows.flatMap((r) => Object.keys(r)))];
      const cell = (v) => (typeof v === "number" ? (Number.isInteger(v) ? String(v) : v.toFixed(v < 1 ? 3 : v < 10 ? 2 : 1)) : v === undefined || v === null ? "" : String(v));
      sections.push(
        [
          `## ${suite.suite ?? suite.name ?? pkg} (\`packages/${pkg}\`)`,
          suite.note ? `\n${suite.note}\n` : "",
          `| ${columns.join(" | ")} |`,
          `| ${columns.map(() => "---").join(" | ")} |`,
          ...rows.map((r) => `| ${columns.map((c) => cell(r[c])).join(" | ")} |`),
        ].join("\n"),
      );
    }
  }
  const machine = `${cpus().length} × ${cpus()[0]?.model ?? "CPU"}, Node.js ${process.version}`;
  const text = [
    "# Benchmarks",
    "",
    `Written by \`npm run bench\` on ${new Date().toISOString().slice(0, 16).replace("T", " ")} UTC (${machine}).`,
    "Each figure is reported with its ratio to a baseline measured in the same run, so a slower or busier machine shifts both.",
    "",
    ...sections.flatMap((s) => [s, ""]),
  ].join("\n");
  writeFileSync(join(root, "docs", "benchmarks.md"), text);
  console.log(`\n${text}`);
  done("wrote docs/benchmarks.md");
} catch (error) {
  fail(error.message);
  status = 1;
} finally {
  stopCluster(join(tmp, "pg"));
  rmSync(tmp, { recursive: true, force: true });
}
process.exit(status);
