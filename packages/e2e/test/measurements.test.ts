import { mkdtemp, rm, writeFile } from "node:fs/promises";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { chromium, type Browser, type Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { launchBrowser, newPage } from "../src/browser.js";

const SURVEYOR = "surveyor@larkspur.example";
const PASSWORD = "quiet-demo-2026";

/** A 16-bit mono WAV: a quiet 1 kHz tone with a loud stretch (`burst`, seconds) in the middle. */
function toneWav(seconds: number, rate: number, burst: [number, number] | null, rms = 0.1): Buffer {
  const n = Math.round(seconds * rate);
  const data = Buffer.alloc(n * 2);
  for (let i = 0; i < n; i++) {
    const t = i / rate;
    const a = burst === null || (t >= burst[0] && t < burst[1]) ? rms : rms / 100;
    data.writeInt16LE(Math.round(a * Math.SQRT2 * Math.sin(2 * Math.PI * 1000 * t) * 32767), i * 2);
  }
  const h = Buffer.alloc(44);
  h.write("RIFF", 0, "ascii");
  h.writeUInt32LE(36 + data.length, 4);
  h.write("WAVEfmt ", 8, "ascii");
  h.writeUInt32LE(16, 16);
  h.writeUInt16LE(1, 20);
  h.writeUInt16LE(1, 22);
  h.writeUInt32LE(rate, 24);
  h.writeUInt32LE(rate * 2, 28);
  h.writeUInt16LE(2, 32);
  h.writeUInt16LE(16, 34);
  h.write("data", 36, "ascii");
  h.writeUInt32LE(data.length, 40);
  return Buffer.concat([h, data]);
}

async function signIn(page: Page, baseUrl: string): Promise<void> {
  await page.goto(`${baseUrl}/sign-in`);
  await page.getByLabel("E-mail").fill(SURVEYOR);
  await page.getByLabel("Password").fill(PASSWORD);
  await page.getByRole("button", { name: "Sign in" }).click();
  await page.getByRole("heading", { name: "Projects" }).waitFor();
}

async function newProject(page: Page, baseUrl: string, title: string): Promise<string> {
  const res = await page.request.post(`${baseUrl}/api/v1/projects`, { data: { title } });
  expect(res.status()).toBe(201);
  return ((await res.json()) as { id: string }).id;
}

describe("Brief and Measure", () => {
  let browser: Browser;
  const baseUrl = inject("baseUrl");

  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => browser?.close());

  it("uploads a spectrum file and a recording, watches the progress bar complete and sees the charts", async () => {
    const { context, page, errors } = await newPage(browser);
    await signIn(page, baseUrl);
    const projectId = await newProject(page, baseUrl, "Measure test — café wall");
    await page.goto(`${baseUrl}/projects/${projectId}/measure`);
    await page.getByText("Nothing measured yet").waitFor();

    await page.getByRole("button", { name: "Add a spectrum file" }).click();
    const csv = "Frequency [Hz];Leq [dB];Lmax [dB]\n125;52,5;58\n250;loud;50\n500;47,1;53\n1000;44;49,5\n";
    await page.getByTestId("csv-file").setInputFiles({ name: "party-wall.csv", mimeType: "text/csv", buffer: Buffer.from(csv) });
    await page.getByTestId("csv-preview").waitFor();
    await expect(page.getByTestId("csv-problems").textContent()).resolves.toMatch(/Line 3:.*level “loud” at 250 Hz is not a number/);
    // Nothing is stored before the confirmation.
    const before = await page.request.get(`${baseUrl}/api/v1/projects/${projectId}/measurements`);
    expect(((await before.json()) as { measurements: unknown[] }).measurements).toHaveLength(0);
    await page.getByRole("button", { name: "Save 3 bands as a measurement" }).click();
    await page.getByTestId("spectrum-chart").waitFor();
    await expect(page.getByTestId("measurement-list").textContent()).resolves.toContain("party-wall");
    const total = await page.getByTestId("a-weighted-total").first().textContent();
    expect(total).toMatch(/^\d+\.\d dBA$/);

    await page.getByRole("button", { name: "Upload a recording" }).click();
    await page.getByTestId("wav-file").setInputFiles({ name: "overnight.wav", mimeType: "audio/wav", buffer: toneWav(12, 16_000, [4, 8]) });
    await page.getByRole("button", { name: "Upload and analyse" }).click();
    const analysing = page.getByRole("progressbar", { name: /Analys/ });
    await analysing.waitFor();
    await page.waitForFunction(() => document.querySelector('[role="progressbar"][aria-label="Analysed"]')?.getAttribute("aria-valuenow") === "100", undefined, { timeout: 30_000 });
    await page.getByRole("button", { name: "Show the result" }).click();
    await page.getByTestId("time-history").waitFor();
    await page.getByTestId("spectrum-chart").waitFor();
    const rows = page.getByTestId("events-table").locator("tbody tr");
    await expect(rows.count()).resolves.toBe(1);
    await expect(rows.first().textContent()).resolves.toMatch(/0:0[3-5].*1k Hz/);
    // Playing the event asks the server for that part of the file only.
    await rows.first().getByRole("button", { name: "Play" }).click();
    const src = await page.locator("audio").getAttribute("src");
    expect(src).toMatch(/\/audio\?startS=\d+&durationS=\d+/);
    const clip = await page.request.get(`${baseUrl}${src}`);
    expect(clip.headers()["content-type"]).toBe("audio/wav");
    const { startS, durationS } = Object.fromEntries(new URL(`${baseUrl}${src}`).searchParams) as { startS: string; durationS: string };
    expect((await clip.body()).length).toBe(44 + Math.ceil(Number(durationS) * 16_000) * 2);
    expect(Number(startS)).toBeGreaterThanOrEqual(2);
    // The tone at −20 dB re full scale with the default 100 dB offset: 80 dB in the 1 kHz band while loud.
    const res = await page.request.get(`${baseUrl}/api/v1/projects/${projectId}/measurements`);
    const list = (await res.json()) as { measurements: { source: string; lmaxDb: number[]; status: string }[] };
    const rec = list.measurements.find((m) => m.source === "recording")!;
    expect(rec.status).toBe("ready");
    expect(Math.abs(rec.lmaxDb[13]! - 80)).toBeLessThan(0.5);
    expect(errors).toEqual([]);
    await context.close();
  });

  it("compares a measured level difference with the one predicted from the plan", async () => {
    const { context, page, errors } = await newPage(browser);
    await signIn(page, baseUrl);
    const projects = (await (await page.request.get(`${baseUrl}/api/v1/projects`)).json()) as { projects: { id: string; title: string }[] };
    const demo = projects.projects.find((p) => p.title.startsWith("Fernhollow"))!;
    const add = (label: string, kind: string, roomId: string, top: number, point: { x: number; y: number }) =>
      page.request.post(`${baseUrl}/api/v1/projects/${demo.id}/measurements`, { data: { label, kind, roomId, point, takenAt: "2026-05-02T10:00:00Z", source: "manual", leqDb: Array.from({ length: 21 }, (_, i) => top - i * 0.8) } });
    expect((await add("E2E café counter", "source_side", "cafe", 78, { x: 7, y: 2 })).status()).toBe(201);
    expect((await add("E2E recording room", "receiver_side", "record", 40, { x: 2, y: 5 })).status()).toBe(201);
    await page.goto(`${baseUrl}/projects/${demo.id}/measure`);
    // Both readings sit on the plan as pins; a pin opens its measurement.
    await page.getByTestId("pins-map").waitFor();
    await page.getByRole("button", { name: "Show E2E café counter" }).click();
    await page.getByRole("heading", { name: "E2E café counter" }).waitFor();
    await page.getByLabel("Compare E2E café counter").check();
    await page.getByLabel("Compare E2E recording room").check();
    await expect(page.getByRole("heading", { name: /Measured level difference/ }).textContent()).resolves.toMatch(/38\.0 dBA overall/);
    await page.getByRole("button", { name: "Compare with the prediction from the plan" }).click();
    await page.getByText(/Predicted from the plan/).waitFor({ timeout: 30_000 });
    const rows = page.getByTestId("difference-table").locator("tr");
    expect(await rows.count()).toBe(3);
    await expect(rows.nth(2).textContent()).resolves.toMatch(/^Predicted(-?\d+\.\d)+/);
    expect(errors).toEqual([]);
    await context.close();
  });

  it("saves the brief as the surveyor types and explains the target", async () => {
    const { context, page, errors } = await newPage(browser);
    await signIn(page, baseUrl);
    const projectId = await newProject(page, baseUrl, "Brief test — nursery over cinema");
    await page.goto(`${baseUrl}/projects/${projectId}/brief`);
    await page.getByRole("button", { name: "Add a noise" }).click();
    await page.getByLabel("Kind of noise").selectOption("music_bass");
    await page.getByLabel("Where it comes from").fill("home cinema in the basement");
    await page.getByLabel("The target is").selectOption("nc");
    await page.getByLabel("NC rating").fill("25");
    await expect(page.getByTestId("target-explanation").textContent()).resolves.toMatch(/NC-25/);
    await page.getByTestId("brief-save-state").filter({ hasText: "All changes saved" }).waitFor({ timeout: 10_000 });
    const res = await page.request.get(`${baseUrl}/api/v1/projects/${projectId}/brief`);
    const body = (await res.json()) as { version: number; brief: { noises: { kind: string; where: string }[]; target: { kind: string; nc: number } } };
    expect(body.brief.noises[0]).toMatchObject({ kind: "music_bass", where: "home cinema in the basement" });
    expect(body.brief.target).toEqual({ kind: "nc", nc: 25 });
    await page.reload();
    await expect(page.getByLabel("Where it comes from").inputValue()).resolves.toBe("home cinema in the basement");
    expect(errors).toEqual([]);
    await context.close();
  });

  it("hears a tone through the fake microphone and saves the snapshot", async () => {
    const dir = await mkdtemp(join(tmpdir(), "hushmark-mic-"));
    const wav = join(dir, "tone.wav");
    await writeFile(wav, toneWav(10, 48_000, null));
    const mic = await chromium.launch({
      executablePath: process.env.CHROMIUM_PATH ?? "/usr/bin/chromium",
      headless: true,
      args: ["--no-sandbox", "--disable-gpu", "--disable-dev-shm-usage", "--use-fake-ui-for-media-stream", "--use-fake-device-for-media-stream", `--use-file-for-fake-audio-capture=${wav}`],
    });
    try {
      const context = await mic.newContext({ viewport: { width: 1280, height: 800 }, permissions: ["microphone"] });
      const page = await context.newPage();
      await signIn(page, baseUrl);
      const projectId = await newProject(page, baseUrl, "Live test");
      await page.goto(`${baseUrl}/projects/${projectId}/measure`);
      await page.getByRole("button", { name: "Live analyzer" }).click();
      await expect(page.getByRole("note").textContent()).resolves.toMatch(/not calibrated/);
      await page.getByRole("button", { name: "Start listening" }).click();
      await page.waitForFunction(() => /\d/.test(document.querySelector('[data-testid="live-dba"]')?.textContent ?? ""), undefined, { timeout: 15_000 });
      await page.waitForTimeout(2000);
      await page.getByRole("button", { name: "Stop" }).click();
      await page.getByRole("button", { name: "Save as a measurement" }).click();
      await page.getByTestId("measurement-list").or(page.getByRole("alert")).first().waitFor();
      expect(await page.getByRole("alert").count(), (await page.getByRole("alert").allTextContents()).join(" ")).toBe(0);
      const res = await page.request.get(`${baseUrl}/api/v1/projects/${projectId}/measurements`);
      const [m] = ((await res.json()) as { measurements: { source: string; leqDb: (number | null)[] }[] }).measurements;
      expect(m!.source).toBe("live");
      // The tone's band is the loudest one the microphone heard.
      const loudest = m!.leqDb.indexOf(Math.max(...m!.leqDb.filter((v): v is number => v !== null)));
      expect(loudest).toBe(13);
      await context.close();
    } finally {
      await mic.close();
      await rm(dir, { recursive: true, force: true });
    }
  });
});
