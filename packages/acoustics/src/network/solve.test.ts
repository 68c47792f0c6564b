import { describe, expect, it } from "vitest";
import { parseNetwork } from "./parse.js";
import { solveNetwork } from "./solve.js";
import { denseLevels } from "../../test/dense-reference.js";
import { chainOfThree, flat, loopOfFour, minimalNetwork, plenum, rising, room, ventLink, wall } from "../../test/networks.js";
import type { Network } from "./schema.js";
import { aWeightedLevelDb } from "../bands/weighting.js";
import { spectrum } from "../bands/spectrum.js";

function parsed(raw: unknown): Network {
  const p = parseNetwork(raw);
  if (!p.ok) throw new Error(JSON.stringify(p.issues));
  return p.value;
}

function expectLevelsClose(actual: readonly number[], expected: readonly number[], digits = 6) {
  expect(actual).toHaveLength(expected.length);
  actual.forEach((v, i) => expect(v).toBeCloseTo(expected[i]!, digits));
}

describe("two-room level difference", () => {
  it("follows L2 = L1 − TL + 10·lg(S/A2)", () => {
    // engine-notes [derived], ISO 10140-2 form: L1 90, TL 45, S 10 m², A2 20 m² → 42.0 dB
    const raw = { spaces: [room("a", 1e9), room("b", 20)], links: [wall("w", "a", "b", 10, flat(45))], sources: [{ space: "a", levels_db: flat(90) }] };
    const r = solveNetwork(parsed(raw), { receiver: "b" });
    r.levelsDb.forEach((v) => expect(v).toBeCloseTo(41.99, 2));
  });
});

describe("network solve against dense linear algebra", () => {
  const cases: [string, () => any, string][] = [
    ["chain of three rooms", chainOfThree, "c"],
    ["a loop", loopOfFour, "c"],
    ["a plenum linking two rooms", plenum, "meeting"],
    ["a vent link", ventLink, "studio"],
    ["the minimal form", minimalNetwork, "studio"],
  ];
  for (const [name, make, receiver] of cases) {
    it(`matches for ${name}`, () => {
      const raw = make();
      const r = solveNetwork(parsed(raw), { receiver });
      const dense = denseLevels(raw, 21);
      expectLevelsClose(r.levelsDb, dense.get(receiver)!);
      for (const s of r.spaces) if (Number.isFinite(dense.get(s.id)![0]!)) expectLevelsClose(s.levelsDb, dense.get(s.id)!);
      expect(r.solver.forward.converged).toBe(true);
    });
  }
  it("matches for a flanking link with a given K_ij", () => {
    const el = { tl_db: rising(30), area_m2: 10, mass_kg_m2: 100 };
    const raw = {
      ...chainOfThree(),
      links: [...chainOfThree().links, { id: "fl", type: "flanking", between: ["a", "c"], junction: "cross", element_i: el, element_j: el, mass_perpendicular_kg_m2: 200, coupling_length_m: 3, separating_area_m2: 9, kij_db: 10 }],
    };
    expectLevelsClose(solveNetwork(parsed(raw), { receiver: "c" }).levelsDb, denseLevels(raw, 21).get("c")!);
  });
});

describe("gain if perfect", () => {
  it("equals a dense re-solve without the link", () => {
    const raw = plenum();
    const r = solveNetwork(parsed(raw), { receiver: "meeting" });
    for (const link of r.links.filter((l) => l.gainIfPerfectDb !== undefined)) {
      const without = { ...raw, links: raw.links.filter((l: { id: string }) => l.id !== link.id) };
      const dense = denseLevels(without, 21).get("meeting")!;
      const expected = r.dba - aWeightedLevelDb(spectrum("third-octave", dense));
      expect(link.gainIfPerfectDb!).toBeCloseTo(expected, 6);
      link.gainIfPerfectByBandDb!.forEach((g, b) => expect(g).toBeCloseTo(r.levelsDb[b]! - dense[b]!, 6));
    }
  });
  it("ranks links by share, and a series link carries nearly everything", () => {
    const r = solveNetwork(parsed(chainOfThree()), { receiver: "c" });
    expect(r.links[0]!.share).toBeGreaterThan(0.99);
    expect(r.links[1]!.share).toBeGreaterThan(0.99);
  });
});

