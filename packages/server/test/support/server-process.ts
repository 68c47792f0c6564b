import { spawn, type ChildProcess } from "node:child_process";
import { createServer } from "node:net";
import { fileURLToPath } from "node:url";
import { startMailFake, startS3Fake } from "@hushmark/fakes";
import { createDataSource } from "../../src/data-source.js";

const serverDir = fileURLToPath(new URL("../..", import.meta.url));

export const freePort = () =>
  new Promise<number>((resolve) => {
    const s = createServer();
    s.listen(0, "127.0.0.1", () => {
      const a = s.address();
      s.close(() => resolve(typeof a === "object" && a ? a.port : 0));
    });
  });

export interface ServerProcess {
  base: string;
  child: ChildProcess;
  /** Everything the process wrote (its log lines), for a failure message. */
  output: () => string;
  /** Resolves with the exit code or signal once the process has ended. */
  exited: Promise<string>;
  /** Sends a signal (SIGKILL by default) and waits for the process to end. */
  kill: (signal?: NodeJS.Signals) => Promise<string>;
}

/** Starts `node dist/index.js` (the built server) with `env` on a free port and waits until it answers. */
export async function startServerProcess(env: Record<string, string>, port?: number): Promise<ServerProcess> {
  const p = port ?? (await freePort());
  const child = spawn("node", ["dist/index.js"], {
    cwd: serverDir,
    env: { ...process.env, NODE_ENV: "test", HUSHMARK_PORT: String(p), HUSHMARK_LOG_LEVEL: "warn", ...env },
    stdio: ["ignore", "pipe", "pipe"],
  });
  let log = "";
  child.stdout!.on("data", (d: Buffer) => (log = (log + d.toString()).slice(-20_000)));
  child.stderr!.on("data", (d: Buffer) => (log = (log + d.toString()).slice(-20_000)));
  const exited = new Promise<string>((resolve) => child.on("exit", (code, signal) => resolve(signal ?? String(code))));
  const base = `http://127.0.0.1:${p}`;
  const proc: ServerProcess = {
    base,
    child,
    output: () => log,
    exited,
    kill: async (signal = "SIGKILL") => {
      if (child.exitCode === null && child.signalCode === null) child.kill(signal);
      return exited;
    },
  };
  const started = Date.now();
  while (Date.now() - started < 30_000) {
    if (child.exitCode !== null) throw new Error(`the server exited at start-up:\n${log}`);
    if (await fetch(`${base}/api/v1/health`).then((r) => r.ok, () => false)) return proc;
    await new Promise((r) => setTimeout(r, 100));
  }
  await proc.kill();
  throw new Error(`the server did not answer within 30 s:\n${log}`);
}

export type Answer = { status: number; body: any };

/**
 * A cookie-keeping JSON client for one person (a browser without the browser) that can talk to
 * whichever server process it is given on each call; its cookies can be copied (a stolen session).
 */
export function client() {
  let cookies = new Map<string, string>();
  return {
    async call(base: string, method: string, path: string, body?: unknown): Promise<Answer> {
      const res = await fetch(`${base}${path}`, {
        method,
        headers: { "content-type": "application/json", cookie: [...cookies].map(([k, v]) => `${k}=${v}`).join("; ") },
        ...(body === undefined ? {} : { body: JSON.stringify(body) }),
        signal: AbortSignal.timeout(15_000),
      });
      for (const c of res.headers.getSetCookie()) {
        const [pair] = c.split(";");
        const [k, v] = pair!.split("=");
        if (v) cookies.set(k!, v);
        else cookies.delete(k!);
      }
      const text = await res.text();
      let parsed: unknown = null;
      try {
        parsed = text ? JSON.parse(text) : null;
      } catch {
        parsed = text;
      }
      return { status: res.status, body: parsed };
    },
    cookieSnapshot: () => new Map(cookies),
    restore: (snapshot: Map<string, string>) => {
      cookies = new Map(snapshot);
    },
  };
}

/** The same client bound to one server (whose address may change when it is restarted). */
export function person(base: () => string) {
  const c = client();
  return (method: string, path: string, body?: unknown): Promise<Answer> => c.call(base(), method, path, body);
}

/**
 * Empties the sign-in and sign-up counters. Spawned servers keep the production per-address limits
 * (30 sign-ups per 15 min), and the counters live in the database for the loopback address shared
 * by every earlier test file (whose in-process harness raises its own limits but still counts), so
 * a file that signs people up through a spawned server starts from empty counters.
 */
export async function clearRateLimits(databaseUrl = process.env.DATABASE_URL): Promise<void> {
  const { default: pg } = await import("pg");
  const client = new pg.Client({ connectionString: databaseUrl });
  await client.connect();
  try {
    await client.query("DELETE FROM rate_limit_buckets");
  } finally {
    await client.end();
  }
}

/**
 * What a test of spawned server processes shares: the mail and object-storage fakes, a small
 * connection to the test database, empty rate-limit counters, and the environment that points a
 * process at them with a job-queue schema of the test's own (`jobsSchema`), dropped at the end.
 */
export async function startProcessFixture(jobsSchema: string, secretFor: string) {
  const mail = await startMailFake();
  const s3 = await startS3Fake();
  const dataSource = createDataSource(process.env.DATABASE_URL!, { poolSize: 2 });
  await dataSource.initialize();
  // Spawned processes keep the default per-address limits, counted in the database for loopback
  // by every file before this one: start from, and leave, empty counters.
  await dataSource.query("DELETE FROM rate_limit_buckets");
  const env: Record<string, string> = {
    HUSHMARK_JWT_SECRET: `a secret for the ${secretFor} test, 32+ chars`,
    HUSHMARK_SMTP_PORT: String(mail.smtpPort),
    HUSHMARK_MAIL_API_URL: `http://127.0.0.1:${mail.httpPort}`,
    HUSHMARK_S3_ENDPOINT: s3.endpoint,
    HUSHMARK_JOBS_SCHEMA: jobsSchema,
  };
  const close = async () => {
    await dataSource.query(`DROP SCHEMA IF EXISTS ${jobsSchema} CASCADE`);
    await dataSource.query("DELETE FROM rate_limit_buckets");
    await dataSource.destroy();
    await mail.close();
    await s3.close();
  };
  return { mail, s3, dataSource, env, close };
}
