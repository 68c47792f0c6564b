import { describe, expect, it } from "vitest";
import { parseNetwork } from "@hushmark/acoustics";
import { constructionCatalogue } from "../catalogue/catalogue.js";
import { firstLevel, groundLevel, planWith, rect } from "../../test/plan-fixtures.js";
import { buildNetwork } from "./build-network.js";
import { LINED_DUCT_DB_PER_M } from "./ducts.js";
import { linkTauSM2 } from "./transmitting-area.js";
import { planWallPieces } from "../geometry/walls.js";

const room = (id: string, x: number, y: number, w: number, h: number, levelId = "L0", extra: Record<string, unknown> = {}) => ({
  type: "room" as const, id, levelId, name: `Room ${id}`, use: "office" as const, outline: rect(id, x, y, w, h), finish: { kind: "rt60" as const, rt60S: 0.5 }, ...extra,
});
const door = { type: "door" as const, id: "D", wallRef: "A:Ab", offsetM: 1, widthM: 0.9, heightM: 2.0, constructionId: "door-solid-core-sealed", leaks: { undercutMm: 10, perimeterGapMm: 0, sealsCracked: false } };

function built(els: Parameters<typeof planWith>[0], extra = {}, options = {}) {
  const r = buildNetwork(planWith(els, extra), constructionCatalogue, options);
  if (!r.ok) throw new Error(r.problems.map((p) => p.message).join("; "));
  return r;
}

