import { crc32, deflateSync } from "node:zlib";
import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { launchBrowser, newPage } from "../src/browser.js";
import { createProject, dragPlan, getPlan, planToPage, signIn, waitSaved } from "../src/editor-page.js";

const SURVEYOR = "surveyor@larkspur.example";
const SHOTS = process.env.HUSHMARK_E2E_SHOTS; // a folder: screenshots of each step, for looking at

/** A PNG written byte by byte: 8-bit RGB, one filter byte per row, zlib-compressed (RFC 2083). */
function png(width: number, height: number, colour: (x: number, y: number) => [number, number, number]): Buffer {
  const chunk = (type: string, data: Buffer) => {
    const body = Buffer.concat([Buffer.from(type, "ascii"), data]);
    const out = Buffer.alloc(12 + data.length);
    out.writeUInt32BE(data.length, 0);
    body.copy(out, 4);
    out.writeUInt32BE(crc32(body), 8 + data.length);
    return out;
  };
  const header = Buffer.alloc(13);
  header.writeUInt32BE(width, 0);
  header.writeUInt32BE(height, 4);
  header.set([8, 2, 0, 0, 0], 8); // bit depth 8, colour type 2 (RGB), deflate, no filter set, no interlace
  const raw = Buffer.alloc((width * 3 + 1) * height);
  for (let y = 0; y < height; y++) {
    for (let x = 0; x < width; x++) raw.set(colour(x, y), y * (width * 3 + 1) + 1 + x * 3);
  }
  return Buffer.concat([Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]), chunk("IHDR", header), chunk("IDAT", deflateSync(raw)), chunk("IEND", Buffer.alloc(0))]);
}

/**
 * An estate agent's plan: 1000 × 700 px of paper with one room drawn as a dark 6 px outline whose
 * outer edge runs from pixel (100, 100) to (900, 600): 800 × 500 px, which is 8 m × 5 m.
 */
const ROOM = { left: 100, top: 100, right: 900, bottom: 600 };
const PLAN_PNG = png(1000, 700, (x, y) => {
  const inside = x >= ROOM.left && x < ROOM.right && y >= ROOM.top && y < ROOM.bottom;
  const wall = inside && (x < ROOM.left + 6 || x >= ROOM.right - 6 || y < ROOM.top + 6 || y >= ROOM.bottom - 6);
  return wall ? [30, 36, 51] : [250, 248, 242];
});

/** A PDF of US-letter pages (612 × 792 pt), each stroking one rectangle, with a correct cross-reference table (ISO 32000-1, 7.5). */
function pdf(pages: number): Buffer {
  const objects: string[] = ["<< /Type /Catalog /Pages 2 0 R >>", `<< /Type /Pages /Count ${pages} /Kids [${Array.from({ length: pages }, (_, i) => `${3 + 2 * i} 0 R`).join(" ")}] >>`];
  for (let i = 0; i < pages; i++) {
    const content = `4 w 72 72 ${200 + 100 * i} 300 re S`;
    objects.push(`<< /Type /Page /Parent 2 0 R /MediaBox [0 0 612 792] /Contents ${4 + 2 * i} 0 R >>`, `<< /Length ${content.length} >>\nstream\n${content}\nendstream`);
  }
  let body = "%PDF-1.7\n";
  const offsets = objects.map((o, i) => {
    const at = body.length;
    body += `${i + 1} 0 obj\n${o}\nendobj\n`;
    return at;
  });
  const xref = body.length;
  body += `xref\n0 ${objects.length + 1}\n0000000000 65535 f \n${offsets.map((o) => `${String(o).padStart(10, "0")} 00000 n \n`).join("")}`;
  body += `trailer\n<< /Size ${objects.length + 1} /Root 1 0 R >>\nstartxref\n${xref}\n%%EOF\n`;
  return Buffer.from(body, "latin1");
}

type Placement = { id: string; origin: { x: number; y: number }; scaleMPerPx: number; rotationDeg: number; calibrated: boolean; widthPx: number };

/** Plan point of an image pixel, worked out here independently of the app's own code. */
function pixelToPlan(u: Placement, px: number, py: number) {
  const r = (u.rotationDeg * Math.PI) / 180;
  const lx = px * u.scaleMPerPx, ly = -py * u.scaleMPerPx;
  return { x: u.origin.x + Math.cos(r) * lx - Math.sin(r) * ly, y: u.origin.y + Math.sin(r) * lx + Math.cos(r) * ly };
}

