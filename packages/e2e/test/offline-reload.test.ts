import type { Browser, BrowserContext, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { launchBrowser, newPage } from "../src/browser.js";
import { createProject, drawTwoRooms, getPlan, setField, signIn, waitSaved } from "../src/editor-page.js";

const SURVEYOR = "surveyor@larkspur.example";
type Doc = { elements: Record<string, { type: string; name?: string }> };
const roomNames = (doc: Record<string, unknown>) => Object.values((doc as Doc).elements).filter((e) => e.type === "room").map((e) => e.name);
const pendingKey = (id: string) => `hushmark.pending-plan.${id}`;

async function openSketch(page: Page, baseUrl: string, projectId: string): Promise<void> {
  await page.goto(`${baseUrl}/projects/${projectId}/sketch`);
  await page.getByTestId("plan-canvas").waitFor({ timeout: 20_000 });
}

/**
 * The network off: Chromium's offline emulation, and the API refused at the context's router too,
 * since a request the page makes while it unloads (the save on `pagehide`) can slip past the
 * emulation and the test would then not be offline at all.
 */
async function goOffline(context: BrowserContext): Promise<void> {
  await context.route("**/api/**", (route) => route.abort("internetdisconnected"));
  await context.setOffline(true);
}
async function goOnline(context: BrowserContext): Promise<void> {
  await context.unrouteAll({ behavior: "wait" });
  await context.setOffline(false);
}

/** Draws two rooms and lets them save, then renames the first room with the network off. */
async function editOffline(context: BrowserContext, page: Page, baseUrl: string, title: string, name: string) {
  const projectId = await createProject(page, baseUrl, title);
  await openSketch(page, baseUrl, projectId);
  await drawTwoRooms(page);
  await waitSaved(page);
  // Both rooms on the server, and the status still "saved" (no second save on its way).
  let before = await getPlan(page, baseUrl, projectId);
  for (let i = 0; i < 50 && roomNames(before.document).length < 2; i += 1) {
    await page.waitForTimeout(100);
    before = await getPlan(page, baseUrl, projectId);
  }
  await waitSaved(page);
  expect(roomNames(before.document)).toHaveLength(2);
  await goOffline(context);
  await page.getByRole("tab", { name: "Elements" }).click();
  await page.getByRole("button", { name: /Select Room 1/ }).first().click();
  await page.getByRole("tab", { name: "Details" }).click();
  await setField(page, "Name", name);
  await page.locator("[data-testid=save-state][data-state=offline]").waitFor({ timeout: 15_000 });
  expect(await page.evaluate((k) => localStorage.getItem(k), pendingKey(projectId))).toContain(name);
  return { projectId, before };
}

/**
 * Goes to a blank page from Chromium's network-error page. That page can still be on its way in
 * (its own navigation to `chrome-error://`) when the test asks, which interrupts the first try.
 */
async function leaveErrorPage(page: Page): Promise<void> {
  for (let attempt = 0; ; attempt += 1) {
    const left = await page.goto("about:blank").then(() => undefined, (e: Error) => e);
    if (!left && page.url() === "about:blank") return;
    if (attempt >= 5) throw left ?? new Error(`still on ${page.url()}`);
    await page.waitForTimeout(200);
  }
}

/**
 * What the server holds once a save sent as the page went away has had time to land: that
 * request is still in flight when the page is gone, so wait up to two seconds for it.
 */
async function settledPlan(page: Page, baseUrl: string, projectId: string, version: number) {
  let plan = await getPlan(page, baseUrl, projectId);
  for (let i = 0; i < 20 && plan.version === version; i += 1) {
    await page.waitForTimeout(100);
    plan = await getPlan(page, baseUrl, projectId);
  }
  return plan;
}

/**
 * Back online in a fresh page load: the edit ends as exactly one new revision, without a
 * conflict. Kept on the device, it is put back (the Sketch says so) and saved; if its save had
 * reached the server as the page unloaded, the Sketch sees that and drops the kept copy.
 */
async function expectDelivered(page: Page, baseUrl: string, projectId: string, before: { version: number }, name: string, arrivedEarly: boolean) {
  await openSketch(page, baseUrl, projectId);
  if (!arrivedEarly) await page.getByText("Edits made on this device earlier and not yet saved were put back").waitFor({ timeout: 10_000 });
  await waitSaved(page);
  const after = await getPlan(page, baseUrl, projectId);
  expect(after.version).toBe(before.version + 1);
  expect(roomNames(after.document)).toContain(name);
  const revisions = await page.request.get(`${baseUrl}/api/v1/projects/${projectId}/plan/revisions`);
  const list = ((await revisions.json()) as { revisions: { version: number }[] }).revisions;
  expect(list[0]!.version).toBe(after.version);
  expect(await page.evaluate((k) => localStorage.getItem(k), pendingKey(projectId))).toBeNull();
  expect(await page.locator("[data-testid=save-state]").getAttribute("data-state")).toBe("saved");
}

describe("the editor's offline queue across page loads", () => {
  let browser: Browser;
  const baseUrl = inject("baseUrl");

  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => browser?.close());

  it("keeps an edit made offline through a reload while still offline, and saves it once back online", async () => {
    const { context, page, errors } = await newPage(browser);
    await signIn(page, baseUrl, SURVEYOR);
    const { projectId, before } = await editOffline(context, page, baseUrl, "Offline reload — reload", "Reloaded room");

    // The reload itself fails (no network): the browser's own error page replaces the app.
    const reload = await page.reload({ timeout: 10_000 }).then(() => "loaded", (e: Error) => e.message);
    expect(reload).toMatch(/ERR_INTERNET_DISCONNECTED/);
    expect(await page.getByTestId("plan-canvas").count(), "the app is still on the page").toBe(0);
    // The API client is not behind the page's network, so this reads what the server holds now.
    // Chromium can let the save sent on `pagehide` through its offline emulation; then the edit is
    // on the server already and the answer was lost, like a connection that drops after the write.
    const during = await settledPlan(page, baseUrl, projectId, before.version);
    const arrivedEarly = during.version !== before.version;
    if (arrivedEarly) expect(during.version).toBe(before.version + 1);
    console.info(`[offline-reload] the edit ${arrivedEarly ? "reached the server as the page unloaded" : "stayed on the device"}`);
    // Chromium's error page reloads by itself when the network returns; leave it first so the
    // test, not that race, decides when the Sketch opens again.
    await leaveErrorPage(page);
    await goOnline(context);
    await expectDelivered(page, baseUrl, projectId, before, "Reloaded room", arrivedEarly);
    expect(errors.filter((e) => !/ERR_INTERNET_DISCONNECTED|Failed to fetch|NetworkError/.test(e))).toEqual([]);
    await context.close();
  });

  it("keeps an edit made offline when the tab is closed, and saves it when the Sketch is opened again", async () => {
    const { context, page } = await newPage(browser);
    await signIn(page, baseUrl, SURVEYOR);
    const { projectId, before } = await editOffline(context, page, baseUrl, "Offline reload — closed tab", "Room from a closed tab");
    await page.close();
    await goOnline(context);
    const reopened = await context.newPage();
    const arrivedEarly = (await settledPlan(reopened, baseUrl, projectId, before.version)).version !== before.version;
    await expectDelivered(reopened, baseUrl, projectId, before, "Room from a closed tab", arrivedEarly);
    await context.close();
  });
});