describe("buildNetwork", () => {
  it("gives a valid engine network whose every link and part traces back to the plan", () => {
    const plan = planWith([groundLevel, room("A", 0, 0, 4, 5), room("B", 4, 0, 4, 5), door]);
    const r = buildNetwork(plan, constructionCatalogue);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    const parsed = parseNetwork(r.network);
    expect(parsed.ok ? [] : parsed.issues).toEqual([]);
    const pieceIds = new Set(planWallPieces(plan).map((p) => p.id));
    for (const link of r.network.links ?? []) {
      expect(r.links[link.id]).toBeDefined();
      expect(pieceIds.has(link.ref!) || plan.elements[link.ref!] !== undefined || link.ref!.includes("^")).toBe(true);
      if (link.type === "partition" || link.type === undefined) {
        for (const part of link.parts) expect(pieceIds.has(part.ref!) || plan.elements[part.ref!] !== undefined).toBe(true);
      }
    }
  });

  it("splits the shared wall into its net area, the door leaf and the undercut", () => {
    const r = built([groundLevel, room("A", 0, 0, 4, 5), room("B", 4, 0, 4, 5), door], {}, { flanking: false });
    const link = r.network.links!.find((l) => l.id === "wall:A:Ab|B:Bd");
    expect(link?.between).toEqual(["A", "B"]);
    if (!link || link.type !== "partition") throw new Error("no partition");
    const byId = Object.fromEntries(link.parts.map((p) => [p.id, p]));
    // 5 m × 2.5 m wall less the 0.9 m × 2.0 m door; the door leaf less its 0.9 m × 10 mm undercut.
    expect(byId["A:Ab|B:Bd:wall"]!.area_m2).toBeCloseTo(12.5 - 1.8, 9);
    expect(byId["D:leaf"]!.area_m2).toBeCloseTo(1.8 - 0.009, 9);
    expect(byId["D:undercut"]).toMatchObject({ open: true, ref: "D" });
    expect(byId["D:undercut"]!.area_m2).toBeCloseTo(0.009, 12);
    expect(link.parts.reduce((s, p) => s + p.area_m2, 0)).toBeCloseTo(12.5, 9);
  });

  it("links unshared walls to the outdoors, or to a neighbour when set", () => {
    const r = built(
      [groundLevel, room("A", 0, 0, 4, 5), { type: "neighbour", id: "N", name: "Shop next door" }],
      { wallSettings: { "A:Ab|0": { faces: { kind: "neighbour", neighbourId: "N" } } } },
    );
    const ends = r.network.links!.map((l) => l.between[1]).sort();
    expect(ends).toEqual(["N", "outdoors", "outdoors", "outdoors"]);
    const neighbour = r.network.spaces.find((s) => s.id === "N")!;
    expect(neighbour).toMatchObject({ kind: "neighbour", volume_m3: 50 });
    // The assumed 10 m² is drawn-surface absorption, so what leaves through the shared wall is added.
    const wall = r.network.links!.find((l) => l.between[1] === "N")!;
    const out = linkTauSM2(wall);
    (neighbour.absorption_m2 as number[]).forEach((a, b) => expect(a).toBeCloseTo(10 + out[b]!, 9));
    expect(r.assumptions.map((p) => p.code)).toEqual(["neighbour-unsurveyed"]);
  });

  it("links stacked rooms through the upper room's floor over the area they share, with impact data", () => {
    const upper = room("U", 2, 1, 4, 5, "L1", { floor: { constructionId: "floor-wood-joist-gypsum-ceiling", coveringId: "covering-carpet-underlay" } });
    const r = built([groundLevel, firstLevel, room("A", 0, 0, 4, 5), upper]);
    const floor = r.network.links!.find((l) => l.type === "floor");
    if (!floor || floor.type !== "floor") throw new Error("no floor");
    expect(floor.between).toEqual(["U", "A"]);
    expect(floor.area_m2).toBeCloseTo(8, 6);
    expect(floor.tl_db).toEqual(constructionCatalogue.constructions["floor-wood-joist-gypsum-ceiling"]!.tlDb);
    expect(floor.impact?.delta_l_db).toEqual(constructionCatalogue.coverings["covering-carpet-underlay"]!.deltaLDb);
  });

  it("routes a ceiling void over three rooms: a ceiling link to each, the room above through the void", () => {
    const r = built([
      groundLevel, firstLevel,
      room("R1", 0, 0, 3, 4), room("R2", 3, 0, 3, 4), room("R3", 6, 0, 3, 4),
      { type: "void", id: "V", name: "Plenum", kind: "ceiling-void", levelId: "L0", outline: rect("V", 0, 0, 9, 4), depthM: 0.6 },
      room("U", 0, 0, 9, 4, "L1"),
    ]);
    const floorish = r.network.links!.filter((l) => l.type === "floor").map((l) => l.between.join(">")).sort();
    expect(floorish).toEqual(["U>V", "V>R1", "V>R2", "V>R3"]);
    expect(r.network.spaces.find((s) => s.id === "V")).toMatchObject({ kind: "void" });
    expect(r.network.spaces.find((s) => s.id === "V")!.volume_m3).toBeCloseTo(9 * 4 * 0.6, 9);
  });

  it("adds a duct's lining, bends and end reflection into one vent link", () => {
    const r = built([
      groundLevel, room("A", 0, 0, 4, 5), room("B", 8, 0, 4, 5),
      { type: "vent", id: "G1", spaceId: "A", mount: "ceiling", position: { x: 2, y: 2 }, openAreaM2: 0.04 },
      { type: "vent", id: "G2", spaceId: "B", mount: "ceiling", position: { x: 10, y: 2 }, openAreaM2: 0.06 },
      { type: "duct", id: "K", fromVentId: "G1", toVentId: "G2", lengthM: 5, lining: "lined", bends: 2 },
    ]);
    const v = r.network.links!.find((l) => l.type === "vent");
    if (!v || v.type !== "vent") throw new Error("no vent");
    expect(v.open_area_m2).toBe(0.04);
    expect(v.attenuation_parts!.map((p) => p.name)).toEqual(["5 m lined duct", "2 bends", "end reflection at the grille"]);
    const i63 = 1; // 63 Hz band
    expect(v.attenuation_parts![0]!.attenuation_db[i63]).toBeCloseTo(5 * 1.8, 6); // handbook 1.8 dB/m at 63 Hz
    expect(LINED_DUCT_DB_PER_M[13]).toBeCloseTo(15.4, 6); // 1 kHz value of the same table
    v.attenuation_db.forEach((total, i) => expect(total).toBeCloseTo(v.attenuation_parts!.reduce((s, p) => s + p.attenuation_db[i]!, 0), 1));
    expect(r.links["duct:K"]!.refs).toEqual(["G1", "K", "G2"]);
  });

  it("adds flanking paths along a façade that runs past a party wall", () => {
    const r = built([groundLevel, room("A", 0, 0, 4, 5), room("B", 4, 0, 4, 5)]);
    const flank = r.network.links!.filter((l) => l.type === "flanking");
    // The south and north façades each continue through a T junction, plus the floor along the wall's foot.
    expect(flank.map((l) => l.id).sort()).toEqual([
      // The wall runs along A's east edge from (4, 0): its start meets the south façade, its end the north.
      "flank:A:Ab|B:Bd@start:A:Aa|0~B:Ba|0",
      "flank:A:Ab|B:Bd@floor",
      "flank:A:Ab|B:Bd@end:A:Ac|0~B:Bc|0",
    ].sort());
    for (const l of flank) if (l.type === "flanking") expect(l.separating_area_m2).toBeCloseTo(12.5, 9);
    const facade = flank.find((l) => l.id.includes("@start"));
    if (!facade || facade.type !== "flanking") throw new Error("no façade path");
    // Brick façade (exterior default) either side of a wood-stud party wall, meeting at a T.
    expect(facade).toMatchObject({ junction: "t", path: "Ff", coupling_length_m: 2.5, mass_perpendicular_kg_m2: 23 });
    expect(facade.element_i).toMatchObject({ ref: "A:Aa|0", mass_kg_m2: 190 });
    expect(facade.element_i.area_m2).toBeCloseTo(4 * 2.5, 9);
  });

  it("refuses a plan with errors and returns its problems", () => {
    const r = buildNetwork(planWith([groundLevel, room("A", 0, 0, 4, 5), room("B", 3, 0, 4, 5)]), constructionCatalogue);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.problems.map((p) => p.code)).toContain("rooms-overlap");
  });
});

