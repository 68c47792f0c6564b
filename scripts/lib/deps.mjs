// Installs npm dependencies when node_modules is missing or older than the lock file.
import { createHash } from "node:crypto";
import { existsSync, readFileSync, writeFileSync } from "node:fs";
import { join } from "node:path";
import { done, step } from "./log.mjs";
import { run } from "./run.mjs";

const STAMP = join("node_modules", ".hushmark-deps");

function lockDigest(root) {
  const lock = join(root, "package-lock.json");
  const hash = createHash("sha256");
  hash.update(existsSync(lock) ? readFileSync(lock) : "");
  for (const file of ["package.json"]) hash.update(readFileSync(join(root, file)));
  return hash.digest("hex");
}

/** Ensures `node_modules` matches the lock file; runs `npm ci` (or `npm install` without a lock). */
export function ensureDependencies(root) {
  const digest = lockDigest(root);
  const stamp = join(root, STAMP);
  if (existsSync(stamp) && readFileSync(stamp, "utf8") === digest) {
    done("dependencies up to date");
    return;
  }
  const hasLock = existsSync(join(root, "package-lock.json"));
  step(hasLock ? "installing dependencies (npm ci)…" : "installing dependencies (npm install)…");
  run("npm", [hasLock ? "ci" : "install", "--no-audit", "--no-fund", "--loglevel=error"], { cwd: root });
  writeFileSync(stamp, lockDigest(root));
  done("dependencies installed");
}
