// A project-local PostgreSQL cluster on 127.0.0.1: install the server from Debian's packages if
// its binaries are missing, initdb (as an unprivileged user when we are root), start, stop.
import { randomBytes } from "node:crypto";
import { chmodSync, chownSync, existsSync, mkdirSync, readdirSync, readFileSync, writeFileSync } from "node:fs";
import { dirname, join } from "node:path";
import { done, step, warn } from "./log.mjs";
import { hasCommand, run } from "./run.mjs";

const isRoot = typeof process.getuid === "function" && process.getuid() === 0;

/** Finds the newest installed PostgreSQL server's bin folder, or null. */
function findBinDir() {
  const base = "/usr/lib/postgresql";
  if (!existsSync(base)) return null;
  const versions = readdirSync(base)
    .filter((v) => existsSync(join(base, v, "bin", "initdb")) && existsSync(join(base, v, "bin", "postgres")))
    .sort((a, b) => Number(b) - Number(a));
  return versions.length ? join(base, versions[0], "bin") : null;
}

/** Answers the server's bin folder, installing Debian's `postgresql` package when it is missing. */
export function ensurePostgresBinaries() {
  let bin = findBinDir();
  if (bin) return bin;
  if (!isRoot || !hasCommand("apt-get")) {
    throw new Error(
      "PostgreSQL's server binaries are not installed and this script cannot install them (it needs root and apt-get). " +
        "Install the Debian package `postgresql`, or set DATABASE_URL to an existing server.",
    );
  }
  step("installing PostgreSQL from Debian's packages (apt-get)…");
  run("apt-get", ["update", "-qq"], { env: { ...process.env, DEBIAN_FRONTEND: "noninteractive" } });
  run("apt-get", ["install", "-y", "-qq", "--no-install-recommends", "postgresql"], {
    env: { ...process.env, DEBIAN_FRONTEND: "noninteractive" },
  });
  bin = findBinDir();
  if (!bin) throw new Error("apt-get installed postgresql but no server binaries were found under /usr/lib/postgresql");
  done(`PostgreSQL installed (${bin})`);
  return bin;
}

/** The OS user that runs the cluster: ourselves, or an unprivileged user when we are root. */
function clusterUser() {
  if (!isRoot) return null;
  const passwd = readFileSync("/etc/passwd", "utf8");
  for (const name of ["postgres", "hushmark-db"]) if (passwd.split("\n").some((l) => l.startsWith(`${name}:`))) return name;
  run("useradd", ["--system", "--no-create-home", "--shell", "/usr/sbin/nologin", "hushmark-db"]);
  return "hushmark-db";
}

/** The numeric uid and gid of an OS user. */
function idsOf(user) {
  return { uid: Number(run("id", ["-u", user], { quiet: true }).trim()), gid: Number(run("id", ["-g", user], { quiet: true }).trim()) };
}

function asUser(user, command, args, options = {}) {
  return user ? run("runuser", ["-u", user, "--", command, ...args], options) : run(command, args, options);
}

/** True when `user` can reach `dir` (every parent traversable). */
export function canReach(dir) {
  const user = clusterUser();
  if (!user) return true;
  try {
    run("runuser", ["-u", user, "--", "test", "-x", dir], { quiet: true });
    return true;
  } catch {
    return false;
  }
}

/**
 * Creates (once) and starts a cluster in `dataDir` listening on 127.0.0.1:`port` only, with
 * unix sockets off. Answers the superuser connection settings. The superuser password lives in
 * a file beside the data folder.
 */
