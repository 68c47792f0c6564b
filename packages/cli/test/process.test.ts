import { describe, expect, it } from "vitest";
import { spawnSync } from "node:child_process";
import { fileURLToPath } from "node:url";

const root = fileURLToPath(new URL("../../..", import.meta.url));

// The real executable through the root script (builds when needed), as a user runs it.
describe("hushmark executable", () => {
  it("exits 2 with a one-line message and no stack trace for bad input", () => {
    const r = spawnSync(process.execPath, ["scripts/hushmark.mjs", "solve", "no-such-network.json", "--receiver", "x"], { cwd: root, encoding: "utf8" });
    expect(r.status).toBe(2);
    expect(r.stderr).toBe("hushmark: no-such-network.json: cannot read the file: no such file\n");
    expect(r.stdout).toBe("");
  }, 120_000);
  it("prints parseable JSON", () => {
    const r = spawnSync(process.execPath, ["scripts/hushmark.mjs", "rate", "examples/bare-floor-ln.csv", "--json"], { cwd: root, encoding: "utf8" });
    expect(r.status).toBe(0);
    expect(JSON.parse(r.stdout).ln_w).toBe(79); // ISO 717-2 Annex C bare floor
  }, 120_000);
});
