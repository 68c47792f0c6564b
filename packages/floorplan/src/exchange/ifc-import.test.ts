import type { IfcAPI } from "web-ifc";
import { beforeAll, describe, expect, it } from "vitest";
import { constructionCatalogue } from "../catalogue/catalogue.js";
import { emptyPlan } from "../document/empty-plan.js";
import { openingPlacement } from "../geometry/openings.js";
import { polygonAreaM2 } from "../geometry/polygon.js";
import { planWallPieces, sharedWalls } from "../geometry/walls.js";
import { validatePlan } from "../validation/validate.js";
import { convertIfc, ifcSurvey } from "./ifc-convert.js";
import { ifcReader, importIfc, planFromIfcBytes } from "./ifc-import.js";
import { readIfc } from "./ifc-read.js";

/**
 * A small invented building written as IFC4 STEP text, in millimetres. Ground storey: walls on
 * centrelines round 0..8000 × 0..5000 (200 mm, a brick-and-wool layer set on each wall), a
 * 100 mm stud partition at x = 3000 (its layers on its wall type), a "Studio" and an "Office"
 * whose spaces stop at the wall faces, a 900 × 2100 door filling an opening in the partition
 * from y = 1000, and a window drawn as a 1200 × 1200 box in the south wall from x = 5000 at
 * 900 mm sill with no size attributes and no fills relation. First storey at 3000: one L-shaped
 * space, no walls.
 */
