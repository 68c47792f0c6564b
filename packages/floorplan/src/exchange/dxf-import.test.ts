import Drawing from "dxf-writer";
import { describe, expect, it } from "vitest";
import { constructionCatalogue } from "../catalogue/catalogue.js";
import { emptyPlan } from "../document/empty-plan.js";
import { serializePlan } from "../document/serialize.js";
import { openingPlacement } from "../geometry/openings.js";
import { polygonAreaM2 } from "../geometry/polygon.js";
import { planWallPieces, sharedWalls } from "../geometry/walls.js";
import { validatePlan } from "../validation/validate.js";
import { bulgeSegmentAreaM2 } from "./arc-flatten.js";
import { dxfSurvey, importDxf, planFromDxfText, planWithDxfImport } from "./dxf-import.js";
import type { DxfImportOptions } from "./dxf-import-types.js";

const MM = 1000;

/** An old-style POLYLINE with VERTEX/SEQEND groups (dxf-writer only writes LWPOLYLINE), in mm. */
function polylineGroups(layer: string, handle: string, vertices: Array<[number, number, number?]>): string {
  const g: Array<[number, string | number]> = [[0, "POLYLINE"], [5, handle], [8, layer], [66, 1], [10, 0], [20, 0], [30, 0], [70, 1]];
  vertices.forEach(([x, y, bulge], i) => {
    g.push([0, "VERTEX"], [5, `${handle}${i}`], [8, layer], [10, x * MM], [20, y * MM], [30, 0]);
    if (bulge) g.push([42, bulge]);
  });
  g.push([0, "SEQEND"], [8, layer]);
  return g.map(([c, v]) => `${c}\n${v}\n`).join("");
}

/**
 * A small invented flat drawn in millimetres: a studio (closed polyline), a lobby with a
 * semicircular bay (bulge 1), a booth closed by an arc wall drawn as lines and an ARC, and a store
 * as an old-style POLYLINE with a bulged south wall; a door and a window, room names, furniture,
 * dimensions on an ignored layer and a spline.
 */
function flatDxf(opts: { units?: boolean } = {}): string {
  const d = new Drawing();
  if (opts.units !== false) d.setUnits("Millimeters");
  for (const l of ["walls", "doors", "windows", "names", "furniture", "dims"]) d.addLayer(l, 7, "CONTINUOUS");
  const mm = (pts: Array<[number, number, number?]>) => pts.map(([x, y, b]) => (b === undefined ? [x * MM, y * MM] : [x * MM, y * MM, b])) as Array<[number, number]>;
  d.setActiveLayer("walls");
  d.drawPolyline(mm([[0, 0], [4, 0], [4, 3], [0, 3]]), true);
  d.drawPolyline(mm([[4, 0], [7, 0, 1], [7, 3], [4, 3]]), true);
  d.drawLine(0, 3 * MM, 4 * MM, 3 * MM);
  d.drawLine(4 * MM, 3 * MM, 4 * MM, 5 * MM);
  d.drawArc(2 * MM, 5 * MM, 2 * MM, 0, 180);
  d.drawLine(0, 5 * MM, 0, 3 * MM);
  d.setActiveLayer("doors");
  d.drawLine(4 * MM, 1 * MM, 4.9 * MM, 1 * MM);
  d.drawArc(4 * MM, 1 * MM, 0.9 * MM, 0, 90);
  d.setActiveLayer("windows");
  d.drawPolyline(mm([[-0.05, 1], [0.05, 1], [0.05, 2], [-0.05, 2]]), true);
  d.setActiveLayer("names");
  d.drawText(1 * MM, 1.5 * MM, 200, 0, "Studio");
  d.drawText(5.5 * MM, 1.5 * MM, 200, 0, "Lobby");
  d.drawText(2 * MM, 4.5 * MM, 200, 0, "Booth");
  d.drawText(2 * MM, -1 * MM, 200, 0, "Store");
  d.setActiveLayer("furniture");
  d.drawCircle(2 * MM, 1.5 * MM, 0.4 * MM);
  d.drawLine(0.5 * MM, 0.5 * MM, 1.5 * MM, 0.5 * MM);
  // Typed out of the package declarations, but the writer has it.
  (d as unknown as { drawSpline(points: number[][], degree: number): void }).drawSpline([[0, 0], [1000, 500], [2000, 0], [3000, 200]], 3);
  d.setActiveLayer("dims");
  d.drawLine(0, -3 * MM, 4 * MM, -3 * MM);
  let text = d.toDxfString();
  // Splice the old-style POLYLINE and a door block placed turned by 90° in before the ENTITIES section ends.
  const at = text.indexOf("0\nENDSEC", text.indexOf("ENTITIES"));
  text = text.slice(0, at) + polylineGroups("walls", "A0", [[0, 0], [0, -2, 0.5], [4, -2], [4, 0]]) + groups(DOOR_INSERT) + text.slice(at);
  const blocks = text.indexOf("2\nBLOCKS\n") + "2\nBLOCKS\n".length;
  return text.slice(0, blocks) + groups(DOOR_BLOCK) + text.slice(blocks);
}

