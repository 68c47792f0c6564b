import { describe, expect, it } from "vitest";
import { hushmark, network, options, csv, THIRDS } from "../test/harness.js";
import type { Command } from "./commands/command.js";

const STC_EXAMPLE = [18, 18, 17, 17, 20, 21, 22, 23, 25, 26, 26, 25, 25, 26, 30, 31];
const stcRows = (): [number, number][] => [[100, 17], ...THIRDS.slice(4, 20).map((f, i): [number, number] => [f, STC_EXAMPLE[i]!])];

/** Every error: exit 2, a message naming the place, and no stack trace. */
function expectInputError(o: { code: number; stderr: string; stdout: string }, ...patterns: RegExp[]) {
  expect(o.code).toBe(2);
  expect(o.stdout).toBe("");
  for (const p of patterns) expect(o.stderr).toMatch(p);
  expect(o.stderr).not.toMatch(/\n\s+at /);
}

describe("dispatcher", () => {
  it("prints usage and exits 2 without a command, 0 for help", async () => {
    expectInputError(await hushmark([]), /usage: hushmark <command>/);
    const help = await hushmark(["help"]);
    expect(help.code).toBe(0);
    expect(help.stdout).toMatch(/rate .*solve .*upgrades/s);
    expect((await hushmark(["solve", "--help"])).stdout).toMatch(/usage: hushmark solve NETWORK.json/);
  });
  it("rejects unknown commands and options", async () => {
    expectInputError(await hushmark(["frobnicate"]), /unknown command "frobnicate"/);
    expectInputError(await hushmark(["rate", "a.csv", "--fast"], { "a.csv": csv(stcRows()) }), /rate: unknown option --fast/, /usage: hushmark rate FILE/);
    expectInputError(await hushmark(["rate"]), /rate: missing FILE/);
    expectInputError(await hushmark(["rate", "a.csv", "b.csv"]), /unexpected argument "b.csv"/);
    expectInputError(await hushmark(["rate", "a.csv", "--json=yes"]), /--json takes no value/);
  });
  it("reports an unexpected failure in one line with exit 1", async () => {
    const boom: Command = { name: "boom", summary: "", usage: "boom", run: () => { throw new Error("kaput"); } };
    const o = await hushmark(["boom"], {}, [boom]);
    expect(o.code).toBe(1);
    expect(o.stderr).toBe("hushmark: internal error: kaput\n");
  });
});

describe("rate", () => {
  it("rates airborne data with every supported figure", async () => {
    const o = await hushmark(["rate", "wall.csv", "--json"], { "wall.csv": csv(stcRows()) });
    expect(o.code).toBe(0);
    const j = JSON.parse(o.stdout);
    expect(j.stc).toBe(25); // ASTM E413 example (engine-notes [pub])
    expect(typeof j.rw).toBe("number");
    expect(typeof j.c).toBe("number");
    expect(typeof j.ctr).toBe("number");
    expect(j.oitc).toBeUndefined(); // needs 80 and 100 Hz
    expect(j.c50_5000).toBeUndefined();
    expect(j.notes.join("\n")).toMatch(/oitc: not rated — .*needs data at 80 Hz/);
    expect(j.notes.join("\n")).toMatch(/c50_5000: not rated/);
    expect(j.details.stc.deviation_sum_db).toBe(29);
  });
  it("gives C50-5000 and OITC with full 50–5000 Hz data", async () => {
    const rows: [number, number][] = THIRDS.map((f, i) => [f, 20 + i * 1.5]);
    const j = JSON.parse((await hushmark(["rate", "w.csv", "--json"], { "w.csv": csv(rows) })).stdout);
    for (const k of ["stc", "rw", "c", "ctr", "oitc", "c50_5000", "ctr50_5000"]) expect(typeof j[k]).toBe("number");
  });
  it("rates impact data", async () => {
    const ln = [62.1, 63.2, 63.5, 66.2, 68.5, 70.0, 71.7, 73.1, 73.8, 73.5, 73.8, 73.3, 73.1, 73.0, 72.4, 71.2];
    const o = await hushmark(["rate", "floor.csv", "--json"], { "floor.csv": csv(THIRDS.slice(3, 19).map((f, i) => [f, ln[i]!]), "ln_db") });
    const j = JSON.parse(o.stdout);
    expect([j.ln_w, j.ci, j.iic]).toEqual([79, -11, 28]); // ISO 717-2 Annex C; IIC per ASTM E989 [derived]
    const text = await hushmark(["rate", "floor.csv"], { "floor.csv": csv(THIRDS.slice(3, 19).map((f, i) => [f, ln[i]!]), "ln_db") });
    expect(text.stdout).toMatch(/Ln,w 79 dB \(CI -11 dB\)/);
  });
  it("names the file and line of every CSV problem", async () => {
    expectInputError(await hushmark(["rate", "none.csv"]), /none\.csv: cannot read the file: no such file/);
    expectInputError(await hushmark(["rate", "dir/"]), /dir\/: cannot read the file: it is a folder/);
    expectInputError(await hushmark(["rate", "e.csv"], { "e.csv": "\n\n" }), /e\.csv: the file is empty/);
    expectInputError(await hushmark(["rate", "h.csv"], { "h.csv": "hz,tl_db\n100,20\n" }), /h\.csv:1: the header needs a frequency_hz column/);
    expectInputError(await hushmark(["rate", "h.csv"], { "h.csv": "frequency_hz,tl_db,ln_db\n100,20,30\n" }), /h\.csv:1: .*exactly one of tl_db/);
    expectInputError(await hushmark(["rate", "h.csv"], { "h.csv": "frequency_hz,level\n100,20\n" }), /h\.csv:1: .*exactly one of tl_db/);
    expectInputError(await hushmark(["rate", "f.csv"], { "f.csv": "frequency_hz,tl_db\n100,20\nabc,21\n" }), /f\.csv:3: frequency_hz "abc" is not a number/);
    expectInputError(await hushmark(["rate", "f.csv"], { "f.csv": "frequency_hz,tl_db\n100,20\n110,21\n" }), /f\.csv:3: 110 Hz is not a nominal one-third-octave/);
    expectInputError(await hushmark(["rate", "f.csv"], { "f.csv": "frequency_hz,tl_db\n100,20\n125,\n" }), /f\.csv:3: tl_db "" is not a number/);
    expectInputError(await hushmark(["rate", "f.csv"], { "f.csv": "frequency_hz,tl_db\n100,20\n100,21\n" }), /f\.csv:3: 100 Hz appears twice/);
    expectInputError(await hushmark(["rate", "f.csv"], { "f.csv": "frequency_hz,tl_db\n" }), /f\.csv:1: no data rows/);
  });
  it("accepts comments, blank lines, quotes and semicolons", async () => {
    const text = "# lab report\nfrequency_hz;tl_db\n\n" + stcRows().map(([f, v]) => `"${f}";${v}`).join("\n");
    expect(JSON.parse((await hushmark(["rate", "s.csv", "--json"], { "s.csv": text })).stdout).stc).toBe(25);
  });
});