function buildingIfc(opts: { schema?: "IFC4" | "IFC2X3"; storeys?: boolean } = {}): string {
  // IFC2X3 entities have fewer attributes (no predefined types, a material is only its name).
  const x3 = opts.schema === "IFC2X3";
  const lines: string[] = [];
  let n = 100;
  const add = (s: string): string => {
    lines.push(`#${++n}=${s};`);
    return `#${n}`;
  };
  const gid = (k: string) => `'${k.padEnd(22, "x")}'`;
  const pt = (x: number, y: number, z?: number) => add(`IFCCARTESIANPOINT((${x.toFixed(1)},${y.toFixed(1)}${z === undefined ? "" : `,${z.toFixed(1)}`}))`);
  const dir = (x: number, y: number, z: number) => add(`IFCDIRECTION((${x.toFixed(1)},${y.toFixed(1)},${z.toFixed(1)}))`);
  const zUp = dir(0, 0, 1);
  const origin = add(`IFCAXIS2PLACEMENT3D(${pt(0, 0, 0)},$,$)`);
  const ctx = add(`IFCGEOMETRICREPRESENTATIONCONTEXT($,'Model',3,1.E-05,${origin},$)`);
  const units = add(`IFCUNITASSIGNMENT((${add("IFCSIUNIT(*,.LENGTHUNIT.,.MILLI.,.METRE.)")}))`);
  const project = add(`IFCPROJECT(${gid("project")},$,'Invented block',$,$,$,$,(${ctx}),${units})`);
  const place = (rel: string | null, x: number, y: number, z: number, xDir?: [number, number]) =>
    add(`IFCLOCALPLACEMENT(${rel ?? "$"},${add(`IFCAXIS2PLACEMENT3D(${pt(x, y, z)},${xDir ? `${zUp},${dir(xDir[0], xDir[1], 0)}` : "$,$"})`)})`);
  const body = (solid: string) => add(`IFCPRODUCTDEFINITIONSHAPE($,$,(${add(`IFCSHAPEREPRESENTATION(${ctx},'Body','SweptSolid',(${solid}))`)}))`);
  const box = (cx: number, cy: number, dx: number, dy: number, h: number) =>
    body(add(`IFCEXTRUDEDAREASOLID(${add(`IFCRECTANGLEPROFILEDEF(.AREA.,$,${add(`IFCAXIS2PLACEMENT2D(${pt(cx, cy)},$)`)},${dx.toFixed(1)},${dy.toFixed(1)})`)},${origin},${zUp},${h.toFixed(1)})`));
  const prism = (pts: Array<[number, number]>, h: number) => {
    const ps = pts.map(([x, y]) => pt(x, y));
    return body(add(`IFCEXTRUDEDAREASOLID(${add(`IFCARBITRARYCLOSEDPROFILEDEF(.AREA.,$,${add(`IFCPOLYLINE((${[...ps, ps[0]].join(",")}))`)})`)},${origin},${zUp},${h.toFixed(1)})`));
  };

  const site = add(`IFCSITE(${gid("site")},$,'Site',$,$,${place(null, 0, 0, 0)},$,$,.ELEMENT.,$,$,$,$,$)`);
  const sitePlace = `#${n - 0}`;
  const building = add(`IFCBUILDING(${gid("building")},$,'Block',$,$,${place(null, 0, 0, 0)},$,$,.ELEMENT.,$,$,$)`);
  const groundPlace = place(null, 0, 0, 0);
  const ground = add(`IFCBUILDINGSTOREY(${gid("ground")},$,'Ground floor',$,$,${groundPlace},$,$,.ELEMENT.,0.)`);
  const firstPlace = place(null, 0, 0, 3000);
  const first = add(`IFCBUILDINGSTOREY(${gid("first")},$,'First floor',$,$,${firstPlace},$,$,.ELEMENT.,3000.)`);
  void sitePlace;
  add(`IFCRELAGGREGATES(${gid("agg1")},$,$,$,${project},(${site}))`);
  add(`IFCRELAGGREGATES(${gid("agg2")},$,$,$,${site},(${building}))`);
  if (opts.storeys !== false) add(`IFCRELAGGREGATES(${gid("agg3")},$,$,$,${building},(${ground},${first}))`);

  const material = (name: string) => add(x3 ? `IFCMATERIAL('${name}')` : `IFCMATERIAL('${name}',$,$)`);
  const brick = material("Brick"), wool = material("Mineral wool"), gypsum = material("Gypsum board");
  const layer = (m: string, t: number) => add(`IFCMATERIALLAYER(${m},${t.toFixed(1)},$${x3 ? "" : ",$,$,$,$"})`);
  const outerSet = add(`IFCMATERIALLAYERSET((${layer(brick, 100)},${layer(wool, 50)},${layer(gypsum, 50)}),'Brick and wool 200'${x3 ? "" : ",$"})`);
  const studSet = add(`IFCMATERIALLAYERSET((${layer(gypsum, 12.5)},${layer(wool, 75)},${layer(gypsum, 12.5)}),'Stud partition 100'${x3 ? "" : ",$"})`);

  // A wall from (x0, y0) along a unit direction, centred on its axis (placement x along the wall).
  const wall = (key: string, x0: number, y0: number, ux: number, uy: number, len: number, t: number) => {
    const pl = place(groundPlace, x0, y0, 0, [ux, uy]);
    return { id: add(`${x3 ? "IFCWALLSTANDARDCASE" : "IFCWALL"}(${gid(key)},$,'${key}',$,$,${pl},${box(len / 2, 0, len, t, 2700)},$${x3 ? "" : ",.STANDARD."})`), placement: pl };
  };
  const south = wall("south", 0, 0, 1, 0, 8000, 200);
  const east = wall("east", 8000, 0, 0, 1, 5000, 200);
  const north = wall("north", 8000, 5000, -1, 0, 8000, 200);
  const west = wall("west", 0, 5000, 0, -1, 5000, 200);
  const partition = wall("partition", 3000, 100, 0, 1, 4800, 100);
  add(`IFCRELASSOCIATESMATERIAL(${gid("mat-outer")},$,$,$,(${[south, east, north, west].map((w) => w.id).join(",")}),${add(`IFCMATERIALLAYERSETUSAGE(${outerSet},.AXIS2.,.POSITIVE.,-100.${x3 ? "" : ",$"})`)})`);
  const studType = add(`IFCWALLTYPE(${gid("stud-type")},$,'Stud partition',$,$,$,$,$,$,.PARTITIONING.)`);
  add(`IFCRELDEFINESBYTYPE(${gid("type-rel")},$,$,$,(${partition.id}),${studType})`);
  add(`IFCRELASSOCIATESMATERIAL(${gid("mat-stud")},$,$,$,(${studType}),${studSet})`);

  const studio = add(`IFCSPACE(${gid("studio")},$,'G01',$,$,${place(groundPlace, 0, 0, 0)},${prism([[100, 100], [2950, 100], [2950, 4900], [100, 4900]], 2700)},'Studio',.ELEMENT.,.INTERNAL.,$)`);
  const office = add(`IFCSPACE(${gid("office")},$,'G02',$,$,${place(groundPlace, 3050, 100, 0)},${prism([[0, 0], [4850, 0], [4850, 4800], [0, 4800]], 2700)},'Office',.ELEMENT.,.INTERNAL.,$)`);
  const landing = add(`IFCSPACE(${gid("landing")},$,'F01',$,$,${place(firstPlace, 0, 0, 0)},${prism([[100, 100], [7900, 100], [7900, 2000], [4000, 2000], [4000, 4900], [100, 4900]], 2500)},$,.ELEMENT.,.INTERNAL.,$)`);
  add(`IFCRELAGGREGATES(${gid("agg4")},$,$,$,${ground},(${studio},${office}))`);
  add(`IFCRELAGGREGATES(${gid("agg5")},$,$,$,${first},(${landing}))`);

  const openingPlace = place(partition.placement, 900, 0, 0);
  const hole = add(`IFCOPENINGELEMENT(${gid("hole")},$,'Hole',$,$,${openingPlace},${box(450, 0, 900, 300, 2100)},$${x3 ? "" : ",.OPENING."})`);
  add(`IFCRELVOIDSELEMENT(${gid("voids")},$,$,$,${partition.id},${hole})`);
  const door = add(`IFCDOOR(${gid("door")},$,'D01',$,$,${place(openingPlace, 0, 0, 0)},$,$,2100.,900.${x3 ? "" : ",.DOOR.,.SINGLE_SWING_LEFT.,$"})`);
  add(`IFCRELFILLSELEMENT(${gid("fills")},$,$,$,${hole},${door})`);
  const windowEl = add(`IFCWINDOW(${gid("window")},$,'W01',$,$,${place(groundPlace, 5000, 0, 900)},${box(600, 0, 1200, 200, 1200)},$,$,$${x3 ? "" : ",.WINDOW.,.SINGLE_PANEL.,$"})`);
  add(`IFCRELCONTAINEDINSPATIALSTRUCTURE(${gid("contains")},$,$,$,(${[south, east, north, west, partition].map((w) => w.id).join(",")},${door},${windowEl}),${ground})`);

  return [
    "ISO-10303-21;", "HEADER;", "FILE_DESCRIPTION(('ViewDefinition [DesignTransferView]'),'2;1');",
    "FILE_NAME('block.ifc','2026-01-01T00:00:00',(''),(''),'','','');", `FILE_SCHEMA(('${x3 ? "IFC2X3" : "IFC4"}'));`, "ENDSEC;",
    "DATA;", ...lines, "ENDSEC;", "END-ISO-10303-21;", "",
  ].join("\n");
}

