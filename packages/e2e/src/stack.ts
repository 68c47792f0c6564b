import { spawn, type ChildProcess } from "node:child_process";
import { createServer } from "node:net";
import { fileURLToPath } from "node:url";
import pg from "pg";

export const ROOT = fileURLToPath(new URL("../../../", import.meta.url));

/** A free TCP port on 127.0.0.1. */
export function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = createServer();
    server.once("error", reject);
    server.listen(0, "127.0.0.1", () => {
      const address = server.address();
      server.close(() => resolve(typeof address === "object" && address ? address.port : 0));
    });
  });
}

/** Runs a node script to completion, throwing with its output when it fails. */
export function runNode(args: string[], env: NodeJS.ProcessEnv): Promise<void> {
  return new Promise((resolve, reject) => {
    const child = spawn("node", args, { cwd: ROOT, env, stdio: ["ignore", "pipe", "pipe"] });
    let output = "";
    child.stdout.on("data", (c) => (output += c));
    child.stderr.on("data", (c) => (output += c));
    child.once("exit", (code) => (code === 0 ? resolve() : reject(new Error(`node ${args.join(" ")} exited ${code}:\n${output}`))));
  });
}

/** Starts a long-running node process; its output is kept for error messages. */
export function startNode(args: string[], env: NodeJS.ProcessEnv): { child: ChildProcess; output: () => string } {
  const child = spawn("node", args, { cwd: ROOT, env, stdio: ["ignore", "pipe", "pipe"] });
  let output = "";
  child.stdout?.on("data", (c) => (output = (output + c).slice(-20_000)));
  child.stderr?.on("data", (c) => (output = (output + c).slice(-20_000)));
  return { child, output: () => output };
}

/** Waits for a URL to answer 2xx. */
export async function waitFor(url: string, timeoutMs: number, child?: ChildProcess, output?: () => string): Promise<void> {
  const start = Date.now();
  while (Date.now() - start < timeoutMs) {
    if (child && child.exitCode !== null) throw new Error(`process exited (${child.exitCode}) before ${url} answered:\n${output?.() ?? ""}`);
    try {
      if ((await fetch(url)).ok) return;
    } catch {
      // not up yet
    }
    await new Promise((r) => setTimeout(r, 150));
  }
  throw new Error(`${url} did not answer within ${timeoutMs} ms:\n${output?.() ?? ""}`);
}

export interface RunningStack {
  baseUrl: string;
  mailApiUrl: string;
  paymentsUrl: string;
  stop: () => Promise<void>;
}

/**
 * The real stack on a clean database: migrated and seeded with the demo firm, every fake and the
 * server (serving the built web app) on free loopback ports, so it can run beside anyone else's.
 */
export async function startStack(databaseUrl: string): Promise<RunningStack> {
  const client = new pg.Client({ connectionString: databaseUrl });
  await client.connect();
  await client.query("DROP SCHEMA IF EXISTS public CASCADE; CREATE SCHEMA public;");
  await client.end();
  const [port, smtpPort, mailApiPort, s3Port, paymentsPort] = [await freePort(), await freePort(), await freePort(), await freePort(), await freePort()];
  const base = `http://127.0.0.1:${port}`;
  const env = {
    ...process.env,
    NODE_ENV: "development" as const,
    DATABASE_URL: databaseUrl,
    HUSHMARK_PORT: String(port),
    HUSHMARK_PUBLIC_URL: base,
    HUSHMARK_SMTP_PORT: String(smtpPort),
    HUSHMARK_MAIL_API_PORT: String(mailApiPort),
    HUSHMARK_MAIL_API_URL: `http://127.0.0.1:${mailApiPort}`,
    HUSHMARK_S3_PORT: String(s3Port),
    HUSHMARK_S3_ENDPOINT: `http://127.0.0.1:${s3Port}`,
    HUSHMARK_PAYMENTS_PORT: String(paymentsPort),
    HUSHMARK_PAYMENTS_WEBHOOK_URL: `${base}/api/v1/payments/webhook`,
    HUSHMARK_STRIPE_PORT: String(paymentsPort),
    HUSHMARK_LOG_LEVEL: "warn",
  };
  await runNode(["packages/server/dist/scripts/migrate.js"], env);
  await runNode(["packages/server/dist/scripts/seed.js"], env);
  const fakes = startNode(["packages/fakes/dist/main.js"], env);
  await waitFor(`http://127.0.0.1:${mailApiPort}/health`, 15_000, fakes.child, fakes.output);
  await waitFor(`http://127.0.0.1:${s3Port}/`, 15_000, fakes.child, fakes.output);
  await waitFor(`http://127.0.0.1:${paymentsPort}/health`, 15_000, fakes.child, fakes.output);
  const server = startNode(["packages/server/dist/index.js"], env);
  await waitFor(`${base}/api/v1/health`, 30_000, server.child, server.output);
  return {
    baseUrl: base,
    mailApiUrl: `http://127.0.0.1:${mailApiPort}`,
    paymentsUrl: `http://127.0.0.1:${paymentsPort}`,
    stop: async () => {
      for (const proc of [server, fakes]) {
        proc.child.kill("SIGTERM");
        await new Promise((r) => (proc.child.exitCode !== null ? r(null) : proc.child.once("exit", r)));
      }
    },
  };
}
