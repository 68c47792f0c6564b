import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { hushmark } from "../../test/harness.js";

const demo = readFileSync(new URL("../../../../examples/fernhollow-studio.plan.json", import.meta.url), "utf8");
const files = { "plan.json": demo };

function expectInputError(o: { code: number; stderr: string; stdout: string }, ...patterns: RegExp[]) {
  expect(o.code).toBe(2);
  expect(o.stdout).toBe("");
  for (const p of patterns) expect(o.stderr).toMatch(p);
  expect(o.stderr).not.toMatch(/\n\s+at /);
}

describe("analyze", () => {
  it("analyses the demo plan by room names and finds the shared ceiling void the weakest link", async () => {
    const o = await hushmark(["analyze", "plan.json", "--source", "café (counter", "--receiver", "Recording room", "--target-nc", "25", "--json"], files);
    expect(o.code, o.stderr).toBe(0);
    const r = JSON.parse(o.stdout);
    expect(r.source).toMatchObject({ id: "cafe", kind: "airborne", spectrum: "speech-raised" });
    expect(r.receiver.id).toBe("record");
    expect(r.receiver.levelsDb).toHaveLength(21);
    expect(r.receiver.dba).toBeLessThan(r.source.dba - 20);
    // The party wall stops at the suspended ceiling, so the void above both rooms carries most of the sound (docs/plan-model.md).
    expect(r.elements[0].kind).toBe("ceiling");
    expect(r.elements[0].share).toBeGreaterThan(0.5);
    expect(r.target).toMatchObject({ met: expect.any(Boolean) });
    expect(r.paths.length).toBeGreaterThan(0);
  });

  it("prints a readable summary without --json", async () => {
    const o = await hushmark(["analyze", "plan.json", "--source", "back", "--receiver", "control", "--spectrum", "machinery-hum"], files);
    expect(o.code, o.stderr).toBe(0);
    expect(o.stdout).toMatch(/^Control room: \d+\.\d dB\(A\), NC-\d+, from Café back room/);
    expect(o.stdout).toMatch(/Where the sound gets through:/);
  });

  it("analyses footfall on a floor with --impact", async () => {
    const o = await hushmark(["analyze", "plan.json", "--source", "dance", "--receiver", "record", "--impact", "--json"], files);
    expect(o.code, o.stderr).toBe(0);
    const r = JSON.parse(o.stdout);
    expect(r.source.kind).toBe("impact");
    expect(r.receiver.dba).toBeGreaterThan(0);
  });

  it("exits 2 naming the problem for an unknown room, an unknown spectrum, bad JSON and a file that is not a plan", async () => {
    expectInputError(await hushmark(["analyze", "plan.json", "--source", "attic", "--receiver", "record"], files), /plan\.json: --source "attic" is not a room/, /spaces: back \(Café back room/);
    expectInputError(await hushmark(["analyze", "plan.json", "--source", "cafe", "--receiver", "record", "--spectrum", "kazoo"], files), /--spectrum "kazoo" is not in the source library/, /speech-normal/);
    expectInputError(await hushmark(["analyze", "bad.json", "--source", "a", "--receiver", "b"], { "bad.json": '{"format": ' }), /bad\.json:1:\d+: invalid JSON/);
    expectInputError(await hushmark(["analyze", "other.json", "--source", "a", "--receiver", "b"], { "other.json": '{"format": "something-else"}' }), /other\.json: this is not a valid plan document/);
    expectInputError(await hushmark(["analyze", "plan.json", "--receiver", "record"], files), /missing --source|--source/);
  });
});
