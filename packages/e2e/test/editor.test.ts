import { readFile } from "node:fs/promises";
import type { Browser } from "playwright-core";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { launchBrowser, newPage } from "../src/browser.js";
import { clickPlan, createProject, drawTwoRooms, getPlan, ofType, openSketch, pickConstruction, planToPage, problemCount, selectInList, setField, signIn, waitSaved, type Doc } from "../src/editor-page.js";

const SURVEYOR = "surveyor@larkspur.example";

describe("the plan editor and the sound-path view", () => {
  let browser: Browser;
  const baseUrl = inject("baseUrl");

  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => browser?.close());

  it("draws two rooms by mouse with a door and a window, picks constructions, saves, and reloads unchanged", async () => {
    const { context, page, errors } = await newPage(browser);
    await signIn(page, baseUrl, SURVEYOR);
    const projectId = await createProject(page, baseUrl, "Editor test — two rooms");
    await openSketch(page, baseUrl, projectId);

    await drawTwoRooms(page);
    await page.getByRole("button", { name: "Door", exact: true }).click();
    await clickPlan(page, 4, 1.5);
    await setField(page, "Name", "Connecting door");
    await setField(page, "Undercut", "20");
    await pickConstruction(page, "solid core");
    await page.getByRole("button", { name: "Window", exact: true }).click();
    await clickPlan(page, 2, 0);
    await setField(page, "Name", "Street window");
    await pickConstruction(page, "laminated");
    await waitSaved(page);

    const saved = (await getPlan(page, baseUrl, projectId)).document as Doc;
    const rooms = ofType(saved, "room");
    expect(rooms).toHaveLength(2);
    expect(rooms.map((r) => r.outline?.map((p) => [p.x, p.y])).sort()).toEqual([
      [[0, 0], [4, 0], [4, 3], [0, 3]],
      [[4, 0], [8, 0], [8, 3], [4, 3]],
    ]);
    const door = ofType(saved, "door")[0]!;
    expect(door).toMatchObject({ name: "Connecting door", constructionId: "door-solid-core", leaks: { undercutMm: 20 } });
    expect(ofType(saved, "window")[0]).toMatchObject({ name: "Street window", constructionId: "glazing-laminated-12-7" });

    await page.reload();
    await page.getByTestId("plan-canvas").waitFor();
    await selectInList(page, /Select Connecting door/);
    await expect(page.getByLabel("Undercut").inputValue()).resolves.toBe("20");
    const again = (await getPlan(page, baseUrl, projectId)).document;
    expect(again).toEqual(saved);
    expect(errors).toEqual([]);
    await context.close();
  });

  it("undoes and redoes by keyboard, and takes typed exact lengths while drawing", async () => {
    const { context, page, errors } = await newPage(browser);
    await signIn(page, baseUrl, SURVEYOR);
    const projectId = await createProject(page, baseUrl, "Editor test — typing");
    await openSketch(page, baseUrl, projectId);

    await page.getByRole("button", { name: "Room", exact: true }).click();
    const canvas = page.getByTestId("plan-canvas");
    const a = await planToPage(page, 1, 1);
    await page.mouse.move(a.x, a.y);
    await page.mouse.down();
    await page.mouse.move(a.x + 60, a.y - 40, { steps: 5 });
    await page.keyboard.type("3.65 x 2.4");
    await page.keyboard.press("Enter");
    await page.mouse.up();
    await waitSaved(page);
    let doc = (await getPlan(page, baseUrl, projectId)).document as Doc;
    expect(ofType(doc, "room")[0]!.outline!.map((p) => [p.x, p.y])).toEqual([[1, 1], [4.65, 1], [4.65, 3.4], [1, 3.4]]);

    await page.getByRole("button", { name: "Wall", exact: true }).click();
    await clickPlan(page, 1, 5);
    const towards = await planToPage(page, 3, 5);
    await page.mouse.move(towards.x, towards.y);
    await page.keyboard.type("10'6\"");
    await page.keyboard.press("Enter");
    await page.keyboard.press("Escape");
    await waitSaved(page);
    doc = (await getPlan(page, baseUrl, projectId)).document as Doc;
    const wall = ofType(doc, "wall")[0] as unknown as { start: { x: number }; end: { x: number; y: number } };
    expect(wall.end.x - wall.start.x).toBeCloseTo(3.2, 2);

    await canvas.focus();
    await page.keyboard.press("Control+z");
    await waitSaved(page);
    doc = (await getPlan(page, baseUrl, projectId)).document as Doc;
    expect(ofType(doc, "wall")).toHaveLength(0);
    await page.keyboard.press("Control+Shift+z");
    await waitSaved(page);
    doc = (await getPlan(page, baseUrl, projectId)).document as Doc;
    expect(ofType(doc, "wall")).toHaveLength(1);
    await page.getByRole("button", { name: "Undo" }).click();
    await page.getByRole("button", { name: "Undo" }).click();
    await waitSaved(page);
    doc = (await getPlan(page, baseUrl, projectId)).document as Doc;
    expect(ofType(doc, "room")).toHaveLength(0);
    expect(errors).toEqual([]);
    await context.close();
  });

  it("shows a validation problem on the plan and in the list, and clears it when fixed", async () => {
    const { context, page, errors } = await newPage(browser);
    await signIn(page, baseUrl, SURVEYOR);
    const projectId = await createProject(page, baseUrl, "Editor test — problems");
    await openSketch(page, baseUrl, projectId);
    await drawTwoRooms(page);
    await page.getByRole("button", { name: "Door", exact: true }).click();
    await clickPlan(page, 4, 1.5);
    const before = await problemCount(page);
    await setField(page, "Width", "5");
    await expect.poll(() => problemCount(page)).toBe(before + 1);
    await page.getByRole("button", { name: /problem/ }).first().click();
    const item = page.getByRole("list", { name: "Plan problems" }).getByRole("button").first();
    await expect(item.textContent()).resolves.toMatch(/wider|wall/i);
    await item.click();
    await setField(page, "Width", "0.9");
    await expect.poll(() => problemCount(page)).toBe(before);
    expect(errors).toEqual([]);
    await context.close();
  });

  it("marks the leaky door as the weakest link, and sealing its undercut lowers the level received", async () => {
    const { context, page, errors } = await newPage(browser);
    await signIn(page, baseUrl, SURVEYOR);
    const projectId = await createProject(page, baseUrl, "Editor test — paths");
    await openSketch(page, baseUrl, projectId);
    await drawTwoRooms(page);
    await page.getByRole("button", { name: "Door", exact: true }).click();
    await clickPlan(page, 4, 1.5);
    await setField(page, "Name", "Connecting door");
    await setField(page, "Undercut", "25");
    await waitSaved(page);

    await page.getByRole("link", { name: "Paths" }).click();
    const level = page.getByTestId("received-dba");
    await level.waitFor({ timeout: 20_000 });
    const first = page.getByRole("region", { name: "Where the sound gets through" }).getByRole("button").first();
    await expect(first.textContent()).resolves.toContain("Connecting door");
    const leaky = Number.parseFloat((await level.textContent()) ?? "");

    await first.click();
    const undercut = page.getByLabel("Undercut");
    await undercut.fill("0");
    await undercut.press("Enter");
    await expect.poll(async () => Number.parseFloat((await level.textContent()) ?? ""), { timeout: 20_000 }).toBeLessThan(leaky - 1);
    await page.getByTestId("recomputing").waitFor({ state: "detached" });
    const doc = (await getPlan(page, baseUrl, projectId)).document as Doc;
    expect(ofType(doc, "door")[0]!.leaks?.undercutMm).toBe(0);
    expect(errors).toEqual([]);
    await context.close();
  });

  it("on a tablet in portrait, a finger draws a room and two fingers zoom", async () => {
    const context = await browser.newContext({ viewport: { width: 768, height: 1024 }, hasTouch: true });
    const page = await context.newPage();
    const errors: string[] = [];
    page.on("pageerror", (e) => errors.push(e.message));
    await signIn(page, baseUrl, SURVEYOR);
    const projectId = await createProject(page, baseUrl, "Editor test — tablet");
    await openSketch(page, baseUrl, projectId);
    const cdp = await context.newCDPSession(page);
    const touch = (type: "touchStart" | "touchMove" | "touchEnd", points: Array<{ x: number; y: number }>) =>
      cdp.send("Input.dispatchTouchEvent", { type, touchPoints: points.map((p, id) => ({ x: p.x, y: p.y, id })) });

    await page.getByRole("button", { name: "Room", exact: true }).tap();
    const a = await planToPage(page, 1, 1), b = await planToPage(page, 5, 4);
    await touch("touchStart", [a]);
    for (let i = 1; i <= 10; i++) await touch("touchMove", [{ x: a.x + ((b.x - a.x) * i) / 10, y: a.y + ((b.y - a.y) * i) / 10 }]);
    await touch("touchEnd", []);
    await waitSaved(page);
    const doc = (await getPlan(page, baseUrl, projectId)).document as Doc;
    expect(ofType(doc, "room")[0]!.outline!.map((p) => [p.x, p.y])).toEqual([[1, 1], [5, 1], [5, 4], [1, 4]]);

    const canvas = page.getByTestId("plan-canvas");
    const before = Number(await canvas.getAttribute("data-scale"));
    const box = (await canvas.boundingBox())!;
    const cx = box.x + box.width / 2, cy = box.y + box.height / 2;
    await touch("touchStart", [{ x: cx - 40, y: cy }, { x: cx + 40, y: cy }]);
    for (let i = 1; i <= 10; i++) await touch("touchMove", [{ x: cx - 40 - i * 8, y: cy }, { x: cx + 40 + i * 8, y: cy }]);
    await touch("touchEnd", []);
    await expect.poll(async () => Number(await canvas.getAttribute("data-scale"))).toBeGreaterThan(before * 1.5);
    // The pinch zoomed; it did not draw or move anything.
    expect(ofType((await getPlan(page, baseUrl, projectId)).document as Doc, "room")).toHaveLength(1);
    expect(errors).toEqual([]);
    await context.close();
  });

  it("the client sees the marked-up plan with no editing tools", async () => {
    const { context, page, errors } = await newPage(browser);
    await signIn(page, baseUrl, "client@fernhollow.example");
    await page.locator("a[href*='/projects/']").first().click();
    await page.getByRole("link", { name: "Paths" }).click();
    await page.getByTestId("received-dba").waitFor({ timeout: 20_000 });
    await expect(page.getByLabel("Colour legend").isVisible()).resolves.toBe(true);
    await expect(page.getByText("Heard in the room:").isVisible()).resolves.toBe(true);
    await expect(page.getByLabel("Where the noise is").isVisible()).resolves.toBe(true);
    expect(await page.getByRole("region", { name: "Where the sound gets through" }).getByRole("button").count()).toBeGreaterThan(0);
    expect(await page.getByLabel("Undercut").count()).toBe(0);
    await page.getByRole("link", { name: "Sketch" }).click();
    await page.getByTestId("plan-canvas").waitFor();
    expect(await page.getByRole("toolbar", { name: "Sketch tools" }).count()).toBe(0);
    expect(await page.getByRole("button", { name: "Undo" }).count()).toBe(0);
    expect(errors).toEqual([]);
    await context.close();
  });

  it("a measurement pin shows its latest reading in the details and links to that measurement", async () => {
    const { context, page, errors } = await newPage(browser);
    await signIn(page, baseUrl, SURVEYOR);
    const projectId = await createProject(page, baseUrl, "Editor test — pin readings");
    await openSketch(page, baseUrl, projectId);
    await drawTwoRooms(page);
    await page.getByRole("button", { name: "Pin", exact: true }).click();
    await clickPlan(page, 1.5, 1.5);
    await setField(page, "Label", "Bedhead");
    await waitSaved(page);
    const doc = (await getPlan(page, baseUrl, projectId)).document as Doc;
    const [west, east] = ofType(doc, "room").sort((a, b) => a.outline![0]!.x - b.outline![0]!.x) as Array<{ id?: string }>;
    const ids = Object.entries(doc.elements).filter(([, e]) => e.type === "room").map(([id]) => id);
    const westId = ids.find((id) => doc.elements[id] === west)!, eastId = ids.find((id) => doc.elements[id] === east)!;
    const spectrum = (peakBand: number, peakDb: number) => Array.from({ length: 21 }, (_, i) => (i === peakBand ? peakDb : 30));
    const post = async (label: string, roomId: string, takenAt: string, leqDb: number[]) => {
      const res = await page.request.post(`${baseUrl}/api/v1/projects/${projectId}/measurements`, { data: { label, kind: "receiver_side", takenAt, roomId, point: { x: roomId === westId ? 2 : 6, y: 1.5 }, source: "manual", leqDb } });
      expect(res.status()).toBe(201);
      return ((await res.json()) as { id: string }).id;
    };
    await post("Evening, window open", westId, "2026-11-01T19:00:00Z", spectrum(10, 55)); // 500 Hz
    const latest = await post("Night, window shut", westId, "2026-11-20T23:30:00Z", spectrum(4, 48)); // 125 Hz
    await post("Hall, morning", eastId, "2026-11-21T08:00:00Z", spectrum(15, 60));

    await openSketch(page, baseUrl, projectId);
    await selectInList(page, /^Select Pin Bedhead/);
    const reading = page.getByRole("region", { name: "Latest reading" });
    await reading.waitFor();
    const text = await reading.innerText();
    expect(text).toContain("Night, window shut");
    expect(text).toMatch(/peaks at 125 Hz \(48\.0 dB\)/);
    expect(text).not.toContain("Hall, morning");
    await reading.getByRole("link", { name: "Open the measurement" }).click();
    await page.waitForURL(new RegExp(`/measure\\?measurement=${latest}$`));
    // The linked one is open, not the newest of the project (the hall's).
    const list = page.getByTestId("measurement-list");
    await expect(list.getByRole("button", { name: /Night, window shut/ }).getAttribute("aria-current")).resolves.toBe("true");
    await expect(list.getByRole("button", { name: /Hall, morning/ }).getAttribute("aria-current")).resolves.toBeNull();
    expect(errors).toEqual([]);
    await context.close();
  });

  it("exports the marked-up plan as a PNG image and as a PDF for print", async () => {
    const { context, page, errors } = await newPage(browser);
    await signIn(page, baseUrl, SURVEYOR);
    await page.locator("a[href*='/projects/']").first().click();
    await page.getByRole("link", { name: "Paths" }).click();
    await page.getByTestId("received-dba").waitFor({ timeout: 20_000 });
    await page.getByRole("button", { name: "Export" }).click();
    const download = page.waitForEvent("download");
    await page.getByRole("button", { name: /Image \(PNG/ }).click();
    const file = await download;
    expect(file.suggestedFilename()).toMatch(/sound-paths\.png$/);
    const bytes = await readFile((await file.path())!);
    expect([...bytes.subarray(0, 8)]).toEqual([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);
    const width = bytes.readUInt32BE(16), height = bytes.readUInt32BE(20);
    // Print resolution: three device pixels per drawing pixel.
    expect(width).toBeGreaterThanOrEqual(1900);
    expect(height).toBeGreaterThan(900);
    expect(bytes.length).toBeGreaterThan(20_000);
    // The same analysis drawn by the server as a vector PDF for print.
    await page.getByRole("button", { name: "Export" }).click();
    const pdfDownload = page.waitForEvent("download");
    await page.getByRole("button", { name: "Drawing for print (PDF)" }).click();
    const pdf = await pdfDownload;
    expect(pdf.suggestedFilename()).toMatch(/sound-paths\.pdf$/);
    const pdfBytes = await readFile((await pdf.path())!);
    expect(pdfBytes.subarray(0, 5).toString()).toBe("%PDF-");
    expect(pdfBytes.length).toBeGreaterThan(1_000);
    expect(errors).toEqual([]);
    await context.close();
  });
});
