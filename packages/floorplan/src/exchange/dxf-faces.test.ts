import Drawing from "dxf-writer";
import { describe, expect, it } from "vitest";
import { emptyPlan } from "../document/empty-plan.js";
import { polygonAreaM2 } from "../geometry/polygon.js";
import { planWallPieces, sharedWalls } from "../geometry/walls.js";
import { importDxf, planWithDxfImport } from "./dxf-import.js";

const roles = { levelId: "level-0", layerRoles: { walls: "walls" as const }, otherLayers: "ignore" as const };

/** A single-line sketch in metres (invented): the lines of `lines` on one walls layer. */
function sketch(lines: Array<[number, number, number, number]>): string {
  const d = new Drawing();
  d.setUnits("Meters");
  d.addLayer("walls", 7, "CONTINUOUS");
  d.setActiveLayer("walls");
  for (const [x1, y1, x2, y2] of lines) d.drawLine(x1, y1, x2, y2);
  return d.toDxfString();
}

const areas = (text: string) => {
  const r = importDxf(text, roles);
  if (!r.ok) throw new Error(r.problem.message);
  return { imported: r.imported, areas: r.imported.rooms.map((room) => Math.round(polygonAreaM2(room.outline) * 1e6) / 1e6).sort((a, b) => a - b) };
};

describe("rooms from a network of single wall lines", () => {
  it("a 6 × 4 m flat split by one line ending on the outer walls gives two rooms sharing that wall", () => {
    // The dividing line ends on the long walls (T-junctions); a stub line in the bigger room is furniture-like noise.
    const text = sketch([[0, 0, 6, 0], [6, 0, 6, 4], [6, 4, 0, 4], [0, 4, 0, 0], [2.5, 0, 2.5, 4], [4, 1, 5, 1.5]]);
    const { imported, areas: a } = areas(text);
    expect(a).toEqual([10, 14]);
    const merged = planWithDxfImport(emptyPlan({ id: "sketch", name: "Sketch" }), imported);
    if (!merged.ok) throw new Error(merged.problem.message);
    const shared = sharedWalls(planWallPieces(merged.plan));
    expect(shared).toHaveLength(1);
    expect(shared[0]!.lengthM).toBeCloseTo(4, 9);
    expect(imported.report.toUnderlay.find((l) => l.reason === "wall lines that enclose no room")?.count).toBe(1);
    expect(new Set(imported.rooms.map((r) => r.id)).size).toBe(2);
  });

  it("two lines crossing inside a square give four rooms", () => {
    const text = sketch([[0, 0, 4, 0], [4, 0, 4, 4], [4, 4, 0, 4], [0, 4, 0, 0], [2, 0, 2, 4], [0, 2, 4, 2]]);
    expect(areas(text).areas).toEqual([4, 4, 4, 4]);
  });

  it("walls drawn with two lines leave the strip between them out, with a reason", () => {
    // Two 3 × 3 m rooms side by side with a 0.1 m wall between them drawn as two lines.
    const text = sketch([[0, 0, 6.1, 0], [6.1, 0, 6.1, 3], [6.1, 3, 0, 3], [0, 3, 0, 0], [3, 0, 3, 3], [3.1, 0, 3.1, 3]]);
    const { imported, areas: a } = areas(text);
    expect(a).toEqual([9, 9]);
    expect(imported.report.toUnderlay.some((l) => l.reason.startsWith("a strip under 0.25 m wide"))).toBe(true);
  });
});
