import type { Browser } from "playwright-core";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { launchBrowser, newPage } from "../src/browser.js";
import { createProject, drawTwoRooms, getPlan, ofType, openSketch, selectInList, setField, signIn, waitSaved, type Doc } from "../src/editor-page.js";

const SURVEYOR = "surveyor@larkspur.example";

describe("saving the plan: conflicts between browsers and edits made offline", () => {
  let browser: Browser;
  const baseUrl = inject("baseUrl");

  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => browser?.close());

  it("the same plan edited in two browsers prompts, and keeping mine loses neither version", async () => {
    const a = await newPage(browser);
    const b = await newPage(browser);
    await signIn(a.page, baseUrl, SURVEYOR);
    await signIn(b.page, baseUrl, "owner@larkspur.example");
    const projectId = await createProject(a.page, baseUrl, "Editor test — conflict");
    await openSketch(a.page, baseUrl, projectId);
    await drawTwoRooms(a.page);
    await waitSaved(a.page);

    await openSketch(b.page, baseUrl, projectId);
    await selectInList(a.page, /Select Room 1/);
    await setField(a.page, "Name", "Waiting room");
    await waitSaved(a.page);

    await selectInList(b.page, /Select Room 2/);
    await setField(b.page, "Name", "Consulting room");
    const dialog = b.page.getByRole("dialog", { name: "The plan was changed somewhere else" });
    await dialog.waitFor({ timeout: 15_000 });
    await dialog.getByRole("button", { name: "Keep mine as a new version" }).click();
    await waitSaved(b.page);

    const current = (await getPlan(b.page, baseUrl, projectId)).document as Doc;
    const names = ofType(current, "room").map((r) => r.name).sort();
    expect(names).toContain("Consulting room");
    // Theirs stays in the history: some saved revision has the waiting room.
    const revisions = (await (await b.page.request.get(`${baseUrl}/api/v1/projects/${projectId}/plan/revisions`)).json()) as { revisions: Array<{ version: number }> };
    let found = false;
    for (const r of revisions.revisions) {
      const rev = (await (await b.page.request.get(`${baseUrl}/api/v1/projects/${projectId}/plan/revisions/${r.version}`)).json()) as { document: Doc };
      if (ofType(rev.document, "room").some((room) => room.name === "Waiting room")) found = true;
    }
    expect(found).toBe(true);
    expect([...a.errors, ...b.errors].filter((e) => !/409/.test(e))).toEqual([]);
    await a.context.close();
    await b.context.close();
  });

  it("adds a room by typing its size, and loading their version after a conflict keeps mine in the history", async () => {
    const a = await newPage(browser);
    const b = await newPage(browser);
    await signIn(a.page, baseUrl, SURVEYOR);
    await signIn(b.page, baseUrl, "owner@larkspur.example");
    const projectId = await createProject(a.page, baseUrl, "Editor test — keyboard and theirs");
    await openSketch(a.page, baseUrl, projectId);
    await a.page.getByRole("tab", { name: "Elements" }).click();
    const form = a.page.getByRole("form", { name: "Add a room by size" });
    await form.getByLabel("Width").fill("4.2");
    await form.getByLabel("Depth").fill("3");
    await form.getByRole("button", { name: "Add room" }).click();
    await waitSaved(a.page);
    let doc = (await getPlan(a.page, baseUrl, projectId)).document as Doc;
    expect(ofType(doc, "room")[0]!.outline!.map((p) => [p.x, p.y])).toEqual([[0, 0], [4.2, 0], [4.2, 3], [0, 3]]);

    await openSketch(b.page, baseUrl, projectId);
    await a.page.getByRole("textbox", { name: /^Name of Room 1/ }).fill("Theirs");
    await a.page.getByRole("textbox", { name: /^Name of Room 1/ }).press("Enter");
    await waitSaved(a.page);
    await selectInList(b.page, /Select Room 1/);
    await setField(b.page, "Name", "Mine");
    const dialog = b.page.getByRole("dialog", { name: "The plan was changed somewhere else" });
    await dialog.waitFor({ timeout: 15_000 });
    await dialog.getByRole("button", { name: "Load their version" }).click();
    await waitSaved(b.page);
    await b.page.getByRole("tab", { name: "Elements" }).click();
    await expect(b.page.getByRole("textbox", { name: /^Name of Theirs/ }).inputValue()).resolves.toBe("Theirs");
    doc = (await getPlan(b.page, baseUrl, projectId)).document as Doc;
    expect(ofType(doc, "room")[0]!.name).toBe("Theirs");
    const revisions = (await (await b.page.request.get(`${baseUrl}/api/v1/projects/${projectId}/plan/revisions`)).json()) as { revisions: Array<{ version: number }> };
    const names: string[] = [];
    for (const r of revisions.revisions) {
      const rev = (await (await b.page.request.get(`${baseUrl}/api/v1/projects/${projectId}/plan/revisions/${r.version}`)).json()) as { document: Doc };
      names.push(...ofType(rev.document, "room").map((room) => room.name ?? ""));
    }
    expect(names).toContain("Mine");
    expect([...a.errors, ...b.errors].filter((e) => !/409/.test(e))).toEqual([]);
    await a.context.close();
    await b.context.close();
  });

  it("keeps an edit made offline on the device and saves it when the connection is back", async () => {
    const { context, page, errors } = await newPage(browser);
    await signIn(page, baseUrl, SURVEYOR);
    const projectId = await createProject(page, baseUrl, "Editor test — offline");
    await openSketch(page, baseUrl, projectId);
    await drawTwoRooms(page);
    await waitSaved(page);
    const version = (await getPlan(page, baseUrl, projectId)).version;

    await context.setOffline(true);
    await selectInList(page, /Select Room 1/);
    await setField(page, "Name", "Offline room");
    await page.locator("[data-testid=save-state][data-state=offline]").waitFor({ timeout: 15_000 });
    const kept = await page.evaluate((id) => localStorage.getItem(`hushmark.pending-plan.${id}`), projectId);
    expect(kept).toContain("Offline room");

    await context.setOffline(false);
    await waitSaved(page);
    const after = await getPlan(page, baseUrl, projectId);
    expect(after.version).toBeGreaterThan(version);
    expect(ofType(after.document as Doc, "room").map((r) => r.name)).toContain("Offline room");
    expect(await page.evaluate((id) => localStorage.getItem(`hushmark.pending-plan.${id}`), projectId)).toBeNull();
    expect(errors.filter((e) => !/ERR_INTERNET_DISCONNECTED|Failed to fetch/.test(e))).toEqual([]);
    await context.close();
  });
});
