import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { launchBrowser, newPage } from "../src/browser.js";
import { createProject, drawTwoRooms, getPlan, setField, signIn, waitSaved } from "../src/editor-page.js";

type Doc = { elements: Record<string, { type: string; name?: string }> };
const roomNames = (doc: unknown) => Object.values((doc as Doc).elements).filter((e) => e.type === "room").map((e) => e.name ?? "").sort();

async function openSketch(page: Page, baseUrl: string, projectId: string): Promise<void> {
  await page.goto(`${baseUrl}/projects/${projectId}/sketch`);
  await page.getByTestId("plan-canvas").waitFor({ timeout: 20_000 });
}

async function selectInList(page: Page, name: RegExp): Promise<void> {
  await page.getByRole("tab", { name: "Elements" }).click();
  await page.getByRole("button", { name }).first().click();
  await page.getByRole("tab", { name: "Details" }).click();
}

const pendingOf = (page: Page, projectId: string) => page.evaluate((id) => localStorage.getItem(`hushmark.pending-plan.${id}`), projectId);

async function revisionRoomNames(page: Page, baseUrl: string, projectId: string): Promise<Map<number, string[]>> {
  const list = (await (await page.request.get(`${baseUrl}/api/v1/projects/${projectId}/plan/revisions`)).json()) as { revisions: Array<{ version: number }> };
  const out = new Map<number, string[]>();
  for (const r of list.revisions) {
    const rev = (await (await page.request.get(`${baseUrl}/api/v1/projects/${projectId}/plan/revisions/${r.version}`)).json()) as { document: Doc };
    out.set(r.version, roomNames(rev.document));
  }
  return out;
}

describe("editing offline while someone else edits the same plan", () => {
  let browser: Browser;
  const baseUrl = inject("baseUrl");

  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => browser?.close());

  it("keeps the offline edit, prompts after reconnecting, and keeping mine leaves theirs in the history", async () => {
    const a = await newPage(browser);
    const b = await newPage(browser);
    await signIn(a.page, baseUrl, "surveyor@larkspur.example");
    await signIn(b.page, baseUrl, "owner@larkspur.example");
    const projectId = await createProject(a.page, baseUrl, "Offline test — keep mine");
    await openSketch(a.page, baseUrl, projectId);
    await drawTwoRooms(a.page);
    await waitSaved(a.page);

    // A loses the connection and renames a room; the edit stays on the device.
    await a.context.setOffline(true);
    await selectInList(a.page, /Select Room 1/);
    await setField(a.page, "Name", "Mine, offline");
    await a.page.locator("[data-testid=save-state][data-state=offline]").waitFor({ timeout: 15_000 });
    expect(await pendingOf(a.page, projectId)).toContain("Mine, offline");

    // Meanwhile B, online, renames the other room and saves.
    await openSketch(b.page, baseUrl, projectId);
    await selectInList(b.page, /Select Room 2/);
    await setField(b.page, "Name", "Theirs, online");
    await waitSaved(b.page);
    const theirsVersion = (await getPlan(b.page, baseUrl, projectId)).version;

    // Back online, A's save meets B's version: the prompt, and nothing of A's is dropped meanwhile.
    await a.context.setOffline(false);
    const dialog = a.page.getByRole("dialog", { name: "The plan was changed somewhere else" });
    await dialog.waitFor({ timeout: 20_000 });
    await expect(dialog.textContent()).resolves.toContain(`version ${theirsVersion}`);
    await a.page.locator("[data-testid=save-state][data-state=conflict]").waitFor();
    expect(await pendingOf(a.page, projectId)).toContain("Mine, offline");
    expect(roomNames((await getPlan(a.page, baseUrl, projectId)).document)).toEqual(["Room 1", "Theirs, online"]);

    await dialog.getByRole("button", { name: "Keep mine as a new version" }).click();
    await waitSaved(a.page);

    // Mine is the newest version, saved on top of theirs; theirs is in the history.
    const current = await getPlan(a.page, baseUrl, projectId);
    expect(current.version).toBeGreaterThan(theirsVersion);
    expect(roomNames(current.document)).toContain("Mine, offline");
    const history = await revisionRoomNames(a.page, baseUrl, projectId);
    expect(history.get(theirsVersion)).toEqual(["Room 1", "Theirs, online"]);
    expect(history.get(current.version)).toContain("Mine, offline");
    expect(await pendingOf(a.page, projectId)).toBeNull();

    // B, reloading, gets the kept version.
    await openSketch(b.page, baseUrl, projectId);
    await b.page.getByRole("tab", { name: "Elements" }).click();
    await b.page.getByRole("textbox", { name: /^Name of Mine, offline/ }).waitFor();

    expect(a.errors.filter((e) => !/409|ERR_INTERNET_DISCONNECTED|Failed to fetch/.test(e))).toEqual([]);
    expect(b.errors).toEqual([]);
    await a.context.close();
    await b.context.close();
  });

  it("typing a name in the side panel sends nothing and records nothing until it is committed", async () => {
    const { context, page, errors } = await newPage(browser);
    await signIn(page, baseUrl, "surveyor@larkspur.example");
    const projectId = await createProject(page, baseUrl, "Offline test — typing");
    await openSketch(page, baseUrl, projectId);
    await drawTwoRooms(page);
    await waitSaved(page);
    const before = (await getPlan(page, baseUrl, projectId)).version;
    const saves: string[] = [];
    page.on("request", (r) => { if (r.method() === "PUT" && r.url().endsWith("/plan")) saves.push(r.url()); });

    await selectInList(page, /Select Room 1/);
    const field = page.getByRole("complementary", { name: "Selection and lists" }).getByLabel("Name", { exact: true });
    await field.fill("");
    await field.pressSequentially("Consulting room by the stair", { delay: 15 });
    // Every keystroke is in the field at once; none of them became an edit or a save.
    await expect(field.inputValue()).resolves.toBe("Consulting room by the stair");
    await expect(page.getByRole("button", { name: /^Undo/ }).getAttribute("title")).resolves.not.toMatch(/rename/);
    await page.waitForTimeout(1200);
    expect(saves).toEqual([]);

    await field.press("Enter");
    await waitSaved(page);
    const after = await getPlan(page, baseUrl, projectId);
    expect(after.version).toBe(before + 1);
    expect(roomNames(after.document)).toContain("Consulting room by the stair");
    expect(saves).toHaveLength(1);
    expect(errors).toEqual([]);
    await context.close();
  });
});