describe("solve", () => {
  const files = () => ({ "net.json": JSON.stringify(network()) });
  it("prints levels, dba, nc, paths and gains", async () => {
    const o = await hushmark(["solve", "net.json", "--source", "cafe", "--receiver", "studio", "--json"], files());
    expect(o.code).toBe(0);
    const j = JSON.parse(o.stdout);
    expect(j.levels_db).toHaveLength(21);
    expect(typeof j.dba).toBe("number");
    expect(typeof j.nc).toBe("number");
    expect(j.paths.length).toBeGreaterThan(0);
    expect(j.paths[0].spaces[0]).toBe("cafe");
    expect(Object.keys(j.gain_if_perfect_db)).toContain("party-wall");
    const text = await hushmark(["solve", "net.json", "--source", "cafe", "--receiver", "studio", "--target-dba", "30"], files());
    expect(text.stdout).toMatch(/Where the sound gets through/);
    expect(text.stdout).toMatch(/Target: short by/);
  });
  it("names the file, line and column of invalid JSON", async () => {
    expectInputError(await hushmark(["solve", "bad.json", "--receiver", "studio"], { "bad.json": '{\n  "spaces": [1,\n  }\n' }), /bad\.json:3:3: invalid JSON: unexpected "}"/);
    expectInputError(await hushmark(["solve", "bad.json", "--receiver", "studio"], { "bad.json": '{"spaces": [' }), /bad\.json:1:13: invalid JSON: unexpected end of the file/);
    expectInputError(await hushmark(["solve", "empty.json", "--receiver", "studio"], { "empty.json": "" }), /empty\.json: the file is empty/);
  });
  it("names the JSON path of schema problems", async () => {
    const shape = network() as any;
    shape.spaces[1].kind = "garage";
    expectInputError(await hushmark(["solve", "n.json", "--receiver", "studio"], { "n.json": JSON.stringify(shape) }), /n\.json: 1 problem in the network/, /n\.json: \$\.spaces\[1\]\.kind: /);
    const cross = network() as any;
    cross.links[0].parts[0].tl_db = [1, 2];
    cross.links[1].between[0] = "kitchen";
    const o = await hushmark(["solve", "n.json", "--receiver", "studio"], { "n.json": JSON.stringify(cross) });
    expectInputError(o, /2 problems in the network/, /n\.json: \$\.links\[0\]\.parts\[0\]\.tl_db: has 2 values/, /\$\.links\[1\]\.between\[0\]: link "cafe-tiles" names unknown space "kitchen"/);
  });
  it("names unknown sources and receivers and impossible balances", async () => {
    expectInputError(await hushmark(["solve", "net.json", "--receiver", "attic"], files()), /net\.json: no space "attic"/);
    expectInputError(await hushmark(["solve", "net.json", "--source", "studio", "--receiver", "void"], files()), /no source "studio"/);
    expectInputError(await hushmark(["solve", "net.json", "--receiver", "street"], files()), /outdoors/);
    const n = network() as any;
    n.spaces[1].absorption_m2 = 1;
    n.spaces[2].absorption_m2 = 1;
    n.links[2].parts[0].tl_db = n.links[2].parts[0].tl_db.map(() => 0);
    expectInputError(await hushmark(["solve", "n.json", "--receiver", "studio"], { "n.json": JSON.stringify(n) }), /give away more sound than they absorb/);
  });
  it("checks its options", async () => {
    expectInputError(await hushmark(["solve", "net.json"], files()), /solve: missing --receiver/);
    expectInputError(await hushmark(["solve", "net.json", "--receiver"], files()), /--receiver needs a value/);
    expectInputError(await hushmark(["solve", "net.json", "--receiver", "studio", "--k", "zero"], files()), /--k must be a number ≥ 1/);
    expectInputError(await hushmark(["solve", "net.json", "--receiver", "studio", "--target-dba", "30", "--target-nc", "25"], files()), /give only one of/);
    expectInputError(await hushmark(["solve", "net.json", "--receiver", "studio", "--target-nc", "90"], files()), /between 15 and 70/);
  });
});

