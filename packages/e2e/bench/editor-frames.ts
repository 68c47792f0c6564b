// Browser benchmark for the plan editor: frame times (requestAnimationFrame intervals) while
// dragging, panning and zooming a synthetic 2,000-element plan in headless Chromium, the time to
// open that plan, and the gzip size of each route's scripts. Writes packages/e2e/bench-results.json.
import { writeFileSync } from "node:fs";
import { loadavg } from "node:os";
import { fileURLToPath } from "node:url";
import { generateSyntheticBuilding, type Room } from "@hushmark/floorplan";
import type { Page } from "playwright-core";
import { launchBrowser } from "../src/browser.js";
import { ROOT } from "../src/stack.js";
import { createProject, planToPage, signIn } from "../src/editor-page.js";
import { startStack } from "../src/stack.js";
import { bundleRows } from "./bundles.js";

const databaseUrl = process.env.HUSHMARK_E2E_DATABASE_URL;
if (!databaseUrl) throw new Error("Set HUSHMARK_E2E_DATABASE_URL to a database the benchmark may wipe (npm run bench does).");

const quantile = (sorted: number[], q: number) => sorted[Math.min(sorted.length - 1, Math.max(0, Math.ceil(q * sorted.length) - 1))] ?? NaN;
const round = (v: number) => Math.round(v * 10) / 10;

function stats(scenario: string, frames: number[]) {
  // The first interval spans the wait before the gesture started.
  const s = frames.slice(1).sort((a, b) => a - b);
  return { scenario, frames: s.length, p50_ms: round(quantile(s, 0.5)), p95_ms: round(quantile(s, 0.95)), max_ms: round(s.at(-1) ?? NaN) };
}

// Passed as source text: the TypeScript runner adds helpers to compiled functions that do not exist in the page.
const RECORD = `(() => {
  window.__frames = [];
  window.__stop = false;
  let last = performance.now();
  const tick = (t) => { window.__frames.push(t - last); last = t; if (!window.__stop) requestAnimationFrame(tick); };
  requestAnimationFrame(tick);
})()`;
const STOP = `new Promise((resolve) => requestAnimationFrame(() => requestAnimationFrame(() => { window.__stop = true; resolve(window.__frames); })))`;
const TWO_FRAMES = `new Promise((r) => requestAnimationFrame(() => requestAnimationFrame(r)))`;
// Where the time goes while opening: the plan response, the Sketch's code, parsing the plan, the first draw, the next frame.
const PHASES = `(() => {
  const out = {};
  for (const e of performance.getEntriesByType("resource")) {
    if (/\\/plan$/.test(e.name)) out["plan response"] = Math.round(e.responseEnd);
    if (/sketch-section-/.test(e.name)) out["sketch code"] = Math.round(e.responseEnd);
    if (/canvas-/.test(e.name)) out["canvas code"] = Math.round(e.responseEnd);
  }
  for (const m of performance.getEntriesByType("mark")) if (m.name.startsWith("hushmark:")) out[m.name.slice(9)] = Math.round(m.startTime);
  out["next frame"] = Math.round(performance.now());
  return out;
})()`;

async function startRecording(page: Page): Promise<void> {
  await page.evaluate(RECORD);
}

async function stopRecording(page: Page): Promise<number[]> {
  return (await page.evaluate(STOP)) as number[];
}

