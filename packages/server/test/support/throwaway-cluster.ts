import { spawn, spawnSync } from "node:child_process";
import { randomBytes } from "node:crypto";
import { mkdtempSync, rmSync, statSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";

interface PostgresLib {
  ensurePostgresBinaries(): string;
  prepareOwnedDir(dir: string): void;
  startCluster(o: { dataDir: string; port: number; logFile?: string }): { host: string; port: number; user: string; password: string };
  stopCluster(dataDir: string): void;
  ensureDatabase(admin: unknown, o: { database: string; role: string; password: string }): Promise<string>;
  freePort(preferred: number): Promise<number>;
}

// The same helpers `npm test` uses to make its throwaway cluster (a plain .mjs, loaded at run time).
const LIB_URL = new URL("../../../../scripts/lib/postgres.mjs", import.meta.url).href;

export interface ThrowawayCluster {
  /** The application's connection string (its own role and database). */
  url: string;
  /** Stops PostgreSQL (fast: open connections are cut), without blocking the event loop. */
  stop(): Promise<void>;
  start(): Promise<void>;
  /** Stops the cluster and removes its folder; safe to call twice and after a failure. */
  destroy(): Promise<void>;
}

/**
 * A PostgreSQL cluster of the test's own, in a temporary folder on a free loopback port, so a
 * test may stop and start it while others keep using the shared one.
 */
export async function startThrowawayCluster(): Promise<ThrowawayCluster> {
  const lib = (await import(LIB_URL)) as PostgresLib;
  const bin = lib.ensurePostgresBinaries();
  const dir = mkdtempSync(join(tmpdir(), "hushmark-pg-"));
  lib.prepareOwnedDir(dir);
  const dataDir = join(dir, "data");
  const logFile = join(dir, "postgres.log");
  const port = await lib.freePort(56_100 + Math.floor(Math.random() * 500));
  let destroyed = false;
  try {
    const admin = lib.startCluster({ dataDir, port, logFile });
    const url = await lib.ensureDatabase(admin, { database: "hm_fault", role: "hm_fault", password: randomBytes(12).toString("base64url") });
    // pg_ctl runs as the data folder's owner (an unprivileged user when the tests run as root).
    const owner = statSync(dataDir).uid;
    const asOwner = (args: string[]) => {
      const pgCtl = join(bin, "pg_ctl");
      if (process.getuid?.() !== 0 || owner === 0) return { command: pgCtl, args };
      const name = spawnSync("id", ["-nu", String(owner)], { encoding: "utf8" }).stdout.trim();
      return { command: "runuser", args: ["-u", name, "--", pgCtl, ...args] };
    };
    const pgCtl = (args: string[]) =>
      new Promise<void>((resolve, reject) => {
        const { command, args: full } = asOwner(args);
        const child = spawn(command, full, { stdio: "ignore" });
        child.on("error", reject);
        child.on("exit", (code) => (code === 0 ? resolve() : reject(new Error(`pg_ctl ${args.join(" ")} exited with ${code}`))));
      });
    return {
      url,
      stop: () => pgCtl(["-D", dataDir, "-m", "fast", "-w", "stop"]),
      start: () => pgCtl(["-D", dataDir, "-l", logFile, "-w", "-t", "60", "start"]),
      destroy: async () => {
        if (destroyed) return;
        destroyed = true;
        lib.stopCluster(dataDir);
        rmSync(dir, { recursive: true, force: true });
      },
    };
  } catch (error) {
    lib.stopCluster(dataDir);
    rmSync(dir, { recursive: true, force: true });
    throw error;
  }
}