describe("paths", () => {
  it("lists both plenum and direct paths, strongest first", () => {
    const r = solveNetwork(parsed(plenum()), { receiver: "meeting" });
    expect(new Set(r.paths.map((p) => p.spaces.join(">")))).toEqual(new Set(["office>void>meeting", "office>meeting"]));
    expect(r.paths[0]!.dba).toBeGreaterThanOrEqual(r.paths[1]!.dba);
    const sum = r.paths.reduce((s, p) => s + p.share, 0);
    expect(sum).toBeLessThanOrEqual(1 + 1e-9);
    expect(sum).toBeGreaterThan(0.95);
  });
  it("finds every simple path of a loop in order", () => {
    const r = solveNetwork(parsed(loopOfFour()), { receiver: "c", k: 10 });
    expect(r.paths).toHaveLength(2);
    expect(r.paths[0]!.share).toBeGreaterThanOrEqual(r.paths[1]!.share);
  });
});

describe("impact sources", () => {
  it("gives L = Ln − ΔL − 10·lg(A2/A0) in the room below", () => {
    // [derived] ISO 10140-3 normalization, A0 = 10 m²: Ln 70, ΔL 10, A2 20 m² → 56.99 dB
    const raw = {
      spaces: [room("dance", 30), room("studio", 20)],
      links: [{ id: "floor", type: "floor", between: ["dance", "studio"], area_m2: 40, tl_db: flat(200), impact: { ln_db: flat(70), delta_l_db: flat(10) } }],
      sources: [{ type: "impact", floor: "floor" }],
    };
    const r = solveNetwork(parsed(raw), { source: "floor", receiver: "studio" });
    r.levelsDb.forEach((v) => expect(v).toBeCloseTo(56.99, 2));
    expect(r.paths[0]!.kind).toBe("impact");
    expect(r.paths[0]!.links).toEqual(["floor"]);
    expect(r.links[0]!.gainIfPerfectDb).toBe(Infinity);
  });
  it("spreads impact energy onward through walls", () => {
    const raw = {
      spaces: [room("dance", 30), room("below", 20), room("next", 15)],
      links: [
        { id: "floor", type: "floor", between: ["dance", "below"], area_m2: 40, tl_db: flat(60), impact: { ln_db: flat(75) } },
        wall("w", "below", "next", 10, flat(30)),
      ],
      sources: [{ type: "impact", floor: "floor" }],
    };
    const r = solveNetwork(parsed(raw), { receiver: "next" });
    const below = r.spaces.find((s) => s.id === "below")!;
    // next ≈ below − 30 + 10·lg(10/15) for a weak wall
    r.levelsDb.forEach((v, b) => expect(v).toBeCloseTo(below.levelsDb[b]! - 30 + 10 * Math.log10(10 / 15), 2));
  });
});

describe("targets", () => {
  it("reports the shortfall against a level, an NC and a reduction", () => {
    const net = parsed(ventLink());
    const r = solveNetwork(net, { receiver: "studio", target: { kind: "level", dba: 30 } });
    expect(r.shortfall!.shortfallDb).toBeCloseTo(r.dba - 30, 9);
    expect(r.shortfall!.met).toBe(r.dba <= 30);
    const nc = solveNetwork(net, { receiver: "studio", target: { kind: "nc", nc: 20 } });
    expect(nc.shortfall!.met).toBe(nc.nc.value <= 20);
    const red = solveNetwork(net, { receiver: "studio", target: { kind: "reduction", db: 6 } });
    expect(red.shortfall!.shortfallDb).toBeCloseTo(6, 9);
  });
});

describe("request errors", () => {
  it("names unknown sources and receivers", () => {
    const net = parsed(chainOfThree());
    expect(() => solveNetwork(net, { receiver: "zz" })).toThrow(/no space "zz"/);
    expect(() => solveNetwork(net, { receiver: "a" })).toThrow(/is a source space/);
    expect(() => solveNetwork(net, { receiver: "c", source: "b" })).toThrow(/space "b" exists but has no source spectrum/);
  });
  it("accepts octave networks", () => {
    const o = (v: number) => new Array(8).fill(v);
    const raw = { bands: "octave", spaces: [room("a", 20), room("b", 10)], links: [wall("w", "a", "b", 10, o(40))], sources: [{ space: "a", levels_db: o(80) }] };
    const r = solveNetwork(parsed(raw), { receiver: "b" });
    expect(r.levelsDb).toHaveLength(8);
    r.levelsDb.forEach((v) => expect(v).toBeCloseTo(80 - 40 + 10 * Math.log10(10 / 10) - 10 * Math.log10(1 + 10 * 1e-4 / 10), 3));
  });
});

