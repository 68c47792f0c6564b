#!/usr/bin/env node
// Signs in and screenshots pages of a running Hushmark, for looking at what a person sees.
// node scripts/tour.mjs BASE_URL EMAIL PASSWORD OUT_DIR path[@WxH] …   (paths may use :project for the first project)
import { mkdirSync } from "node:fs";
import { chromium } from "playwright-core";

const [base, email, password, out, ...paths] = process.argv.slice(2);
if (!base || !email || !password || !out || !paths.length) {
  console.error("usage: tour.mjs BASE_URL EMAIL PASSWORD OUT_DIR path[@WxH] …");
  process.exit(2);
}
mkdirSync(out, { recursive: true });
const browser = await chromium.launch({
  executablePath: process.env.CHROMIUM_PATH ?? "/usr/bin/chromium",
  headless: true,
  args: ["--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run", "--disable-background-networking", "--disable-component-update", "--disable-sync", "--disable-dev-shm-usage"],
});
const context = await browser.newContext();
const signIn = await context.request.post(`${base}/api/v1/auth/sign-in`, { data: { email, password } });
if (!signIn.ok()) throw new Error(`sign-in answered ${signIn.status()}`);
const projects = await (await context.request.get(`${base}/api/v1/projects`)).json();
const projectId = projects.projects?.[0]?.id ?? "none";
for (const [i, spec] of paths.entries()) {
  const [path, size = "1280x800"] = spec.split("@");
  const [width, height] = size.split("x").map(Number);
  const page = await context.newPage();
  await page.setViewportSize({ width, height });
  page.on("pageerror", (e) => console.log(`page error on ${path}: ${e.message}`));
  await page.goto(`${base}${path.replace(":project", projectId)}`, { waitUntil: "networkidle" });
  await page.waitForTimeout(600);
  const file = `${out}/${String(i).padStart(2, "0")}-${path.replace(/[^a-z0-9]+/gi, "-").replace(/^-|-$/g, "") || "root"}-${size}.png`;
  await page.screenshot({ path: file });
  console.log(file);
  await page.close();
}
await browser.close();
