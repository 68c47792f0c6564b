import type { Browser } from "playwright-core";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { launchBrowser, newPage } from "../src/browser.js";
import { createProject, dragPlan, getPlan, signIn, waitSaved } from "../src/editor-page.js";

const SURVEYOR = "surveyor@larkspur.example";
const SHOTS = process.env.HUSHMARK_E2E_SHOTS; // a folder: screenshots of each step, for looking at

/** An ASCII DXF in metres written group by group: two rooms sharing a wall, their names, and a table drawn as a circle. */
function twoRoomDxf(): string {
  const g = (pairs: Array<[number, string | number]>) => pairs.map(([c, v]) => `${c}\n${v}\n`).join("");
  const outline = (handle: string, layer: string, pts: Array<[number, number]>) =>
    g([[0, "LWPOLYLINE"], [5, handle], [8, layer], [90, pts.length], [70, 1], ...pts.flatMap(([x, y]) => [[10, x], [20, y]] as Array<[number, number]>)]);
  const label = (handle: string, x: number, y: number, text: string) => g([[0, "TEXT"], [5, handle], [8, "A-TEXT"], [10, x], [20, y], [30, 0], [40, 0.2], [1, text]]);
  return g([[0, "SECTION"], [2, "HEADER"], [9, "$INSUNITS"], [70, 6], [0, "ENDSEC"], [0, "SECTION"], [2, "ENTITIES"]])
    + outline("A1", "A-WALL", [[0, 0], [4, 0], [4, 3], [0, 3]])
    + outline("A2", "A-WALL", [[4, 0], [7, 0], [7, 3], [4, 3]])
    + label("B1", 1, 1.5, "Rehearsal room") + label("B2", 5, 1.5, "Amp store")
    + g([[0, "CIRCLE"], [5, "C1"], [8, "FURN"], [10, 2], [20, 1.5], [30, 0], [40, 0.4]])
    + g([[0, "ENDSEC"], [0, "EOF"]]);
}

/**
 * An invented model in IFC4 text, millimetres: one storey, a 4 × 3 m space at the inner faces of
 * four 200 mm walls (a block-and-plaster layer set) on centrelines round −100..4100 × −100..3100,
 * and a 900 × 2100 door in the south wall placed by position alone.
 */