describe("free-standing walls", () => {
  it("give their construction to the room boundary they are drawn along, and host openings there", () => {
    const r = built([
      groundLevel, room("A", 0, 0, 4, 5), room("B", 4, 0, 4, 5),
      { type: "wall", id: "W", levelId: "L0", start: { x: 4, y: 0 }, end: { x: 4, y: 5 }, constructionId: "masonry-block-200", thicknessM: 0.2 },
      { type: "door", id: "D2", wallRef: "W", offsetM: 3, widthM: 0.8, heightM: 2, constructionId: "door-solid-core" },
    ], {}, { flanking: false });
    const link = r.network.links!.find((l) => l.id === "wall:A:Ab|B:Bd");
    if (!link || link.type !== "partition") throw new Error("no partition");
    expect(link.parts.map((p) => p.id)).toEqual(["A:Ab|B:Bd:wall", "D2:leaf"]);
    expect(link.parts[0]).toMatchObject({ construction: "masonry-block-200" });
    expect(r.links[link.id]!.points!["D2"]).toEqual({ x: 4, y: 3.4 });
  });
});

describe("flanking pruning", () => {
  it("drops paths far weaker than the wall they flank, keeps them all on request", () => {
    // A light stud party wall between rooms whose façade is 200 mm block: the façade path is
    // much weaker than the wall itself in every band.
    const els = [groundLevel, room("A", 0, 0, 4, 5), room("B", 4, 0, 4, 5)];
    const extra = { defaults: { interiorWallConstructionId: "stud-wood-1x1-gypsum", exteriorWallConstructionId: "masonry-block-200", floorConstructionId: "floor-concrete-200", ceilingConstructionId: "ceiling-gypsum-12-5" } };
    const all = built(els, extra, { flankingPruneDb: Infinity }).network.links!.filter((l) => l.type === "flanking");
    const pruned = built(els, extra, { flankingPruneDb: 10 }).network.links!.filter((l) => l.type === "flanking");
    expect(all).toHaveLength(3);
    expect(pruned.length).toBeLessThan(all.length);
    for (const l of all.filter((x) => !pruned.some((p) => p.id === x.id))) {
      const wall = constructionCatalogue.constructions["stud-wood-1x1-gypsum"]!.tlDb.map((tl) => 12.5 * 10 ** (-tl / 10));
      linkTauSM2(l).forEach((t, b) => expect(t).toBeLessThan(wall[b]! * 0.1));
    }
  });
});

describe("crawlspaces", () => {
  it("link the rooms above through their own floor and covering", () => {
    const r = built([
      groundLevel, room("A", 0, 0, 4, 5, "L0", { floor: { constructionId: "floor-wood-joist-no-ceiling", coveringId: "covering-vinyl" } }),
      { type: "void", id: "C", name: "Crawlspace", kind: "crawlspace", levelId: "L0", outline: rect("C", 0, 0, 4, 5), depthM: 0.8 },
    ]);
    const link = r.network.links!.find((l) => l.type === "floor");
    if (!link || link.type !== "floor") throw new Error("no floor link");
    expect(link).toMatchObject({ id: "floor:A^C", between: ["A", "C"], ref: "A^C" });
    expect(link.tl_db).toEqual(constructionCatalogue.constructions["floor-wood-joist-no-ceiling"]!.tlDb);
    expect(link.impact?.delta_l_db).toEqual(constructionCatalogue.coverings["covering-vinyl"]!.deltaLDb);
    expect(r.network.spaces.find((s) => s.id === "C")).toMatchObject({ kind: "crawlspace" });
  });
});
