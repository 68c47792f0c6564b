#!/usr/bin/env node
// `npm test`: the same set-up as `npm start` against a throwaway PostgreSQL cluster, then every
// test — unit, API integration, browser — and a check that `npm start` comes up. Ends with
// "N passed, N failed" and exits non-zero on any failure.
import { spawn } from "node:child_process";
import { existsSync, mkdtempSync, readdirSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { dirname, join } from "node:path";
import { fileURLToPath } from "node:url";
import { bold, done, fail, step, warn } from "./lib/log.mjs";
import { ensureDatabase, freePort, prepareOwnedDir, startCluster, stopCluster } from "./lib/postgres.mjs";
import { readPackageReports } from "./lib/report.mjs";
import { hasCommand, run, runStatus, waitForHttp } from "./lib/run.mjs";
import { buildAll, ensureDependencies } from "./lib/stack.mjs";

const root = join(dirname(fileURLToPath(import.meta.url)), "..");
const started = Date.now();
const isRoot = process.getuid?.() === 0;
const results = [];
let tmp = null;
let pgDataDir = null;

function cleanup() {
  if (pgDataDir) stopCluster(pgDataDir);
  if (tmp && !process.env.HUSHMARK_KEEP_TEST_DATA) rmSync(tmp, { recursive: true, force: true });
}

function ensureChromium() {
  if (process.env.CHROMIUM_PATH && existsSync(process.env.CHROMIUM_PATH)) return process.env.CHROMIUM_PATH;
  if (existsSync("/usr/bin/chromium")) return "/usr/bin/chromium";
  if (!isRoot || !hasCommand("apt-get")) throw new Error("Chromium is missing and cannot be installed here: install Debian's `chromium` package or set CHROMIUM_PATH.");
  step("installing Chromium from Debian's packages (apt-get)…");
  const env = { ...process.env, DEBIAN_FRONTEND: "noninteractive" };
  run("apt-get", ["update", "-qq"], { env });
  run("apt-get", ["install", "-y", "-qq", "--no-install-recommends", "chromium"], { env });
  return "/usr/bin/chromium";
}

/** `npm start` in the background on its own data folder and ports: health, a demo sign-in, Ctrl-C. */
async function checkStartCommand(dir) {
  const name = "npm start comes up, serves the demo sign-in and stops on Ctrl-C";
  const [port, pgPort, smtpPort, mailApiPort, s3Port, paymentsPort] = [await freePort(58080), await freePort(56432), await freePort(56025), await freePort(56125), await freePort(56027), await freePort(56028)];
  const env = {
    ...process.env,
    HUSHMARK_DATA_DIR: join(dir, "start-check"),
    HUSHMARK_PORT: String(port),
    HUSHMARK_PG_PORT: String(pgPort),
    HUSHMARK_SMTP_PORT: String(smtpPort),
    HUSHMARK_MAIL_API_PORT: String(mailApiPort),
    HUSHMARK_S3_PORT: String(s3Port),
    HUSHMARK_PAYMENTS_PORT: String(paymentsPort),
    NO_COLOR: "1",
  };
  delete env.DATABASE_URL;
  prepareOwnedDir(env.HUSHMARK_DATA_DIR);
  const child = spawn("node", ["scripts/start.mjs"], { cwd: root, env, stdio: ["ignore", "pipe", "pipe"] });
  let output = "";
  child.stdout.on("data", (c) => (output += c));
  child.stderr.on("data", (c) => (output += c));
  try {
    const base = `http://127.0.0.1:${port}`;
    await waitForHttp(`${base}/api/v1/health`, 180_000, child);
    for (let i = 0; i < 50 && !output.includes("Demo sign-ins"); i += 1) await new Promise((r) => setTimeout(r, 100));
    if (!output.includes(`Hushmark is running at ${base}`) || !output.includes("Demo sign-ins")) throw new Error("npm start did not print the URL and the demo sign-ins");
    const { DEMO_PASSWORD, DEMO_PEOPLE } = await import(join(root, "packages/server/dist/scripts/demo-data.js"));
    const res = await fetch(`${base}/api/v1/auth/sign-in`, {
      method: "POST",
      headers: { "content-type": "application/json" },
      body: JSON.stringify({ email: DEMO_PEOPLE[0].email, password: DEMO_PASSWORD }),
    });
    if (res.status !== 200) throw new Error(`demo sign-in answered ${res.status}`);
    const cookie = res.headers.getSetCookie().map((c) => c.split(";")[0]).join("; ");
    const projects = await (await fetch(`${base}/api/v1/projects`, { headers: { cookie } })).json();
    if (!Array.isArray(projects.projects) || projects.projects.length < 2) throw new Error("the demo projects are missing");
    const page = await fetch(`${base}/projects`);
    if (!(await page.text()).includes('<div id="root">')) throw new Error("the web app is not served");
    const exited = new Promise((resolve) => child.once("exit", resolve));
    child.kill("SIGINT");
    const code = await Promise.race([exited, new Promise((r) => setTimeout(() => r("timeout"), 20_000))]);
    if (code !== 0) throw new Error(`npm start did not stop cleanly on Ctrl-C (${code})`);
    if (await fetch(`${base}/api/v1/health`).then(() => true, () => false)) throw new Error("the server still answers after Ctrl-C");
    results.push({ name: "start-check", passed: 1, failed: 0, skipped: 0, failures: [] });
    done(name);
  } catch (error) {
    child.kill("SIGKILL");
    stopCluster(join(env.HUSHMARK_DATA_DIR, "pg"));
    results.push({ name: "start-check", passed: 0, failed: 1, skipped: 0, failures: [`start-check: ${name}: ${error.message}\n${output.slice(-3000)}`] });
    fail(`${name}: ${error.message}`);
  }
}

try {
  ensureDependencies(root);
  const chromium = ensureChromium();
  done(`Chromium at ${chromium}`);
  tmp = mkdtempSync(join(tmpdir(), "hushmark-test-"));
  prepareOwnedDir(tmp);
  pgDataDir = join(tmp, "pg");
  const admin = startCluster({ dataDir: pgDataDir, port: await freePort(55433), logFile: join(tmp, "postgres.log") });
  const password = "test-only-password";
  const databaseUrl = await ensureDatabase(admin, { database: "hushmark_test", role: "hushmark", password });
  const e2eDatabaseUrl = await ensureDatabase(admin, { database: "hushmark_e2e", role: "hushmark", password });
  try {
    buildAll(root, [], ["--continue"]);
  } catch (error) {
    // Keep going: the packages that did build still get tested, and the build failure is counted.
    results.push({ name: "build", passed: 0, failed: 1, skipped: 0, failures: [`build: ${error.message}`] });
  }

  const packages = readdirSync(join(root, "packages")).filter((p) => existsSync(join(root, "packages", p, "package.json")));
  for (const pkg of packages) rmSync(join(root, "packages", pkg, ".vitest-report.json"), { force: true });
  const env = {
    ...process.env,
    DATABASE_URL: databaseUrl,
    HUSHMARK_E2E_DATABASE_URL: e2eDatabaseUrl,
    CHROMIUM_PATH: chromium,
    TURBO_TELEMETRY_DISABLED: "1",
    DO_NOT_TRACK: "1",
  };
  const reporterArgs = ["--", "--reporter=default", "--reporter=json", "--outputFile.json=.vitest-report.json", "--passWithNoTests"];
  step("unit and API integration tests (turbo run test)…");
  const unitStatus = runStatus("npx", ["turbo", "run", "test", "--filter=!@hushmark/e2e", "--concurrency=2", "--continue", "--output-logs=new-only", ...reporterArgs], { cwd: root, env });
  step("browser tests (Chromium)…");
  const e2eStatus = runStatus("npx", ["vitest", "run", "--reporter=default", "--reporter=json", "--outputFile.json=.vitest-report.json", "--passWithNoTests"], { cwd: join(root, "packages/e2e"), env });
  results.push(...readPackageReports(root, packages).filter(Boolean));
  for (const [label, status] of [["unit", unitStatus], ["browser", e2eStatus]]) {
    if (status !== 0 && !results.some((r) => r.failed > 0)) results.push({ name: label, passed: 0, failed: 1, skipped: 0, failures: [`${label} tests exited with ${status} without a failing test in the reports`] });
  }
  step("checking that npm start comes up…");
  await checkStartCommand(tmp);
} catch (error) {
  fail(error.message);
  results.push({ name: "setup", passed: 0, failed: 1, skipped: 0, failures: [`setup: ${error.message}`] });
} finally {
  cleanup();
}

const total = results.reduce((t, r) => ({ passed: t.passed + r.passed, failed: t.failed + r.failed, skipped: t.skipped + r.skipped }), { passed: 0, failed: 0, skipped: 0 });
console.log("");
for (const r of results) console.log(`  ${r.name.padEnd(12)} ${String(r.passed).padStart(4)} passed  ${String(r.failed).padStart(3)} failed${r.skipped ? `  ${r.skipped} skipped` : ""}`);
const failures = results.flatMap((r) => r.failures);
if (failures.length) {
  console.log(bold("\nFailures:"));
  for (const f of failures) console.log(`  ✗ ${f}`);
}
console.log(`\nnpm test took ${Math.round((Date.now() - started) / 1000)} s`);
if (total.failed === 0 && total.passed === 0) warn("no tests ran");
console.log(`${total.passed} passed, ${total.failed} failed${total.skipped ? `, ${total.skipped} skipped` : ""}`);
process.exit(total.failed > 0 || total.passed === 0 ? 1 : 0);