const groups = (g: Array<[number, string | number]>) => g.map(([c, v]) => `${c}\n${v}\n`).join("");

/** A 900 mm door symbol, hinge at the base point: leaf along +x and its quarter swing, on layer 0. */
const DOOR_BLOCK: Array<[number, string | number]> = [
  [0, "BLOCK"], [5, "B1"], [8, "0"], [2, "DOOR900"], [70, 0], [10, 0], [20, 0], [30, 0], [3, "DOOR900"],
  [0, "LINE"], [5, "B2"], [8, "0"], [10, 0], [20, 0], [30, 0], [11, 900], [21, 0], [31, 0],
  [0, "ARC"], [5, "B3"], [8, "0"], [10, 0], [20, 0], [30, 0], [40, 900], [50, 0], [51, 90],
  [0, "ENDBLK"], [5, "B4"], [8, "0"],
];
/** The door block on the studio–store wall: hinge at (1 m, 0), turned 90° so the leaf points into the studio. */
const DOOR_INSERT: Array<[number, string | number]> = [[0, "INSERT"], [5, "C1"], [8, "doors"], [2, "DOOR900"], [10, 1000], [20, 0], [30, 0], [41, 1], [42, 1], [50, 90]];

const roles: DxfImportOptions = {
  levelId: "level-0",
  layerRoles: { walls: "walls", doors: "doors", windows: "windows", names: "underlay", furniture: "underlay", dims: "ignore" },
};

const byName = (rooms: Array<{ name: string; outline: Array<{ x: number; y: number }> }>, name: string) => rooms.find((r) => r.name === name)!;

// dxf-writer numbers handles across drawings, so each test reads the same text.
const FLAT = flatDxf();

