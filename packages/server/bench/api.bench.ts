// API benchmark (`npm run bench` runs it): the analysis endpoint for the demo plan under 20
// concurrent requests, cached and computed, against a bare health-endpoint run in the same session.
// Needs DATABASE_URL (a throwaway database; the bench orchestrator makes one) and a built server.
import { spawn } from "node:child_process";
import { readFileSync, writeFileSync } from "node:fs";
import { createServer } from "node:net";
import { fileURLToPath } from "node:url";
import autocannon from "autocannon";

const serverDir = fileURLToPath(new URL("..", import.meta.url));
const demoPlan = JSON.parse(readFileSync(new URL("../../../examples/fernhollow-studio.plan.json", import.meta.url), "utf8"));
const seconds = Number(process.env.HUSHMARK_BENCH_SECONDS ?? 5);

const freePort = () =>
  new Promise<number>((resolve) => {
    const s = createServer();
    s.listen(0, "127.0.0.1", () => {
      const a = s.address();
      s.close(() => resolve(typeof a === "object" && a ? a.port : 0));
    });
  });

async function waitFor(url: string) {
  for (let i = 0; i < 200; i += 1) {
    try {
      if ((await fetch(url)).ok) return;
    } catch {
      /* not yet */
    }
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error(`${url} did not come up`);
}

interface Row {
  name: string;
  median_ms: number;
  p95_ms: number;
  p99_ms: number;
  requests_per_s: number;
  errors: number;
  baseline: string;
  ratio: number | null;
  target?: string;
}

async function load(title: string, opts: autocannon.Options): Promise<autocannon.Result> {
  const result = await autocannon({ connections: 20, duration: seconds, ...opts, title });
  return result;
}

/**
 * 50 editors, each on a project of their own (the 51st project holds the demo plan for analyses) (as on site: one surveyor per plan), saving every
 * second with the version they were given, plus four loops asking for demo-plan analyses.
 */
async function editorsLoad(base: string, headers: Record<string, string>, seconds: number) {
  const saves: number[] = [];
  const analyses: number[] = [];
  let saveErrors = 0;
  let analysisErrors = 0;
  const projects = await Promise.all(
    Array.from({ length: 51 }, async (_, i) => {
      const p = (await (await fetch(`${base}/api/v1/projects`, { method: "POST", headers, body: JSON.stringify({ title: `Load ${i}` }) })).json()) as { id: string };
      const plan = (await (await fetch(`${base}/api/v1/projects/${p.id}/plan`, { headers })).json()) as { version: number; document: Record<string, unknown> };
      return { id: p.id, ...plan };
    }),
  );
  const demo = projects[0]!;
  const demoSave = await fetch(`${base}/api/v1/projects/${demo.id}/plan`, { method: "PUT", headers, body: JSON.stringify({ baseVersion: demo.version, document: demoPlan }) });
  demo.version = ((await demoSave.json()) as { version: number }).version;
  demo.document = demoPlan;
  const end = Date.now() + seconds * 1000;
  const editor = async (p: (typeof projects)[number], i: number) => {
    await new Promise((r) => setTimeout(r, (i * 1000) / 50));
    let n = 0;
    while (Date.now() < end) {
      const next = Date.now() + 1000;
      const started = performance.now();
      const res = await fetch(`${base}/api/v1/projects/${p.id}/plan`, { method: "PUT", headers, body: JSON.stringify({ baseVersion: p.version, document: { ...p.document, name: `edit ${n++}` } }) });
      saves.push(performance.now() - started);
      if (res.status === 200) p.version = ((await res.json()) as { version: number }).version;
      else {
        saveErrors += 1;
        await res.text();
      }
      await new Promise((r) => setTimeout(r, Math.max(0, next - Date.now())));
    }
  };
  const analyst = async (i: number) => {
    let n = 0;
    while (Date.now() < end) {
      const started = performance.now();
      const res = await fetch(`${base}/api/v1/projects/${demo.id}/analyses`, {
        method: "POST", headers,
        body: JSON.stringify({ planVersion: demo.version, source: { kind: "airborne", spaceId: "cafe", spectrum: { kind: "library", id: "speech-raised" } }, receiverId: "record", target: { kind: "dba", dba: 20 + i + (n++ % 1000) / 1000 } }),
      });
      analyses.push(performance.now() - started);
      if (res.status !== 200) analysisErrors += 1;
      await res.text();
    }
  };
  // The demo project is analysed, not edited, so its version stays put.
  await Promise.all([...projects.slice(1).map(editor), ...[0, 1, 2, 3].map(analyst)]);
  return { saves, analyses, saveErrors, analysisErrors, seconds };
}

const port = await freePort();
const base = `http://127.0.0.1:${port}`;
const server = spawn("node", ["dist/index.js"], {
  cwd: serverDir,
  env: { ...process.env, HUSHMARK_PORT: String(port), HUSHMARK_PUBLIC_URL: base, HUSHMARK_LOG_LEVEL: "error", NODE_ENV: "development" },
  stdio: ["ignore", "inherit", "inherit"],
});
try {
  await waitFor(`${base}/api/v1/health`);
  const json = { "content-type": "application/json" };
  const email = `bench-${Date.now()}@bench.example`;
  const signUp = await fetch(`${base}/api/v1/auth/sign-up`, {
    method: "POST", headers: json,
    body: JSON.stringify({ firmName: "Bench Firm", displayName: "Bench", email, password: "benchmark passphrase" }),
  });
  const cookie = signUp.headers.getSetCookie().map((c) => c.split(";")[0]).join("; ");
  const headers = { ...json, cookie };
  const project = (await (await fetch(`${base}/api/v1/projects`, { method: "POST", headers, body: JSON.stringify({ title: "Bench studio" }) })).json()) as { id: string };
  const saved = (await (await fetch(`${base}/api/v1/projects/${project.id}/plan`, { method: "PUT", headers, body: JSON.stringify({ baseVersion: 0, document: demoPlan }) })).json()) as { version: number };
  const analysis = (nc: number) =>
    JSON.stringify({ planVersion: saved.version, source: { kind: "airborne", spaceId: "cafe", spectrum: { kind: "library", id: "speech-raised" } }, receiverId: "record", target: { kind: "nc", nc } });
  const path = `/api/v1/projects/${project.id}/analyses`;
  const check = await fetch(`${base}${path}`, { method: "POST", headers, body: analysis(25) });
  if (check.status !== 200) throw new Error(`analysis answered ${check.status}: ${await check.text()}`);

  const health = await load("health", { url: `${base}/api/v1/health` });
  const cached = await load("analysis (cached)", { url: `${base}${path}`, method: "POST", headers, body: analysis(25) });
  let n = 0;
  const computed = await load("analysis (computed)", {
    url: `${base}${path}`,
    method: "POST",
    headers,
    requests: [{ setupRequest: (req) => ({ ...req, body: analysis(20 + (n++ % 100_000) / 10_000) }) }],
  });
  const row = (name: string, r: autocannon.Result, target?: string): Row => ({
    name,
    median_ms: r.latency.p50,
    p95_ms: r.latency.p97_5,
    p99_ms: r.latency.p99,
    requests_per_s: r.requests.average,
    errors: r.errors + r.non2xx,
    baseline: "health endpoint, same run",
    ratio: health.latency.p50 > 0 ? Math.round((r.latency.p50 / health.latency.p50) * 10) / 10 : null,
    ...(target ? { target } : {}),
  });
  const editorRun = await editorsLoad(base, headers, Number(process.env.HUSHMARK_BENCH_LOAD_SECONDS ?? 60));
  const loadRow = (name: string, samples: number[], errors: number, target: string): Row => {
    const sorted = [...samples].sort((x, y) => x - y);
    const q = (p: number) => sorted[Math.min(sorted.length - 1, Math.floor(p * sorted.length))] ?? 0;
    return {
      name, median_ms: Math.round(q(0.5) * 10) / 10, p95_ms: Math.round(q(0.95) * 10) / 10, p99_ms: Math.round(q(0.99) * 10) / 10,
      requests_per_s: Math.round((samples.length / editorRun.seconds) * 10) / 10, errors, baseline: "health endpoint, same run",
      ratio: health.latency.p50 > 0 ? Math.round((q(0.5) / health.latency.p50) * 10) / 10 : null, target,
    };
  };
  const rows = [
    row("GET /health, 20 concurrent", health),
    row("analysis of the demo plan, cached, 20 concurrent", cached),
    row("analysis of the demo plan, computed each time, 20 concurrent", computed, "p99 ≤ 500 ms"),
    loadRow(`plan saves: 50 editors autosaving every second for ${editorRun.seconds} s`, editorRun.saves, editorRun.saveErrors, "p99 ≤ 250 ms, 0 errors"),
    loadRow("demo-plan analyses during that load (4 loops)", editorRun.analyses, editorRun.analysisErrors, "p99 ≤ 500 ms, 0 errors"),
  ];
  writeFileSync(new URL("../bench-results.json", import.meta.url), `${JSON.stringify({ suite: "API (loopback, autocannon)", note: "p95 column is autocannon's p97.5", rows }, null, 2)}\n`);
  console.table(rows.map((r) => ({ name: r.name, median_ms: r.median_ms, p95_ms: r.p95_ms, p99_ms: r.p99_ms, "req/s": Math.round(r.requests_per_s), errors: r.errors, ratio: r.ratio })));
} finally {
  server.kill("SIGTERM");
}