const stack = await startStack(databaseUrl);
const browser = await launchBrowser();
try {
  const plan = generateSyntheticBuilding({ rooms: 800, levels: 1, seed: 2026 });
  const elements = Object.keys(plan.elements).length;
  const first = await browser.newPage({ viewport: { width: 1280, height: 800 } });
  await signIn(first, stack.baseUrl, "surveyor@larkspur.example");
  const projectId = await createProject(first, stack.baseUrl, "Benchmark — synthetic building");
  const put = await first.request.put(`${stack.baseUrl}/api/v1/projects/${projectId}/plan`, { data: { baseVersion: 0, document: plan } });
  if (!put.ok()) throw new Error(`saving the synthetic plan answered ${put.status()}: ${await put.text()}`);

  // Open: from navigation to the first frame after the plan is drawn, on a fresh page each time
  // (nothing of the Sketch cached), three times because the machine is shared.
  const opens: { ms: number; busyMs: number; phases: Record<string, number> }[] = [];
  let page!: Page;
  for (let run = 0; run < 3; run++) {
    if (run > 0) {
      await page.close();
      page = await browser.newPage({ viewport: { width: 1280, height: 800 } });
      await signIn(page, stack.baseUrl, "surveyor@larkspur.example");
    } else {
      page = first;
    }
    // Main-thread busy time as well as wall time: on a shared machine the wall time mostly
    // measures the neighbours, the busy time what the page itself did.
    const cdp = await page.context().newCDPSession(page);
    await cdp.send("Performance.enable");
    const busy = async () => ((await cdp.send("Performance.getMetrics")).metrics.find((m) => m.name === "TaskDuration")?.value ?? NaN) * 1000;
    const busy0 = await busy();
    const t0 = Date.now();
    await page.goto(`${stack.baseUrl}/projects/${projectId}/sketch`);
    // Checked in the page on every animation frame: a locator's wait polls with a backoff of up to
    // 500 ms between tries, which measured Playwright's polling rather than the page.
    await page.waitForFunction(() => {
      const c = document.querySelector("[data-testid=plan-canvas]");
      return c !== null && Number(c.getAttribute("data-scale")) !== 50;
    }, undefined, { polling: "raf" });
    await page.evaluate(TWO_FRAMES);
    const ms = Date.now() - t0;
    const busyMs = Math.round((await busy()) - busy0);
    opens.push({ ms, busyMs, phases: (await page.evaluate(PHASES)) as Record<string, number> });
    await cdp.detach();
  }
  const openMs = [...opens.map((o) => o.ms)].sort((a, b) => a - b)[1]!;
  const openBusyMs = [...opens.map((o) => o.busyMs)].sort((a, b) => a - b)[1]!;
  console.log("open runs (ms, and ms since navigation for each phase):", JSON.stringify(opens));

  // Zoom in a little so a room is large enough to grab, as a surveyor would.
  const canvas = page.getByTestId("plan-canvas");
  const box = (await canvas.boundingBox())!;
  await page.mouse.move(box.x + box.width / 2, box.y + box.height / 2);
  for (let i = 0; i < 4; i++) await page.mouse.wheel(0, -100);
  await page.waitForTimeout(300);

  // Drag a room near the middle of the view.
  const attr = async (name: string) => Number(await canvas.getAttribute(name));
  const [s, ox, oy] = [await attr("data-scale"), await attr("data-ox"), await attr("data-oy")];
  const centre = { x: (box.width / 2 - ox) / s, y: -(box.height / 2 - oy) / s };
  const rooms = Object.values(plan.elements).filter((e): e is Room => e.type === "room");
  const inside = (r: Room) => {
    const xs = r.outline.map((p) => p.x), ys = r.outline.map((p) => p.y);
    return { x: (Math.min(...xs) + Math.max(...xs)) / 2, y: (Math.min(...ys) + Math.max(...ys)) / 2 };
  };
  const target = rooms.map((r) => ({ r, c: inside(r) })).sort((a, b) => Math.hypot(a.c.x - centre.x, a.c.y - centre.y) - Math.hypot(b.c.x - centre.x, b.c.y - centre.y))[0]!;
  const from = await planToPage(page, target.c.x, target.c.y);
  await page.mouse.move(from.x, from.y);
  await startRecording(page);
  await page.mouse.down();
  for (let i = 1; i <= 120; i++) await page.mouse.move(from.x + i * 2, from.y + Math.sin(i / 10) * 30);
  await page.mouse.up();
  const drag = await stopRecording(page);
  await page.waitForTimeout(1500);
  // The gesture must have done its job, or its frame times mean nothing.
  await page.locator("[data-testid=save-state][data-state=saved]").waitFor({ timeout: 20_000 });
  const savedPlan = (await (await page.request.get(`${stack.baseUrl}/api/v1/projects/${projectId}/plan`)).json()) as { document: { elements: Record<string, Room> } };
  const movedBy = savedPlan.document.elements[target.r.id]!.outline[0]!.x - target.r.outline[0]!.x;
  if (!(movedBy > 0.5)) throw new Error(`the dragged room did not move (moved ${movedBy} m)`);

  // Pan with two-finger scroll steps, then zoom with wheel steps, around the middle.
  await page.getByRole("button", { name: "Select", exact: true }).click();
  await page.mouse.move(box.x + box.width / 2, box.y + box.height / 2);
  const view = async () => ({ ox: Number(await canvas.getAttribute("data-ox")), oy: Number(await canvas.getAttribute("data-oy")), scale: Number(await canvas.getAttribute("data-scale")) });
  const beforePan = await view();
  await startRecording(page);
  for (let i = 0; i < 120; i++) await page.mouse.wheel(i < 60 ? 12 : -6, 6);
  const pan = await stopRecording(page);
  const afterPan = await view();
  if (afterPan.ox === beforePan.ox && afterPan.oy === beforePan.oy) throw new Error("the view did not pan");
  await startRecording(page);
  for (let i = 0; i < 30; i++) await page.mouse.wheel(0, -100);
  const zoomedIn = await view();
  for (let i = 0; i < 30; i++) await page.mouse.wheel(0, 100);
  const zoom = await stopRecording(page);
  if (!(zoomedIn.scale > afterPan.scale)) throw new Error("the view did not zoom");

  // Typing in the side panel: keystroke to next frame.
  await page.getByRole("tab", { name: "Elements" }).click();
  await page.getByRole("button", { name: /^Select / }).first().click();
  await page.getByRole("tab", { name: "Details" }).click();
  const nameField = page.getByRole("complementary", { name: "Selection and lists" }).getByLabel("Name", { exact: true });
  await nameField.click();
  await startRecording(page);
  await nameField.pressSequentially("Consulting room by the stair", { delay: 30 });
  const typing = await stopRecording(page);

  const rows = [stats("drag a room (120 moves)", drag), stats("pan (120 scroll steps)", pan), stats("zoom (60 wheel steps)", zoom), stats("type in the details panel", typing)];
  const result = {
    suites: [
      {
        suite: "Plan editor frame times (headless Chromium, software rendering)",
        note: `Synthetic building, ${elements} elements on one level (generateSyntheticBuilding, seed 2026). requestAnimationFrame intervals while each gesture runs; target p95 ≤ 20 ms. Opening the plan took ${openMs} ms (median of ${opens.map((o) => o.ms).join(", ")} ms on fresh pages) from navigation to the first frame after drawing, of which the page's main thread was busy ${openBusyMs} ms (median; load average ${loadavg()[0]!.toFixed(1)}); phases of the median run in ms since navigation: ${Object.entries(opens.find((o) => o.ms === openMs)!.phases).map(([k, v]) => `${k} ${v}`).join(", ")}.`,
        rows,
      },
      { suite: "Web bundle sizes per route (gzip)", note: "The entry is loaded on every page; each section adds its own chunks when opened.", rows: bundleRows(fileURLToPath(new URL("packages/web/dist", `file://${ROOT}`))) },
    ],
    openMs,
    openBusyMs,
    opens,
    elements,
  };
  writeFileSync(new URL("../bench-results.json", import.meta.url), `${JSON.stringify(result, null, 2)}\n`);
  console.table(rows);
  console.log(`open: ${openMs} ms (main thread busy ${openBusyMs} ms); elements: ${elements}`);
  console.table(result.suites[1]!.rows);
} finally {
  await browser.close();
  await stack.stop();
}