export function startCluster({ dataDir, port, logFile }) {
  const bin = ensurePostgresBinaries();
  const user = clusterUser();
  const parent = dirname(dataDir);
  mkdirSync(parent, { recursive: true });
  const secretFile = join(parent, "superuser.secret");
  if (!existsSync(join(dataDir, "PG_VERSION"))) {
    step(`creating the PostgreSQL cluster in ${dataDir}…`);
    const password = randomBytes(18).toString("base64url");
    writeFileSync(secretFile, password, { mode: 0o600 });
    mkdirSync(dataDir, { recursive: true, mode: 0o700 });
    const pwFile = join(parent, ".initdb-pw");
    writeFileSync(pwFile, password, { mode: 0o600 });
    if (user) {
      const { uid, gid } = idsOf(user);
      chownSync(dataDir, uid, gid);
      chownSync(pwFile, uid, gid);
      chmodSync(parent, 0o755);
    }
    asUser(user, join(bin, "initdb"), [
      "-D", dataDir, "-U", "postgres", "--pwfile", pwFile, "--auth-local=trust", "--auth-host=scram-sha-256",
      "--encoding=UTF8", "--locale=C.UTF-8", "--no-instructions",
    ], { quiet: true });
    run("rm", ["-f", pwFile]);
    const conf = join(dataDir, "postgresql.conf");
    const extra = [
      "",
      "# Hushmark: loopback only, TCP only",
      "listen_addresses = '127.0.0.1'",
      `port = ${port}`,
      "unix_socket_directories = ''",
      "max_connections = 200",
      "fsync = on",
      "",
    ].join("\n");
    writeFileSync(conf, readFileSync(conf, "utf8") + extra);
  } else {
    // The port may change between runs (for example when a test run picks a free one).
    const conf = join(dataDir, "postgresql.conf");
    const text = readFileSync(conf, "utf8").replace(/^port = \d+$/m, `port = ${port}`);
    writeFileSync(conf, text);
  }
  const pidFile = join(dataDir, "postmaster.pid");
  if (existsSync(pidFile)) {
    try {
      asUser(user, join(bin, "pg_ctl"), ["-D", dataDir, "status"], { quiet: true });
      done(`PostgreSQL already running on 127.0.0.1:${port}`);
      return { host: "127.0.0.1", port, user: "postgres", password: readFileSync(secretFile, "utf8"), owned: false };
    } catch {
      warn("a stale postmaster.pid was left behind; starting afresh");
    }
  }
  if (user && logFile) {
    mkdirSync(dirname(logFile), { recursive: true });
    writeFileSync(logFile, "", { flag: "a" });
    const { uid, gid } = idsOf(user);
    chownSync(logFile, uid, gid);
  }
  asUser(user, join(bin, "pg_ctl"), ["-D", dataDir, "-l", logFile ?? "/dev/null", "-w", "-t", "60", "start"], { quiet: true });
  done(`PostgreSQL running on 127.0.0.1:${port}`);
  return { host: "127.0.0.1", port, user: "postgres", password: readFileSync(secretFile, "utf8"), owned: true };
}

/** Stops the cluster in `dataDir` (fast shutdown). */
export function stopCluster(dataDir) {
  const bin = findBinDir();
  if (!bin || !existsSync(join(dataDir, "postmaster.pid"))) return;
  try {
    asUser(clusterUser(), join(bin, "pg_ctl"), ["-D", dataDir, "-m", "fast", "-w", "stop"], { quiet: true });
  } catch (error) {
    warn(`could not stop PostgreSQL cleanly: ${error.message}`);
  }
}

/** Hands a freshly made folder to the cluster user (for throwaway clusters under /tmp). */
export function prepareOwnedDir(dir) {
  const user = clusterUser();
  mkdirSync(dir, { recursive: true });
  if (user) {
    const { uid, gid } = idsOf(user);
    chownSync(dir, uid, gid);
    chmodSync(dir, 0o755);
  }
}

/**
 * Creates the application role and database if they do not exist yet (idempotent), using the
 * `pg` client from node_modules. Answers the application's DATABASE_URL.
 */
export async function ensureDatabase(admin, { database, role, password }) {
  const { default: pg } = await import("pg");
  const client = new pg.Client({ host: admin.host, port: admin.port, user: admin.user, password: admin.password, database: "postgres" });
  await client.connect();
  try {
    const quotedRole = `"${role.replaceAll('"', '""')}"`;
    const literal = `'${password.replaceAll("'", "''")}'`;
    const roles = await client.query("SELECT 1 FROM pg_roles WHERE rolname = $1", [role]);
    if (roles.rowCount === 0) await client.query(`CREATE ROLE ${quotedRole} LOGIN PASSWORD ${literal} CREATEDB`);
    const dbs = await client.query("SELECT 1 FROM pg_database WHERE datname = $1", [database]);
    if (dbs.rowCount === 0) await client.query(`CREATE DATABASE "${database.replaceAll('"', '""')}" OWNER ${quotedRole}`);
  } finally {
    await client.end();
  }
  return `postgres://${encodeURIComponent(role)}:${encodeURIComponent(password)}@${admin.host}:${admin.port}/${encodeURIComponent(database)}`;
}

/** Finds a free TCP port on 127.0.0.1, starting from `preferred`. */
export async function freePort(preferred) {
  const net = await import("node:net");
  for (let port = preferred; port < preferred + 200; port += 1) {
    const free = await new Promise((resolve) => {
      const server = net.createServer();
      server.once("error", () => resolve(false));
      server.listen(port, "127.0.0.1", () => server.close(() => resolve(true)));
    });
    if (free) return port;
  }
  throw new Error(`no free port found from ${preferred}`);
}