const bytes = (s: string) => new TextEncoder().encode(s);
const gidOf = (k: string) => k.padEnd(22, "x");
let api: IfcAPI;

beforeAll(async () => {
  api = await ifcReader();
});

describe("readIfc and convertIfc", () => {
  it("reads storeys with their elevations and heights, in metres from a millimetre file", () => {
    const read = readIfc(api, bytes(buildingIfc()));
    expect(read.ok).toBe(true);
    if (!read.ok) return;
    expect(read.model.lengthUnit.metres).toBeCloseTo(0.001, 12);
    expect(read.model.storeys.map((s) => [s.name, s.elevationM, s.heightM, s.heightFrom])).toEqual([
      ["Ground floor", 0, 2.7, "spaces"],
      ["First floor", 3, 2.5, "spaces"],
    ]);
  });

  it("takes each space's floor outline and moves edges along wall faces onto the wall centrelines", () => {
    const read = readIfc(api, bytes(buildingIfc()));
    if (!read.ok) throw new Error(read.problem.message);
    const imported = convertIfc(read.model);
    const byName = Object.fromEntries(imported.report.rooms.map((r) => [r.name, r]));
    // Hand-worked: studio 2.85 × 4.8 m at the faces, 3 × 5 m at the centrelines; office 4.85 × 4.8 and 5 × 5.
    expect(byName.Studio!.ifcAreaM2).toBeCloseTo(13.68, 6);
    expect(byName.Studio!.planAreaM2).toBeCloseTo(15, 6);
    expect(byName.Office!.ifcAreaM2).toBeCloseTo(23.28, 6);
    expect(byName.Office!.planAreaM2).toBeCloseTo(25, 6);
    // No walls upstairs: the L-shaped landing keeps its footprint, 7.8 × 1.9 + 3.9 × 2.9 m².
    expect(byName.F01!.planAreaM2).toBeCloseTo(26.13, 6);
    expect(byName.F01!.edgesMoved).toBe(0);
    const landing = imported.rooms.find((r) => r.name === "F01")!;
    expect(landing.outline).toHaveLength(6);
    expect(landing.levelId).toBe(`ifc-level-${gidOf("first")}`);

    const asDrawn = convertIfc(read.model, { roomOutlines: "as-drawn" });
    expect(polygonAreaM2(asDrawn.rooms.find((r) => r.name === "Studio")!.outline)).toBeCloseTo(13.68, 6);
  });

  it("reads walls as centrelines with thickness and height, and their material layers by occurrence or by type", () => {
    const read = readIfc(api, bytes(buildingIfc()));
    if (!read.ok) throw new Error(read.problem.message);
    const part = read.model.walls.find((w) => w.name === "partition")!;
    expect(part.thicknessM).toBeCloseTo(0.1, 6);
    expect(part.heightM).toBeCloseTo(2.7, 6);
    expect(part.start.x).toBeCloseTo(3, 6);
    expect(part.start.y).toBeCloseTo(0.1, 6);
    expect(part.end.y).toBeCloseTo(4.9, 6);
    expect(part.layerSet?.name).toBe("Stud partition 100");
    expect(part.layerSet?.layers.map((l) => [l.material, Math.round(l.thicknessM * 10000) / 10])).toEqual([["Gypsum board", 12.5], ["Mineral wool", 75], ["Gypsum board", 12.5]]);
    const survey = ifcSurvey(read.model);
    expect(survey.layerSets.map((s) => [s.name, s.walls, Math.round(s.totalThicknessM * 1000)])).toEqual([["Brick and wool 200", 4, 200], ["Stud partition 100", 1, 100]]);
    expect(survey.storeys.map((s) => [s.spaces, s.walls, s.doors, s.windows])).toEqual([[2, 5, 1, 1], [1, 0, 0, 0]]);
  });

  it("maps layer sets to catalogue constructions and reports each wall's layers", () => {
    const read = readIfc(api, bytes(buildingIfc()));
    if (!read.ok) throw new Error(read.problem.message);
    const stud = ifcSurvey(read.model).layerSets.find((s) => s.name === "Stud partition 100")!;
    const imported = convertIfc(read.model, { constructionFor: { [stud.key]: "stud-wood-1x1-gypsum" }, wallConstructionId: "masonry-brick-100" });
    const line = imported.report.wallLayers.find((w) => w.name === "partition")!;
    expect(line.constructionId).toBe("stud-wood-1x1-gypsum");
    expect(line.layers.map((l) => l.material)).toEqual(["Gypsum board", "Mineral wool", "Gypsum board"]);
    expect(imported.walls.find((w) => w.id === line.wallId)!.constructionId).toBe("stud-wood-1x1-gypsum");
    expect(imported.report.wallLayers.filter((w) => w.constructionId === "masonry-brick-100")).toHaveLength(4);
  });

  it("places the door through its opening relation and the window by position, with their sizes", () => {
    const read = readIfc(api, bytes(buildingIfc()));
    if (!read.ok) throw new Error(read.problem.message);
    const imported = convertIfc(read.model);
    const door = imported.openings.find((o) => o.type === "door")!;
    const win = imported.openings.find((o) => o.type === "window")!;
    expect(door.wallRef).toBe(`ifc-wall-${gidOf("partition")}`);
    expect(door.widthM).toBeCloseTo(0.9, 6);
    expect(door.heightM).toBeCloseTo(2.1, 6);
    expect(door.offsetM).toBeCloseTo(0.9, 6); // y = 1.0 on a wall starting at y = 0.1
    expect(win.wallRef).toBe(`ifc-wall-${gidOf("south")}`);
    expect(win.widthM).toBeCloseTo(1.2, 6);
    expect(win.heightM).toBeCloseTo(1.2, 6);
    expect(win.type === "window" && win.sillM).toBeCloseTo(0.9, 6);
    expect(win.offsetM).toBeCloseTo(5, 6);
    expect(imported.report.converted).toEqual({ levels: 2, rooms: 3, walls: 5, doors: 1, windows: 1, roomNames: 3 });
  });

  it("gives a plan that validates, whose rooms share the partition, with the door on it", () => {
    const plan = emptyPlan({ id: "p", name: "P" });
    const step = planFromIfcBytes(api, plan, bytes(buildingIfc()));
    if (!step.ok) throw new Error(step.problem.message);
    expect(plan.elements).not.toHaveProperty(`ifc-wall-${gidOf("partition")}`);
    const errors = validatePlan(step.plan, constructionCatalogue).filter((p) => p.severity === "error");
    expect(errors).toEqual([]);
    const shared = sharedWalls(planWallPieces(step.plan));
    const studio = `ifc-room-${gidOf("studio")}`, office = `ifc-room-${gidOf("office")}`;
    const between = shared.find((w) => [...w.roomIds].sort().join() === [office, studio].sort().join());
    expect(between?.lengthM).toBeCloseTo(5, 6);
    const door = Object.values(step.plan.elements).find((e) => e.type === "door")!;
    const place = door.type === "door" ? openingPlacement(step.plan, planWallPieces(step.plan), door, step.plan.defaults.wallToleranceM) : null;
    expect(place?.ok && place.start.y).toBeCloseTo(1.0, 6);
  });

  it("reads the same building written as IFC2X3 (standard-case walls, shorter entities) to the same result", () => {
    const four = readIfc(api, bytes(buildingIfc()));
    const old = readIfc(api, bytes(buildingIfc({ schema: "IFC2X3" })));
    if (!four.ok || !old.ok) throw new Error("a file did not read");
    expect(old.model.schema).toBe("IFC2X3");
    expect(old.model.byType.IfcWallStandardCase).toEqual({ read: 5, used: 5, skipped: 0 });
    const a = convertIfc(four.model), b = convertIfc(old.model);
    expect(b.report.converted).toEqual(a.report.converted);
    expect(b.report.rooms.map((r) => [r.name, r.planAreaM2.toFixed(6)])).toEqual(a.report.rooms.map((r) => [r.name, r.planAreaM2.toFixed(6)]));
    expect(b.openings.map((o) => [o.type, o.widthM.toFixed(6), o.heightM.toFixed(6), o.offsetM.toFixed(6)])).toEqual(a.openings.map((o) => [o.type, o.widthM.toFixed(6), o.heightM.toFixed(6), o.offsetM.toFixed(6)]));
    expect(b.report.wallLayers.map((w) => w.layers.map((l) => l.material).join("/"))).toEqual(a.report.wallLayers.map((w) => w.layers.map((l) => l.material).join("/")));
  });

  it("leaves out storeys not chosen and puts a storey onto an existing level", () => {
    const read = readIfc(api, bytes(buildingIfc()));
    if (!read.ok) throw new Error(read.problem.message);
    const imported = convertIfc(read.model, { storeys: [gidOf("ground")], ontoLevels: { [gidOf("ground")]: "level-0" } });
    expect(imported.levels).toEqual([]);
    expect(imported.rooms.map((r) => r.levelId)).toEqual(["level-0", "level-0"]);
    expect(imported.report.skipped.find((l) => l.reason === "on a storey left out")?.count).toBe(1);
    expect(imported.report.byType.IfcSpace).toEqual({ read: 3, used: 2, skipped: 1 });
  });

  it("adds a suffix when the same file is imported twice, with references following", () => {
    const plan = emptyPlan({ id: "p", name: "P" });
    const once = planFromIfcBytes(api, plan, bytes(buildingIfc()));
    if (!once.ok) throw new Error(once.problem.message);
    const twice = planFromIfcBytes(api, once.plan, bytes(buildingIfc()));
    if (!twice.ok) throw new Error(twice.problem.message);
    const doors = Object.values(twice.plan.elements).filter((e) => e.type === "door");
    expect(doors.map((d) => d.type === "door" && d.wallRef).sort()).toEqual([`ifc-wall-${gidOf("partition")}`, `ifc-wall-${gidOf("partition")}-2`]);
    const room2 = twice.plan.elements[`ifc-room-${gidOf("studio")}-2`];
    expect(room2?.type === "room" && room2.levelId).toBe(`ifc-level-${gidOf("ground")}-2`);
  });
});

