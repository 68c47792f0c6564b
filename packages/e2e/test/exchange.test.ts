import type { Browser } from "playwright-core";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { launchBrowser, newPage } from "../src/browser.js";
import { createProject, getPlan, signIn, waitSaved } from "../src/editor-page.js";

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
});
