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
  const rows = [
    row("GET /health, 20 concurrent", health),
    row("analysis of the demo plan, cached, 20 concurrent", cached),
    row("analysis of the demo plan, computed each time, 20 concurrent", computed, "p99 ≤ 500 ms"),
  ];
  writeFileSync(new URL("../bench-results.json", import.meta.url), `${JSON.stringify({ suite: "API (loopback, autocannon)", note: "p95 column is autocannon's p97.5", rows }, null, 2)}\n`);
  console.table(rows.map((r) => ({ name: r.name, median_ms: r.median_ms, p95_ms: r.p95_ms, p99_ms: r.p99_ms, "req/s": Math.round(r.requests_per_s), errors: r.errors, ratio: r.ratio })));
} finally {
  server.kill("SIGTERM");
}