function oneRoomIfc(): string {
  const l: string[] = [];
  let n = 10;
  const add = (s: string) => { l.push(`#${++n}=${s};`); return `#${n}`; };
  const pt = (...c: number[]) => add(`IFCCARTESIANPOINT((${c.map((v) => v.toFixed(1)).join(",")}))`);
  const z = add("IFCDIRECTION((0.,0.,1.))");
  const o = add(`IFCAXIS2PLACEMENT3D(${pt(0, 0, 0)},$,$)`);
  const ctx = add(`IFCGEOMETRICREPRESENTATIONCONTEXT($,'Model',3,1.E-05,${o},$)`);
  const units = add(`IFCUNITASSIGNMENT((${add("IFCSIUNIT(*,.LENGTHUNIT.,.MILLI.,.METRE.)")}))`);
  const project = add(`IFCPROJECT('project0000000000000000',$,'P',$,$,$,$,(${ctx}),${units})`);
  const place = (x: number, y: number, dx?: [number, number]) => add(`IFCLOCALPLACEMENT($,${add(`IFCAXIS2PLACEMENT3D(${pt(x, y, 0)},${dx ? `${z},${add(`IFCDIRECTION((${dx[0]}.,${dx[1]}.,0.))`)}` : "$,$"})`)})`);
  const shape = (profile: string, h: number) => add(`IFCPRODUCTDEFINITIONSHAPE($,$,(${add(`IFCSHAPEREPRESENTATION(${ctx},'Body','SweptSolid',(${add(`IFCEXTRUDEDAREASOLID(${profile},${o},${z},${h.toFixed(1)})`)}))`)}))`);
  const rect = (cx: number, cy: number, dx: number, dy: number) => add(`IFCRECTANGLEPROFILEDEF(.AREA.,$,${add(`IFCAXIS2PLACEMENT2D(${pt(cx, cy)},$)`)},${dx.toFixed(1)},${dy.toFixed(1)})`);
  const storey = add(`IFCBUILDINGSTOREY('storey00000000000000000',$,'Level 1',$,$,${place(0, 0)},$,$,.ELEMENT.,0.)`);
  add(`IFCRELAGGREGATES('agg0000000000000000000',$,$,$,${project},(${storey}))`);
  const space = add(`IFCSPACE('space00000000000000000',$,'R1',$,$,${place(0, 0)},${shape(rect(2000, 1500, 4000, 3000), 2600)},'Drum room',.ELEMENT.,.INTERNAL.,$)`);
  add(`IFCRELAGGREGATES('agg1000000000000000000',$,$,$,${storey},(${space}))`);
  const walls = ([[-100, -100, 1, 0, 4200], [4100, -100, 0, 1, 3200], [4100, 3100, -1, 0, 4200], [-100, 3100, 0, -1, 3200]] as const).map(([x, y, ux, uy, len], i) =>
    add(`IFCWALL('wall${i}000000000000000000',$,'W${i}',$,$,${place(x, y, [ux, uy])},${shape(rect(len / 2, 0, len, 200), 2600)},$,.STANDARD.)`));
  const set = add(`IFCMATERIALLAYERSET((${add(`IFCMATERIALLAYER(${add("IFCMATERIAL('Concrete block',$,$)")},190.,$,$,$,$,$)`)},${add(`IFCMATERIALLAYER(${add("IFCMATERIAL('Plaster',$,$)")},10.,$,$,$,$,$)`)}),'Block wall',$)`);
  add(`IFCRELASSOCIATESMATERIAL('mat0000000000000000000',$,$,$,(${walls.join(",")}),${set})`);
  const door = add(`IFCDOOR('door00000000000000000x',$,'D1',$,$,${place(1000, -100, [1, 0])},$,$,2100.,900.,.DOOR.,$,$)`);
  add(`IFCRELCONTAINEDINSPATIALSTRUCTURE('rel0000000000000000000',$,$,$,(${[...walls, door].join(",")}),${storey})`);
  return ["ISO-10303-21;", "HEADER;", "FILE_DESCRIPTION((''),'2;1');", "FILE_NAME('r.ifc','',(''),(''),'','','');", "FILE_SCHEMA(('IFC4'));", "ENDSEC;", "DATA;", ...l, "ENDSEC;", "END-ISO-10303-21;", ""].join("\n");
}