/** The saved underlays once `ready` holds for them (autosave runs a moment after each edit). */
async function savedUnderlays(page: Page, baseUrl: string, projectId: string, ready: (u: Placement[]) => boolean): Promise<Placement[]> {
  for (let i = 0; i < 100; i++) {
    await waitSaved(page);
    const list = ((await getPlan(page, baseUrl, projectId)).document.underlays ?? []) as Placement[];
    if (ready(list)) return list;
    await page.waitForTimeout(150);
  }
  throw new Error("the underlay change was not saved");
}

async function clickPixel(page: Page, u: Placement, px: number, py: number) {
  const p = pixelToPlan(u, px, py);
  const at = await planToPage(page, p.x, p.y);
  await page.mouse.click(at.x, at.y);
}

/** Alpha of the underlay layer's canvas (the stage's first) at a page point: 0 where nothing is drawn. */
async function underlayAlphaAt(page: Page, at: { x: number; y: number }): Promise<number> {
  return page.evaluate(({ x, y }) => {
    const canvas = document.querySelector("[data-testid=plan-canvas] canvas") as HTMLCanvasElement;
    const box = canvas.getBoundingClientRect();
    const k = canvas.width / box.width;
    return canvas.getContext("2d")!.getImageData(Math.round((x - box.left) * k), Math.round((y - box.top) * k), 1, 1).data[3]!;
  }, at);
}

