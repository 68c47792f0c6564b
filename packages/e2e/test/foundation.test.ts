import type { Browser } from "playwright-core";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { launchBrowser, newPage } from "../src/browser.js";

const PASSWORD = "a perfectly fine passphrase";

describe("a firm starts, invites a surveyor, and a client sees only their project", () => {
  let browser: Browser;
  const baseUrl = inject("baseUrl");

  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => browser?.close());

  it("signs up a firm, invites a surveyor, who accepts from the mailed link and sees the projects list", async () => {
    const stamp = Date.now().toString(36);
    const ownerEmail = `owner-${stamp}@quietline.example`;
    const surveyorEmail = `surveyor-${stamp}@quietline.example`;
    const { context, page, errors } = await newPage(browser);

    await page.goto(`${baseUrl}/sign-up`);
    await page.getByLabel("Firm name").fill("Quietline Acoustics");
    await page.getByLabel("Your name").fill("Rhea Okafor");
    await page.getByLabel("E-mail").fill(ownerEmail);
    await page.getByLabel("Password").fill(PASSWORD);
    await page.getByRole("button", { name: "Create firm" }).click();
    await page.getByRole("heading", { name: "Projects" }).waitFor();

    await page.getByRole("link", { name: "People" }).click();
    const invite = page.getByRole("form", { name: "Invite someone" });
    await invite.getByLabel("E-mail").fill(surveyorEmail);
    await invite.getByLabel("Role").selectOption("surveyor");
    await invite.getByRole("button", { name: "Send invitation" }).click();
    await page.getByText(surveyorEmail).first().waitFor();
    await context.close();

    // The surveyor opens the development inbox in their own browser and follows the link.
    const surveyor = await newPage(browser);
    await surveyor.page.goto(`${baseUrl}/dev/mail`);
    const link = surveyor.page.locator("article", { hasText: surveyorEmail }).first().getByRole("link").first();
    await link.click();
    const accept = surveyor.page.getByRole("form", { name: "Accept the invitation" });
    await accept.waitFor();
    await expect(surveyor.page.getByText("Quietline Acoustics").first().isVisible()).resolves.toBe(true);
    await accept.getByLabel("Your name").fill("Sam Ferreira");
    await accept.getByLabel("Password").fill(PASSWORD);
    await accept.getByRole("button", { name: "Accept and continue" }).click();
    await surveyor.page.getByRole("heading", { name: "Projects" }).waitFor();
    expect(surveyor.page.url()).toContain("/projects");
    await expect(surveyor.page.getByRole("button", { name: "New project" }).first().isVisible()).resolves.toBe(true);
    expect([...errors, ...surveyor.errors]).toEqual([]);
    await surveyor.context.close();
  });

  it("lets a demo client sign in and see only their own project, without a create button", async () => {
    const { context, page, errors } = await newPage(browser);
    await page.goto(`${baseUrl}/projects`);
    await page.getByLabel("E-mail").waitFor();
    expect(page.url()).toContain("/sign-in");
    await page.getByLabel("E-mail").fill("client@fernhollow.example");
    await page.getByLabel("Password").fill("quiet-demo-2026");
    await page.getByRole("button", { name: "Sign in" }).click();
    await page.getByRole("heading", { name: "Projects" }).waitFor();
    await page.getByText("Fernhollow Audio — podcast studio").first().waitFor();
    expect(await page.getByText("Berg residence").count()).toBe(0);
    expect(await page.getByRole("button", { name: "New project" }).count()).toBe(0);
    expect(errors).toEqual([]);
    await context.close();
  });
});