describe("bringing a CAD drawing into the Sketch", () => {
  let browser: Browser;
  const baseUrl = inject("baseUrl");

  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => browser?.close());

  it("imports a DXF from the Export menu with the layers chosen, shows the rooms in the element list, and one undo removes them", async () => {
    const { context, page, errors } = await newPage(browser);
    await signIn(page, baseUrl, SURVEYOR);
    const projectId = await createProject(page, baseUrl, "Exchange test — band rooms");
    await page.goto(`${baseUrl}/projects/${projectId}/sketch`);
    await page.getByTestId("plan-canvas").waitFor({ timeout: 20_000 });

    await page.getByRole("button", { name: "Export" }).click();
    await page.getByRole("button", { name: "Import DXF…" }).click();
    const dialog = page.getByRole("dialog", { name: "Bring in a CAD drawing" });
    // The menu steps aside for the dialog instead of staying open behind it.
    await dialog.waitFor();
    expect(await page.getByRole("button", { name: "Plan document (JSON)" }).isVisible()).toBe(false);
    await dialog.locator('input[type="file"]').setInputFiles({ name: "band-rooms.dxf", mimeType: "application/dxf", buffer: Buffer.from(twoRoomDxf(), "latin1") });
    // The worker read the layers; the names are guessed and the surveyor corrects them.
    await dialog.getByLabel("Layer A-WALL").waitFor({ timeout: 20_000 });
    await expect(dialog.getByLabel("Layer A-WALL").inputValue()).resolves.toBe("walls");
    await dialog.getByLabel("Layer A-TEXT").selectOption("underlay");
    await dialog.getByLabel("Layer FURN").selectOption("ignore");
    if (SHOTS) await page.screenshot({ path: `${SHOTS}/exchange-1-layers.png` });
    await dialog.getByRole("button", { name: "Convert" }).click();
    const report = dialog.getByLabel("Import report");
    await report.waitFor({ timeout: 20_000 });
    await expect(report.textContent()).resolves.toMatch(/2 rooms/);
    if (SHOTS) await page.screenshot({ path: `${SHOTS}/exchange-2-report.png` });
    await dialog.getByRole("button", { name: "Add to plan" }).click();
    await dialog.waitFor({ state: "hidden" });

    await page.getByRole("tab", { name: "Elements" }).click();
    const list = page.getByRole("table", { name: "Elements on this level" });
    await list.getByRole("button", { name: "Select Rehearsal room" }).waitFor();
    await list.getByRole("button", { name: "Select Amp store" }).waitFor();
    await waitSaved(page);
    const saved = (await getPlan(page, baseUrl, projectId)).document.elements as Record<string, { type: string; name?: string }>;
    expect(Object.values(saved).filter((e) => e.type === "room").map((e) => e.name).sort()).toEqual(["Amp store", "Rehearsal room"]);
    if (SHOTS) await page.screenshot({ path: `${SHOTS}/exchange-3-added.png` });

    // The whole import is one history entry.
    await expect(page.getByRole("button", { name: "Undo" }).getAttribute("title")).resolves.toBe("Undo import 2 rooms from DXF");
    await page.getByRole("button", { name: "Undo" }).click();
    await list.getByRole("button", { name: "Select Rehearsal room" }).waitFor({ state: "detached" });
    await expect(list.getByRole("button", { name: "Select Amp store" }).count()).resolves.toBe(0);
    for (let i = 0; i < 50; i++) {
      await waitSaved(page);
      const after = (await getPlan(page, baseUrl, projectId)).document.elements as Record<string, { type: string }>;
      if (!Object.values(after).some((e) => e.type === "room")) break;
      if (i === 49) throw new Error("the undo was not saved");
      await page.waitForTimeout(150);
    }
    expect(errors).toEqual([]);
    await context.close();
  });
  it("imports an IFC model in the page's worker: the bundled reader starts, the storey goes onto the plan's level, a wall type maps to a construction", async () => {
    const { context, page, errors } = await newPage(browser);
    await signIn(page, baseUrl, SURVEYOR);
    const projectId = await createProject(page, baseUrl, "Exchange test — drum room model");
    await page.goto(`${baseUrl}/projects/${projectId}/sketch`);
    await page.getByTestId("plan-canvas").waitFor({ timeout: 20_000 });
    const requests: string[] = [];
    page.on("request", (r) => requests.push(r.url()));
    const levels = Object.values((await getPlan(page, baseUrl, projectId)).document.elements as Record<string, { type: string; id: string; name: string }>).filter((e) => e.type === "level");
    expect(levels.map((l) => l.name)).toEqual(["Ground floor"]);

    await page.getByRole("button", { name: "Export" }).click();
    await page.getByRole("button", { name: "Import IFC…" }).click();
    const dialog = page.getByRole("dialog", { name: "Bring in a building model" });
    await dialog.locator('input[type="file"]').setInputFiles({ name: "drum-room.ifc", mimeType: "application/x-step", buffer: Buffer.from(oneRoomIfc(), "latin1") });
    await dialog.getByLabel("Level for Level 1").waitFor({ timeout: 30_000 });
    await expect(dialog.textContent()).resolves.toMatch(/1 space, 4 walls, 1 door, 0 windows/);
    await dialog.getByLabel("Level for Level 1").selectOption({ label: "onto Ground floor" });
    await dialog.getByLabel("Construction for Block wall").selectOption("masonry-brick-100");
    if (SHOTS) await page.screenshot({ path: `${SHOTS}/exchange-4-ifc-confirm.png` });
    await dialog.getByRole("button", { name: "Convert" }).click();
    const report = dialog.getByLabel("Import report");
    await report.waitFor({ timeout: 20_000 });
    await expect(report.textContent()).resolves.toMatch(/1 room, 4 walls, 1 door/);
    if (SHOTS) await page.screenshot({ path: `${SHOTS}/exchange-5-ifc-report.png` });
    await dialog.getByRole("button", { name: "Add to plan" }).click();
    await dialog.waitFor({ state: "hidden" });
    // The WebAssembly came from our own origin.
    expect(requests.filter((u) => u.endsWith(".wasm")).every((u) => u.startsWith(baseUrl))).toBe(true);
    expect(requests.some((u) => u.endsWith(".wasm"))).toBe(true);

    for (let i = 0; ; i++) {
      await waitSaved(page);
      const els = Object.values((await getPlan(page, baseUrl, projectId)).document.elements as Record<string, { type: string; name?: string; levelId?: string; constructionId?: string; widthM?: number }>);
      if (els.some((e) => e.type === "room")) {
        expect(els.filter((e) => e.type === "room").map((e) => [e.name, e.levelId])).toEqual([["Drum room", levels[0]!.id]]);
        expect(els.filter((e) => e.type === "wall").map((e) => e.constructionId)).toEqual(Array(4).fill("masonry-brick-100"));
        expect(els.find((e) => e.type === "door")?.widthM).toBeCloseTo(0.9, 6);
        break;
      }
      if (i === 50) throw new Error("the import was not saved");
      await page.waitForTimeout(150);
    }
    if (SHOTS) await page.screenshot({ path: `${SHOTS}/exchange-6-ifc-added.png` });
    expect(errors).toEqual([]);
    await context.close();
  });
  it("sets the site location in the project settings, and the Sketch's GeoJSON lands there", async () => {
    const { context, page, errors } = await newPage(browser);
    await signIn(page, baseUrl, SURVEYOR);
    const projectId = await createProject(page, baseUrl, "Exchange test — site");
    await page.goto(`${baseUrl}/projects/${projectId}/sketch`);
    await page.getByTestId("plan-canvas").waitFor({ timeout: 20_000 });
    await page.getByRole("button", { name: "Room", exact: true }).click();
    await dragPlan(page, [0, 0], [4, 3]);
    await waitSaved(page);

    await page.getByRole("button", { name: "Export" }).click();
    await expect(page.getByRole("button", { name: /^Site location…/ }).textContent()).resolves.toMatch(/not set/);
    await page.getByRole("button", { name: /^Site location…/ }).click();
    const dialog = page.getByRole("dialog", { name: "Project settings" });
    await dialog.getByLabel("Latitude, degrees north").fill("123");
    await dialog.getByRole("button", { name: "Save settings" }).click();
    await dialog.getByText("A latitude lies between −90° and 90°.").waitFor();
    await dialog.getByLabel("Latitude, degrees north").fill("47.3769");
    await dialog.getByLabel("Longitude, degrees east").fill("8.5417");
    await dialog.getByLabel(/Top of the Sketch faces/).fill("90");
    if (SHOTS) await page.screenshot({ path: `${SHOTS}/exchange-7-site.png` });
    await dialog.getByRole("button", { name: "Save settings" }).click();
    await dialog.waitFor({ state: "hidden" });
    const stored = await (await page.request.get(`${baseUrl}/api/v1/projects/${projectId}`)).json();
    expect(stored.site).toEqual({ latDeg: 47.3769, lonDeg: 8.5417, planNorthBearingDeg: 90 });

    await page.getByRole("button", { name: "Export" }).click();
    const [download] = await Promise.all([page.waitForEvent("download"), page.getByRole("button", { name: "Map data of this level (GeoJSON)" }).click()]);
    const fc = JSON.parse(await (await download.createReadStream()).toArray().then((b) => Buffer.concat(b).toString("utf8")));
    expect(fc.hushmark.frame).toBe("site");
    const ring = fc.features.find((f: { geometry: { type: string } }) => f.geometry.type === "Polygon").geometry.coordinates[0] as Array<[number, number]>;
    // Plan +y faces east: the room's 3 m side runs east and its 4 m side south of the site point.
    const [lon0, lat0] = ring.reduce(([a, b], [x, y]) => [Math.min(a, x), Math.max(b, y)], [Infinity, -Infinity]);
    expect(lon0).toBeCloseTo(8.5417, 4);
    expect(lat0).toBeCloseTo(47.3769, 4);
    const south = Math.min(...ring.map(([, y]) => y));
    expect((lat0 - south) * 111_200).toBeCloseTo(4, 0); // about 111.2 km per degree of latitude, from memory
    expect(errors).toEqual([]);
    await context.close();
  });
});