describe("damaged and unusable IFC files", () => {
  const plan = emptyPlan({ id: "p", name: "P" });
  const cases: Array<[string, Uint8Array, string, RegExp]> = [
    ["empty", new Uint8Array(), "ifc-empty", /empty/],
    ["not STEP", bytes("this is a floor plan, honest"), "ifc-not-step", /ISO-10303-21/],
    ["zipped", bytes("PK\u0003\u0004rest"), "ifc-not-step", /ifczip|Unzip/],
    ["XML", bytes("<?xml version='1.0'?><ifcXML/>"), "ifc-not-step", /XML/],
    ["no storeys", bytes(buildingIfc().replace(/#\d+=IFCBUILDINGSTOREY\([^;]*;\n/g, "")), "ifc-no-storeys", /storeys/],
  ];
  for (const [name, data, code, message] of cases) {
    it(`refuses a file that is ${name}, with a message, and leaves the plan as it was`, () => {
      const step = planFromIfcBytes(api, plan, data);
      expect(step.ok).toBe(false);
      if (step.ok) return;
      expect(step.plan).toBe(plan);
      expect(step.problem.code).toBe(code);
      expect(step.problem.message).toMatch(message);
    });
  }

  it("refuses a file cut off part way, which the reader itself would take without a word", () => {
    const text = buildingIfc();
    for (const f of [0.4, 0.8, 0.99]) {
      const step = planFromIfcBytes(api, plan, bytes(text.slice(0, Math.floor(text.length * f))));
      expect(step.ok).toBe(false);
      if (step.ok) continue;
      expect(step.plan).toBe(plan);
      expect(step.problem.code).toBe("ifc-malformed");
      expect(step.problem.message).toMatch(/cut off/);
    }
  });

  it("refuses a file with a broken entity line (a string left open)", () => {
    const result = importIfc(api, bytes(buildingIfc().replace("'Stud partition 100',$)", "'Stud partition 100,$)")));
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.problem.code).toBe("ifc-malformed");
  });

  it("skips a window whose wall is missing, saying why", () => {
    const text = buildingIfc().replace(/(#\d+)=IFCWALL\('southx+'[^;]*;\n/, "");
    const result = importIfc(api, bytes(text));
    if (!result.ok) throw new Error(result.problem.message);
    expect(result.imported.openings.filter((o) => o.type === "window")).toHaveLength(0);
    expect(result.imported.report.skipped.map((l) => l.reason)).toContain("a window is in no wall that was read");
  });
});
