import { describe, expect, it } from "vitest";
import { cinemaUnderNurseryPlan } from "../demo/cinema-under-nursery.js";
import { fernhollowStudioPlan } from "../demo/fernhollow-studio.js";
import { generateSyntheticBuilding } from "../synthetic/generate.js";
import { elementsOfType } from "../document/elements.js";
import type { Opening, Plan, Point } from "../document/schema.js";
import { openingPlacement } from "../geometry/openings.js";
import { polygonAreaM2 } from "../geometry/polygon.js";
import { distanceToLineM, projectionAlongM } from "../geometry/segments.js";
import { planWallPieces } from "../geometry/walls.js";
import { dxfSurvey, importDxf, planWithDxfImport } from "./dxf-import.js";
import { dxfExportLayerRoles, planToDxf } from "./dxf-export.js";

const MM = 0.001;

/** Distance from a point to a closed outline's boundary, m. */
function toBoundaryM(p: Point, outline: readonly Point[]): number {
  let best = Infinity;
  for (let i = 0; i < outline.length; i++) {
    const a = outline[i]!, b = outline[(i + 1) % outline.length]!;
    const len = Math.hypot(b.x - a.x, b.y - a.y);
    const t = projectionAlongM(p, a, b);
    const d = t < 0 ? Math.hypot(p.x - a.x, p.y - a.y) : t > len ? Math.hypot(p.x - b.x, p.y - b.y) : distanceToLineM(p, a, b);
    best = Math.min(best, d);
  }
  return best;
}

function placements(plan: Plan, type: "door" | "window", levelId: string): Array<[Point, Point]> {
  const pieces = planWallPieces(plan);
  return (elementsOfType(plan, type) as readonly Opening[]).flatMap((o) => {
    const p = openingPlacement(plan, pieces, o, plan.defaults.wallToleranceM);
    return p.ok && pieces.find((q) => q.id === p.hostId)?.levelId === levelId ? [[p.start, p.end] as [Point, Point]] : [];
  });
}

const sameSpan = (a: [Point, Point], b: [Point, Point]) =>
  Math.max(Math.hypot(a[0].x - b[0].x, a[0].y - b[0].y), Math.hypot(a[1].x - b[1].x, a[1].y - b[1].y)) <= MM ||
  Math.max(Math.hypot(a[0].x - b[1].x, a[0].y - b[1].y), Math.hypot(a[1].x - b[0].x, a[1].y - b[0].y)) <= MM;

describe("DXF export", () => {
  const synthetic = generateSyntheticBuilding({ rooms: 40, levels: 2, seed: 11 });
  const syntheticLevel = elementsOfType(synthetic, "level")[0]!.id;
  const cases: Array<[string, () => Plan, string]> = [
    ["Fernhollow ground floor", fernhollowStudioPlan, "ground"],
    ["cinema basement", cinemaUnderNurseryPlan, "basement"],
    ["a synthetic 40-room building", () => synthetic, syntheticLevel],
  ];
  for (const [label, make, levelId] of cases) {
    it(`${label}: export then import gives the same rooms, doors and windows within 1 mm`, () => {
      const plan = make();
      const text = planToDxf(plan, { levelId });
      const back = importDxf(text, { levelId, layerRoles: dxfExportLayerRoles(), otherLayers: "ignore" });
      if (!back.ok) throw new Error(back.problem.message);
      expect(back.imported.report.units).toMatchObject({ status: "header", metresPerUnit: 1 });
      const original = elementsOfType(plan, "room").filter((r) => r.levelId === levelId);
      expect(original.length).toBeGreaterThan(0);
      expect(back.imported.rooms).toHaveLength(original.length);
      for (const room of original) {
        const twin = back.imported.rooms.find((r) => r.name === room.name);
        expect(twin, room.name).toBeDefined();
        for (const v of room.outline) expect(toBoundaryM(v, twin!.outline), `${room.name} corner ${v.id}`).toBeLessThanOrEqual(MM);
        for (const v of twin!.outline) expect(toBoundaryM(v, room.outline), `${room.name} imported corner`).toBeLessThanOrEqual(MM);
        expect(Math.abs(polygonAreaM2(twin!.outline) - polygonAreaM2(room.outline))).toBeLessThan(1e-6);
      }
      const merged = planWithDxfImport({ ...plan, elements: Object.fromEntries(Object.entries(plan.elements).filter(([, e]) => e.type === "level")) }, back.imported);
      if (!merged.ok) throw new Error(merged.problem.message);
      for (const type of ["door", "window"] as const) {
        const want = placements(plan, type, levelId);
        const got = placements(merged.plan, type, levelId);
        expect(got.length, type).toBe(want.length);
        if (type === "door") expect(want.length).toBeGreaterThan(0);
        for (const w of want) expect(got.some((g) => sameSpan(g, w)), `${type} at ${w[0].x},${w[0].y}`).toBe(true);
      }
    });
  }

  it("writes metres and one layer per element kind, with walls at their thickness", () => {
    const plan = fernhollowStudioPlan();
    const survey = dxfSurvey(planToDxf(plan, { levelId: "ground" }));
    if (!survey.ok) throw new Error(survey.problem.message);
    expect(survey.units).toMatchObject({ status: "header", code: 6 });
    const count = (name: string) => survey.layers.find((l) => l.name === name)?.entities ?? 0;
    expect(count("rooms")).toBe(4);
    expect(count("room-names")).toBe(4);
    expect(count("walls")).toBe(planWallPieces(plan).filter((p) => p.levelId === "ground").length);
    expect(count("doors")).toBe(2);
    expect(count("windows")).toBe(1);
    expect(count("penetrations")).toBe(1);
    expect(count("vents")).toBe(2);
    expect(count("ducts")).toBe(1);
    expect(count("voids")).toBe(1);
    expect(count("pins")).toBe(6);
    // A party wall of 0.10 m: its outline is 0.10 m across (the band's area over its length).
    const back = importDxf(planToDxf(plan, { levelId: "ground" }), { levelId: "ground", layerRoles: { walls: "walls" }, otherLayers: "ignore" });
    if (!back.ok) throw new Error(back.problem.message);
    const widths = back.imported.rooms.map((r) => {
      const xs = r.outline.map((v) => v.x), ys = r.outline.map((v) => v.y);
      return Math.round(Math.min(Math.max(...xs) - Math.min(...xs), Math.max(...ys) - Math.min(...ys)) * 1000) / 1000;
    });
    expect(widths).toContain(0.1);
    expect(widths).toContain(0.12);
  });

  it("draws only the chosen level", () => {
    const plan = fernhollowStudioPlan();
    const back = importDxf(planToDxf(plan, { levelId: "first" }), { levelId: "first", layerRoles: dxfExportLayerRoles(), otherLayers: "ignore" });
    if (!back.ok) throw new Error(back.problem.message);
    expect(back.imported.rooms.map((r) => r.name)).toEqual(["Dance school rehearsal room"]);
  });
});