describe("tracing over an underlay", () => {
  let browser: Browser;
  const baseUrl = inject("baseUrl");

  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => browser?.close());

  it("uploads a plan image, calibrates it from two points and a typed distance, and a room traced over it has the drawing's real area", async () => {
    const { context, page, errors } = await newPage(browser);
    await signIn(page, baseUrl, SURVEYOR);
    const projectId = await createProject(page, baseUrl, "Underlay test — agent's plan");
    await page.goto(`${baseUrl}/projects/${projectId}/sketch`);
    await page.getByTestId("plan-canvas").waitFor({ timeout: 20_000 });

    await page.getByRole("button", { name: /^Underlay/ }).click();
    await page.getByTestId("underlay-file").setInputFiles({ name: "agent-plan.png", mimeType: "image/png", buffer: PLAN_PNG });
    const row = page.getByRole("listitem", { name: "Underlay agent-plan" });
    await row.waitFor();
    await expect(row.getByTestId("underlay-scale").textContent()).resolves.toBe("Scale not set yet");
    let [u] = await savedUnderlays(page, baseUrl, projectId, (l) => l.length === 1);
    expect(u).toMatchObject({ widthPx: 1000, calibrated: false, rotationDeg: 0 });
    // Drawn under the plan: the layer has paint inside the image and none well outside it.
    await page.waitForTimeout(400);
    const inside = pixelToPlan(u!, 500, 350), outside = pixelToPlan(u!, -300, 350);
    expect(await underlayAlphaAt(page, await planToPage(page, inside.x, inside.y))).toBeGreaterThan(0);
    expect(await underlayAlphaAt(page, await planToPage(page, outside.x, outside.y))).toBe(0);
    if (SHOTS) await page.screenshot({ path: `${SHOTS}/underlay-1-placed.png` });

    // Scale: the bottom wall's outer corners are 8 m apart.
    await row.getByRole("button", { name: "Set scale…" }).click();
    await clickPixel(page, u!, ROOM.left, ROOM.bottom);
    await clickPixel(page, u!, ROOM.right, ROOM.bottom);
    const distance = page.getByLabel("Real distance between the two points");
    await distance.fill("eight metres");
    await page.getByRole("button", { name: "Set scale" }).click();
    await expect(page.getByRole("alert").filter({ hasText: "Type the distance as a length" }).count()).resolves.toBe(1);
    if (SHOTS) await page.screenshot({ path: `${SHOTS}/underlay-2-distance.png` });
    await distance.fill("8");
    await page.getByRole("button", { name: "Set scale" }).click();
    [u] = await savedUnderlays(page, baseUrl, projectId, (l) => l[0]?.calibrated === true);
    expect(u!.calibrated).toBe(true);
    expect(u!.scaleMPerPx).toBeCloseTo(8 / 800, 4);

    // Move the room's corner onto the plan origin, so the trace starts on the grid.
    await page.getByRole("button", { name: /^Underlay/ }).click();
    await row.getByRole("button", { name: "Move", exact: true }).click();
    await clickPixel(page, u!, ROOM.left, ROOM.bottom);
    const origin = await planToPage(page, 0, 0);
    const before = u!.origin;
    await page.mouse.click(origin.x, origin.y);
    [u] = await savedUnderlays(page, baseUrl, projectId, (l) => l[0]!.origin.x !== before.x || l[0]!.origin.y !== before.y);
    const a = pixelToPlan(u!, ROOM.left, ROOM.bottom), b = pixelToPlan(u!, ROOM.right, ROOM.top);
    expect(Math.hypot(a.x, a.y)).toBeLessThan(0.05);

    // Trace the room with the rectangle tool over the drawing.
    await page.getByRole("button", { name: "Room", exact: true }).click();
    await dragPlan(page, [a.x, a.y], [b.x, b.y]);
    await waitSaved(page);
    if (SHOTS) await page.screenshot({ path: `${SHOTS}/underlay-3-traced.png` });
    await page.getByRole("tab", { name: "Elements" }).click();
    const rooms = page.getByRole("table", { name: "Elements on this level" }).getByRole("row").filter({ hasText: "m²" });
    await expect(rooms.count()).resolves.toBe(1);
    expect(await rooms.textContent()).toContain("40.0 m²"); // 8 m × 5 m
    expect(errors).toEqual([]);
    await context.close();
  });

  it("renders the chosen page of a PDF in the browser and places it as an image", async () => {
    const { context, page, errors } = await newPage(browser);
    await signIn(page, baseUrl, SURVEYOR);
    const projectId = await createProject(page, baseUrl, "Underlay test — landlord's PDF");
    await page.goto(`${baseUrl}/projects/${projectId}/sketch`);
    await page.getByTestId("plan-canvas").waitFor({ timeout: 20_000 });
    await page.getByRole("button", { name: /^Underlay/ }).click();
    await page.getByTestId("underlay-file").setInputFiles({ name: "landlord.pdf", mimeType: "application/pdf", buffer: pdf(2) });
    await page.getByText("This PDF has 2 pages. Page").waitFor({ timeout: 20_000 });
    await page.getByRole("spinbutton").fill("2");
    await page.getByRole("button", { name: "Use this page" }).click();
    await page.getByRole("listitem", { name: "Underlay landlord" }).waitFor({ timeout: 20_000 });
    const [u] = await savedUnderlays(page, baseUrl, projectId, (l) => l.length === 1);
    expect(u!.widthPx).toBe(Math.floor((612 * 200) / 72)); // 200 dots per inch, 72 points per inch
    const files = (await (await page.request.get(`${baseUrl}/api/v1/projects/${projectId}/underlays`)).json()).underlays;
    expect(files).toMatchObject([{ source: "pdf-page", page: 2, contentType: "image/png", heightPx: Math.floor((792 * 200) / 72) }]);
    if (SHOTS) await page.screenshot({ path: `${SHOTS}/underlay-5-pdf.png` });
    expect(errors).toEqual([]);
    await context.close();
  });

  it("refuses a damaged image and a file that is no drawing with a message, and the plan keeps no underlay", async () => {
    const { context, page } = await newPage(browser);
    await signIn(page, baseUrl, SURVEYOR);
    const projectId = await createProject(page, baseUrl, "Underlay test — bad files");
    await page.goto(`${baseUrl}/projects/${projectId}/sketch`);
    await page.getByTestId("plan-canvas").waitFor({ timeout: 20_000 });
    await page.getByRole("button", { name: /^Underlay/ }).click();
    const input = page.getByTestId("underlay-file");
    await input.setInputFiles({ name: "cut.png", mimeType: "image/png", buffer: PLAN_PNG.subarray(0, 400) });
    await page.getByRole("alert").filter({ hasText: /could not be read/ }).waitFor();
    await input.setInputFiles({ name: "plan.png", mimeType: "image/png", buffer: Buffer.from("not a picture at all") });
    await page.getByRole("alert").filter({ hasText: /none of those/ }).waitFor();
    await input.setInputFiles({ name: "broken.pdf", mimeType: "application/pdf", buffer: Buffer.from("%PDF-1.7\nthis is where the pages would be\n") });
    await page.getByRole("alert").filter({ hasText: /PDF could not be read/ }).waitFor();
    if (SHOTS) await page.screenshot({ path: `${SHOTS}/underlay-4-refused.png` });
    await expect(page.getByText("No drawing on this level yet.").count()).resolves.toBe(1);
    const plan = await getPlan(page, baseUrl, projectId);
    expect(plan.document.underlays).toBeUndefined();
    const files = await page.request.get(`${baseUrl}/api/v1/projects/${projectId}/underlays`);
    expect((await files.json()).underlays).toEqual([]);
    await context.close();
  });
});
