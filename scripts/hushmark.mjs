// `npm run -s hushmark -- <command> …`: builds @hushmark/acoustics and @hushmark/cli when their
// dist is missing or older than their sources (quietly, so --json output stays parseable), then
// runs the command line. Plain Node, no dependencies.
import { spawnSync } from "node:child_process";
import { existsSync, readdirSync, statSync } from "node:fs";
import { dirname, join } from "node:path";
import { fileURLToPath } from "node:url";

const root = join(dirname(fileURLToPath(import.meta.url)), "..");
const PACKAGES = [
  { dir: "packages/acoustics", output: "dist/index.js" },
  { dir: "packages/cli", output: "dist/main.js" },
];

/** Newest modification time (ms) of the package's sources and build settings. */
function newestSource(pkgDir) {
  let newest = 0;
  const visit = (dir) => {
    for (const entry of readdirSync(dir, { withFileTypes: true })) {
      const path = join(dir, entry.name);
      if (entry.isDirectory()) visit(path);
      else if (!entry.name.endsWith(".test.ts")) newest = Math.max(newest, statSync(path).mtimeMs);
    }
  };
  visit(join(pkgDir, "src"));
  for (const file of ["package.json", "tsconfig.json", "tsconfig.build.json"]) {
    const path = join(pkgDir, file);
    if (existsSync(path)) newest = Math.max(newest, statSync(path).mtimeMs);
  }
  return newest;
}

function needsBuild(pkg) {
  const dir = join(root, pkg.dir);
  const output = join(dir, pkg.output);
  return !existsSync(output) || statSync(output).mtimeMs < newestSource(dir);
}

function build(pkg) {
  const project = join(pkg.dir, "tsconfig.build.json");
  const r = spawnSync("npx", ["--no-install", "tsc", "-p", project], { cwd: root, encoding: "utf8", shell: process.platform === "win32" });
  if (r.status !== 0) {
    process.stderr.write(`hushmark: building ${pkg.dir} failed\n${r.stdout ?? ""}${r.stderr ?? ""}${r.error ? `${r.error.message}\n` : ""}`);
    process.exit(1);
  }
}

for (const pkg of PACKAGES) if (needsBuild(pkg)) build(pkg);

const result = spawnSync(process.execPath, [join(root, "packages/cli/dist/main.js"), ...process.argv.slice(2)], { stdio: "inherit" });
if (result.error) {
  process.stderr.write(`hushmark: ${result.error.message}\n`);
  process.exit(1);
}
process.exit(result.status ?? 1);
