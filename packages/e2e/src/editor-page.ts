import type { Page } from "playwright-core";

export const DEMO_PASSWORD = "quiet-demo-2026";

export async function signIn(page: Page, baseUrl: string, email: string): Promise<void> {
  await page.goto(`${baseUrl}/sign-in`);
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill(DEMO_PASSWORD);
  await page.getByRole("button", { name: "Sign in" }).click();
  await page.getByRole("heading", { name: "Projects" }).waitFor();
}

/** Creates a project through the API with the page's session and answers its id. */
export async function createProject(page: Page, baseUrl: string, title: string): Promise<string> {
  const res = await page.request.post(`${baseUrl}/api/v1/projects`, { data: { title, siteAddress: "1 Test Lane" } });
  if (!res.ok()) throw new Error(`creating a project answered ${res.status()}: ${await res.text()}`);
  const body = (await res.json()) as { id: string };
  return body.id;
}

export async function getPlan(page: Page, baseUrl: string, projectId: string): Promise<{ version: number; document: Record<string, unknown> }> {
  const res = await page.request.get(`${baseUrl}/api/v1/projects/${projectId}/plan`);
  if (!res.ok()) throw new Error(`reading the plan answered ${res.status()}`);
  return (await res.json()) as { version: number; document: Record<string, unknown> };
}

/** Screen position (page pixels) of a plan point (m), read from the canvas's view transform. */
export async function planToPage(page: Page, x: number, y: number): Promise<{ x: number; y: number }> {
  const canvas = page.getByTestId("plan-canvas");
  const box = await canvas.boundingBox();
  if (!box) throw new Error("the plan canvas is not on screen");
  const [scale, ox, oy] = await Promise.all(["data-scale", "data-ox", "data-oy"].map(async (name) => Number(await canvas.getAttribute(name))));
  return { x: box.x + ox! + x * scale!, y: box.y + oy! - y * scale! };
}

/** Drags with the mouse between two plan points, in steps like a hand would. */
export async function dragPlan(page: Page, from: [number, number], to: [number, number]): Promise<void> {
  const a = await planToPage(page, from[0], from[1]);
  const b = await planToPage(page, to[0], to[1]);
  await page.mouse.move(a.x, a.y);
  await page.mouse.down();
  await page.mouse.move(b.x, b.y, { steps: 12 });
  await page.mouse.up();
}

export async function clickPlan(page: Page, x: number, y: number): Promise<void> {
  const p = await planToPage(page, x, y);
  await page.mouse.click(p.x, p.y);
}

export async function waitSaved(page: Page): Promise<void> {
  await page.locator("[data-testid=save-state][data-state=saved]").waitFor({ timeout: 15_000 });
}

/** Sets a field in the details panel: types, then Enter commits it as one edit. */
export async function setField(page: Page, label: string | RegExp, value: string): Promise<void> {
  const field = page.getByRole("complementary", { name: "Selection and lists" }).getByLabel(label, { exact: typeof label === "string" });
  await field.fill(value);
  await field.press("Enter");
}

/** Picks a catalogue construction by searching for it. */
export async function pickConstruction(page: Page, search: string): Promise<void> {
  const panel = page.getByRole("complementary", { name: "Selection and lists" });
  await panel.getByRole("button", { name: /^Construction/ }).click();
  await panel.getByRole("searchbox").fill(search);
  await panel.getByRole("listbox").getByRole("button").first().click();
}

/** Draws the two-room test plan: west 4 × 3 m and east 4 × 3 m sharing the wall at x = 4. */
export async function drawTwoRooms(page: Page): Promise<void> {
  await page.getByRole("button", { name: "Room", exact: true }).click();
  await dragPlan(page, [0, 0], [4, 3]);
  await dragPlan(page, [4, 0], [8, 3]);
}

/** The parts of a plan document the browser tests read. */
export type Doc = { elements: Record<string, { type: string; name?: string; widthM?: number; leaks?: { undercutMm: number }; constructionId?: string; outline?: Array<{ x: number; y: number }> }> };
export const ofType = (doc: Doc, type: string) => Object.values(doc.elements).filter((e) => e.type === type);

/** Opens a project's Sketch and waits for its canvas, saying what the page shows if it never comes. */
export async function openSketch(page: Page, baseUrl: string, projectId: string): Promise<void> {
  await page.goto(`${baseUrl}/projects/${projectId}/sketch`);
  try {
    await page.getByTestId("plan-canvas").waitFor({ timeout: 20_000 });
  } catch (error) {
    // Say what the page shows instead, so a failure here explains itself.
    throw new Error(`the Sketch canvas did not appear; the page says: ${(await page.locator("main").innerText()).slice(0, 400)}`, { cause: error });
  }
}

/** Selects an element through the accessible element list, the keyboard route to everything on the canvas. */
export async function selectInList(page: Page, name: RegExp): Promise<void> {
  await page.getByRole("tab", { name: "Elements" }).click();
  await page.getByRole("button", { name }).first().click();
  await page.getByRole("tab", { name: "Details" }).click();
}

/** The number of plan problems the status line shows. */
export async function problemCount(page: Page): Promise<number> {
  const text = (await page.getByRole("button", { name: /problem|No problems/ }).first().textContent()) ?? "";
  const m = /^(\d+) problem/.exec(text);
  return m ? Number(m[1]) : 0;
}