describe("DXF import", () => {
  const result = importDxf(FLAT, roles);
  if (!result.ok) throw new Error(result.problem.message);
  const { imported } = result;

  it("reads millimetres from $INSUNITS and finds the four rooms by their names", () => {
    expect(imported.report.units).toMatchObject({ status: "header", code: 4, metresPerUnit: 0.001 });
    expect(imported.rooms.map((r) => r.name).sort()).toEqual(["Booth", "Lobby", "Store", "Studio"]);
    expect(imported.report.converted.roomNames).toBe(4);
  });

  it("gives each room its area, arcs and bulges flattened within the chord tolerance", () => {
    const tol = imported.report.chordToleranceM;
    // Inscribed chords lose at most sagitta × arc length of area.
    const cases: Array<[string, number, number]> = [
      ["Studio", 12, 0],
      ["Lobby", 9 + (Math.PI * 1.5 ** 2) / 2, Math.PI * 1.5],
      ["Booth", 8 + (Math.PI * 2 ** 2) / 2, Math.PI * 2],
      ["Store", 8 + bulgeSegmentAreaM2(4, 0.5), 4 * Math.atan(0.5) * (4 / (2 * Math.sin(2 * Math.atan(0.5))))],
    ];
    for (const [name, exact, arcM] of cases) {
      const area = polygonAreaM2(byName(imported.rooms, name).outline);
      expect(area, name).toBeLessThanOrEqual(exact + 1e-9);
      expect(exact - area, name).toBeLessThanOrEqual(tol * arcM + 1e-9);
    }
    expect(exact12(polygonAreaM2(byName(imported.rooms, "Studio").outline))).toBe(true);
  });

  it("a finer chord tolerance follows the arc more closely", () => {
    const fine = importDxf(flatDxf(), { ...roles, chordToleranceM: 0.0005 });
    if (!fine.ok) throw new Error(fine.problem.message);
    const exact = 8 + 2 * Math.PI;
    const coarseErr = exact - polygonAreaM2(byName(imported.rooms, "Booth").outline);
    const fineErr = exact - polygonAreaM2(byName(fine.imported.rooms, "Booth").outline);
    expect(fineErr).toBeLessThan(coarseErr / 5);
    expect(byName(fine.imported.rooms, "Booth").outline.length).toBeGreaterThan(byName(imported.rooms, "Booth").outline.length);
  });

  it("puts the rooms into a plan where they share the walls they were drawn against", () => {
    const merged = planWithDxfImport(emptyPlan({ id: "flat", name: "Invented flat" }), imported);
    if (!merged.ok) throw new Error(merged.problem.message);
    const plan = merged.plan;
    const idOf = (name: string) => imported.rooms.find((r) => r.name === name)!.id;
    const shared = sharedWalls(planWallPieces(plan)).map((w) => ({ rooms: [...w.roomIds].sort().join("+"), lengthM: Math.round(w.lengthM * 1000) / 1000 }));
    expect(shared.sort((a, b) => (a.rooms < b.rooms ? -1 : 1))).toEqual(
      [
        { rooms: [idOf("Studio"), idOf("Lobby")].sort().join("+"), lengthM: 3 },
        { rooms: [idOf("Studio"), idOf("Booth")].sort().join("+"), lengthM: 4 },
        { rooms: [idOf("Studio"), idOf("Store")].sort().join("+"), lengthM: 4 },
      ].sort((a, b) => (a.rooms < b.rooms ? -1 : 1)),
    );
    expect(validatePlan(plan, constructionCatalogue).filter((p) => p.severity === "error")).toEqual([]);
  });

  it("places the door on the studio–lobby wall and the window on the studio's west wall", () => {
    const merged = planWithDxfImport(emptyPlan({ id: "flat", name: "Invented flat" }), imported);
    if (!merged.ok) throw new Error(merged.problem.message);
    const plan = merged.plan;
    const pieces = planWallPieces(plan);
    const door = imported.openings.find((o) => o.type === "door" && !o.id.includes("."))!;
    const window = imported.openings.find((o) => o.type === "window")!;
    expect(door.widthM).toBeCloseTo(0.9, 6);
    expect(window.widthM).toBeCloseTo(1, 6);
    const dp = openingPlacement(plan, pieces, door, 0.05);
    const wp = openingPlacement(plan, pieces, window, 0.05);
    if (!dp.ok || !wp.ok) throw new Error("openings not placed");
    expect([dp.start, dp.end].map((p) => [p.x, Math.round(p.y * 1e6) / 1e6]).sort((a, b) => a[1]! - b[1]!)).toEqual([[4, 1], [4, 1.9]]);
    expect(pieces.find((p) => p.id === dp.hostId)!.kind).toBe("shared");
    expect(Math.min(wp.start.y, wp.end.y)).toBeCloseTo(1, 6);
    expect(wp.start.x).toBeCloseTo(0, 9);
  });

  it("expands a block reference: the turned door symbol becomes a door on the studio–store wall", () => {
    const merged = planWithDxfImport(emptyPlan({ id: "flat", name: "Invented flat" }), imported);
    if (!merged.ok) throw new Error(merged.problem.message);
    const door = imported.openings.find((o) => o.id === "dxf-door-C1.B2")!;
    expect(door).toBeDefined();
    expect(door.widthM).toBeCloseTo(0.9, 6);
    const pieces = planWallPieces(merged.plan);
    const place = openingPlacement(merged.plan, pieces, door, 0.05);
    if (!place.ok) throw new Error("block door not placed");
    expect([place.start.x, place.end.x].sort((a, b) => a - b).map((x) => Math.round(x * 1e6) / 1e6)).toEqual([0.1, 1]);
    expect(place.start.y).toBeCloseTo(0, 9);
    const piece = pieces.find((p) => p.id === place.hostId)!;
    expect(piece.sides.map((s) => merged.plan.elements[s.roomId]!).map((r) => (r as { name: string }).name).sort()).toEqual(["Store", "Studio"]);
    expect(imported.report.byType.INSERT).toEqual({ read: 1, used: 1, skipped: 0 });
  });

  it("keeps furniture as underlay, leaves out the ignored layer and the spline, and says why", () => {
    expect(imported.report.converted.underlayPaths).toBe(2);
    expect(imported.underlay.paths.map((p) => p.layer).sort()).toEqual(["furniture", "furniture"]);
    const reasons = imported.report.skipped.map((s) => s.reason);
    expect(reasons).toContain('on layer "dims", set to ignore');
    expect(reasons.some((r) => r.startsWith("splines are not converted"))).toBe(true);
    expect(imported.report.byType.SPLINE).toEqual({ read: 1, used: 0, skipped: 1 });
    expect(imported.report.byType.ARC!.used).toBe(2);
  });

  it("gives the same result whatever the chunk size, and reports progress up to the total", () => {
    const seen: Array<[number, number]> = [];
    const chunked = importDxf(FLAT, roles, (done, total) => seen.push([done, total]), 3);
    if (!chunked.ok) throw new Error(chunked.problem.message);
    expect(chunked.imported).toEqual(imported);
    expect(seen.length).toBeGreaterThan(3);
    expect(seen.every(([d], i) => i === 0 || d > seen[i - 1]![0])).toBe(true);
    expect(seen[seen.length - 1]![0]).toBe(seen[0]![1]);
  });

  it("gives every room a stable id from its entity handles", () => {
    const again = importDxf(FLAT, roles);
    if (!again.ok) throw new Error(again.problem.message);
    expect(again.imported.rooms.map((r) => r.id)).toEqual(imported.rooms.map((r) => r.id));
    expect(imported.rooms.every((r) => /^dxf-room-[0-9A-F]+$/.test(r.id))).toBe(true);
  });
});