describe("upgrades", () => {
  const files = (opts: unknown = options()) => ({ "net.json": JSON.stringify(network()), "opts.json": JSON.stringify(opts) });
  it("prints each option alone and the best combination", async () => {
    const o = await hushmark(["upgrades", "net.json", "opts.json", "--source", "cafe", "--receiver", "studio", "--budget", "700", "--json"], files());
    expect(o.code).toBe(0);
    const j = JSON.parse(o.stdout);
    expect(j.options.map((x: { id: string }) => x.id)).toEqual(["seal", "lining", "barrier"]);
    expect(j.best.cost).toBeLessThanOrEqual(700);
    expect(j.best.exact).toBe(true);
    expect(typeof j.options[0].gain_db).toBe("number");
    expect(j.frontier.points[0].cost).toBe(0);
    const text = await hushmark(["upgrades", "net.json", "opts.json", "--receiver", "studio", "--budget", "700"], files());
    expect(text.stdout).toMatch(/Best combination within budget 700/);
  });
  it("evaluates a chosen combination", async () => {
    const o = await hushmark(["upgrades", "net.json", "opts.json", "--receiver", "studio", "--combine", "seal,barrier", "--json"], files());
    const j = JSON.parse(o.stdout);
    expect(j.combination.options).toEqual(["seal", "barrier"]);
    expect(j.combination.cost).toBe(40 + 15 * 40);
    expectInputError(await hushmark(["upgrades", "net.json", "opts.json", "--receiver", "studio", "--combine", "seal,paint"], files()), /--combine: no option "paint"/);
  });
  it("reads limits and target from the options file, the command line winning", async () => {
    const o = await hushmark(["upgrades", "net.json", "opts.json", "--receiver", "studio", "--json", "--budget", "50"], files({ options: options(), limits: { budget: 10000 }, target: { kind: "reduction", db: 3 } }));
    const j = JSON.parse(o.stdout);
    expect(j.best.cost).toBeLessThanOrEqual(50);
    expect(j.base.shortfall_db).toBe(3);
  });
  it("names the JSON path of option problems", async () => {
    const bad = options() as any[];
    bad[0].action.part = "door";
    bad[2].link = "roof";
    expectInputError(await hushmark(["upgrades", "net.json", "opts.json", "--receiver", "studio"], files(bad)), /opts\.json: \$\[0\]\.action\.part: link "party-wall" has no part "door"/, /opts\.json: \$\[2\]\.link: no link "roof"/);
    expectInputError(await hushmark(["upgrades", "net.json", "opts.json", "--receiver", "studio"], files({ options: [{ id: "x", link: "party-wall" }] })), /opts\.json: \$\.options\[0\]\.action: /);
    expectInputError(await hushmark(["upgrades", "net.json", "opts.json", "--receiver", "studio"], { "net.json": JSON.stringify(network()), "opts.json": "[{]" }), /opts\.json:1:3: invalid JSON/);
    expectInputError(await hushmark(["upgrades", "net.json", "missing.json", "--receiver", "studio"], files()), /missing\.json: cannot read the file/);
  });
  it("checks its options", async () => {
    expectInputError(await hushmark(["upgrades", "net.json", "--receiver", "studio"], files()), /upgrades: missing OPTIONS\.json/);
    expectInputError(await hushmark(["upgrades", "net.json", "opts.json", "--receiver", "studio", "--budget", "-5"], files()), /--budget must be a number ≥ 0, got "-5"/);
    expectInputError(await hushmark(["upgrades", "net.json", "opts.json", "--receiver", "studio", "--allow-flags", "loud"], files()), /unknown flag "loud"/);
    expectInputError(await hushmark(["upgrades", "net.json", "opts.json", "--receiver", "cafe"], files()), /net\.json: receiver "cafe" is a source space/);
  });
});
