// Brings up what the app needs — dependencies, PostgreSQL, build, migrations, fakes — for both
// `npm start` (the persistent local cluster) and `npm test` (a throwaway one).
import { createHash, randomBytes } from "node:crypto";
import { existsSync, mkdirSync, readFileSync, writeFileSync } from "node:fs";
import { join } from "node:path";
import { ensureDependencies } from "./deps.mjs";
import { done, step, warn } from "./log.mjs";
import { canReach, ensureDatabase, prepareOwnedDir, startCluster } from "./postgres.mjs";
import { run, startService, waitForHttp } from "./run.mjs";

/** Loads `.env` from the project root when there is one (it never overrides the real environment). */
export function loadDotEnv(root) {
  const file = join(root, ".env");
  if (existsSync(file)) process.loadEnvFile(file);
}

/** Picks the data folder: `.data/` in the clone, or a folder the cluster user can reach when the clone's parents are closed to it. */
export function dataFolder(root) {
  if (process.env.HUSHMARK_DATA_DIR) return process.env.HUSHMARK_DATA_DIR;
  const local = join(root, ".data");
  mkdirSync(local, { recursive: true });
  if (canReach(local)) return local;
  const fallback = join("/var/lib/hushmark", createHash("sha1").update(root).digest("hex").slice(0, 12));
  warn(`the database user cannot reach ${local}; keeping the cluster in ${fallback} instead`);
  return fallback;
}

/** A secret kept beside the data so that sessions survive a restart. */
export function persistentSecret(dir, name) {
  const file = join(dir, name);
  if (!existsSync(file)) writeFileSync(file, randomBytes(32).toString("base64url"), { mode: 0o600 });
  return readFileSync(file, "utf8").trim();
}

/** Starts (or reuses) a cluster in `dir` and answers `{ databaseUrl, pgDataDir, owned }`. */
export async function bringUpDatabase({ dir, port, database }) {
  if (process.env.DATABASE_URL) {
    done("using DATABASE_URL (an external PostgreSQL)");
    return { databaseUrl: process.env.DATABASE_URL, pgDataDir: null, owned: false };
  }
  prepareOwnedDir(dir);
  const pgDataDir = join(dir, "pg");
  const admin = startCluster({ dataDir: pgDataDir, port, logFile: join(dir, "postgres.log") });
  const databaseUrl = await ensureDatabase(admin, { database, role: "hushmark", password: persistentSecret(dir, "app-db.secret") });
  return { databaseUrl, pgDataDir, owned: admin.owned };
}

/** Builds the packages the running app needs, and what they depend on, through Turborepo (cached). */
export function buildAll(root, filters = ["@hushmark/server...", "@hushmark/web...", "@hushmark/fakes..."], extra = []) {
  step("building (turbo run build)…");
  run("npx", ["turbo", "run", "build", "--output-logs=errors-only", ...extra, ...filters.map((f) => `--filter=${f}`)], { cwd: root, env: { ...process.env, TURBO_TELEMETRY_DISABLED: "1", DO_NOT_TRACK: "1" } });
  done("built");
}

/** Runs pending migrations. */
export function migrate(root, databaseUrl) {
  run("node", ["packages/server/dist/scripts/migrate.js"], { cwd: root, env: { ...process.env, DATABASE_URL: databaseUrl } });
}

/** Starts the local fakes (mail, object storage, payments) and waits until they answer. */
export async function startFakes(root, { smtpPort, mailApiPort, s3Port, s3Dir, paymentsPort = 55028, webhookUrl }) {
  if (s3Dir) mkdirSync(s3Dir, { recursive: true });
  const child = startService("fakes", "node", ["packages/fakes/dist/main.js"], {
    cwd: root,
    env: { ...process.env, HUSHMARK_SMTP_PORT: String(smtpPort), HUSHMARK_MAIL_API_PORT: String(mailApiPort), HUSHMARK_S3_PORT: String(s3Port), ...(s3Dir ? { HUSHMARK_S3_DIR: s3Dir } : {}), HUSHMARK_PAYMENTS_PORT: String(paymentsPort), ...(webhookUrl ? { HUSHMARK_PAYMENTS_WEBHOOK_URL: webhookUrl } : {}) },
  });
  await waitForHttp(`http://127.0.0.1:${mailApiPort}/health`, 15_000, child);
  await waitForHttp(`http://127.0.0.1:${s3Port}/`, 15_000, child);
  await waitForHttp(`http://127.0.0.1:${paymentsPort}/health`, 15_000, child);
  return child;
}

export { ensureDependencies };