function exact12(a: number): boolean {
  return Math.abs(a - 12) < 1e-9;
}

describe("DXF import: units and damaged files", () => {
  it("asks for units when the header has none, and converts once they are chosen", () => {
    const text = flatDxf({ units: false });
    const survey = dxfSurvey(text);
    expect(survey.ok && survey.units.status).toBe("missing");
    const r = importDxf(text, roles);
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.problem.code).toBe("dxf-units-missing");
    expect(r.problem.message).toMatch(/unitless/);
    const chosen = importDxf(text, { ...roles, units: "millimetres" });
    expect(chosen.ok && chosen.imported.rooms.length).toBe(4);
  });

  it("reads a file saved with a byte-order mark and Windows line ends", () => {
    const r = importDxf(`\uFEFF${FLAT.replace(/\n/g, "\r\n")}`, roles);
    expect(r.ok && r.imported.rooms.map((room) => room.name).sort()).toEqual(["Booth", "Lobby", "Store", "Studio"]);
  });

  it("moves a drawing in site coordinates to the plan origin when asked, and says by how much", () => {
    const far = importDxf(FLAT, { ...roles, units: "metres", moveToOrigin: true });
    if (!far.ok) throw new Error(far.problem.message);
    // Read as metres the drawing spans thousands of metres; its lower-left corner lands at the origin.
    expect(far.imported.report.shiftM).toEqual({ x: -50, y: -3000 });
    const xs = far.imported.rooms.flatMap((r) => r.outline.map((v) => v.x));
    expect(Math.min(...xs)).toBeGreaterThanOrEqual(0);
    const plain = importDxf(FLAT, roles);
    expect(plain.ok && plain.imported.report.shiftM).toEqual({ x: 0, y: 0 });
  });

  it("lists the layers with their entity counts for the mapping dialog", () => {
    const survey = dxfSurvey(flatDxf());
    if (!survey.ok) throw new Error(survey.problem.message);
    const walls = survey.layers.find((l) => l.name === "walls");
    expect(walls?.entities).toBe(7);
    expect(survey.layers.find((l) => l.name === "dims")?.entities).toBe(1);
  });

  const broken: Array<[string, string, string, RegExp]> = [
    ["an empty file", "", "dxf-empty", /empty/],
    ["a bad coordinate", flatDxf().replace(/\n10\n4000\n/, "\n10\nfour\n"), "dxf-malformed", /Line \d+: group 10 must hold a number/],
    ["a cut-off file", flatDxf().slice(0, flatDxf().indexOf("ENTITIES") + 200), "dxf-malformed", /cut off/],
    ["a text file that is not a DXF", "Kitchen 3.2 x 4.1\nHall 2 x 5\n", "dxf-malformed", /expected a group code/],
    ["a binary DXF", "AutoCAD Binary DXF\r\n\u001a\u0000", "dxf-binary", /binary/],
    ["a DXF without entities", "0\nSECTION\n2\nHEADER\n0\nENDSEC\n0\nEOF\n", "dxf-no-entities", /no ENTITIES/],
  ];
  for (const [what, text, code, message] of broken) {
    it(`answers ${what} with a clear message and leaves the plan unchanged`, () => {
      const plan = emptyPlan({ id: "flat", name: "Invented flat" });
      const before = serializePlan(plan);
      const r = planFromDxfText(plan, text, roles);
      expect(r.ok).toBe(false);
      if (r.ok) return;
      expect(r.problem.code).toBe(code);
      expect(r.problem.message).toMatch(message);
      expect(r.plan).toBe(plan);
      expect(serializePlan(plan)).toBe(before);
    });
  }

  it("refuses a level that is not in the plan without changing it", () => {
    const plan = emptyPlan({ id: "flat", name: "Invented flat" });
    const r = planFromDxfText(plan, flatDxf(), { ...roles, levelId: "level-9" });
    expect(r.ok === false && r.problem.code).toBe("dxf-level-unknown");
    expect(r.plan).toBe(plan);
  });
});
