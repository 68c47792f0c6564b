import { readFileSync } from "node:fs";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { startMailFake, type MailFake } from "@hushmark/fakes";
import { DEMO_PRICE_BOOK } from "../src/price-book/demo-price-book.js";
import { PASSWORD, uniqueEmail } from "./harness.js";
import { clearRateLimits, client, startServerProcess, type ServerProcess } from "./support/server-process.js";

const demoPlan = JSON.parse(readFileSync(new URL("../../../examples/fernhollow-studio.plan.json", import.meta.url), "utf8")) as Record<string, unknown>;
// Each search step pauses this long in both processes, so a search is still running when the other process cancels it.
const STEP_MS = 150;

const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

describe("option searches across two server processes", () => {
  const procs: ServerProcess[] = [];
  const bases: string[] = [];
  let mail: MailFake;
  const c = client();
  const owner = (base: string, method: string, path: string, body?: unknown) => c.call(base, method, path, body);
  let projectId = "";
  let body: Record<string, unknown> = {};

  beforeAll(async () => {
    await clearRateLimits();
    mail = await startMailFake();
    const env = {
      HUSHMARK_PUBLIC_URL: "http://hushmark.test", HUSHMARK_JWT_SECRET: "a shared secret for both processes, 32+ chars",
      HUSHMARK_SMTP_PORT: String(mail.smtpPort), HUSHMARK_LOG_LEVEL: "silent", HUSHMARK_TEST_SEARCH_STEP_MS: String(STEP_MS),
    };
    procs.push(...(await Promise.all([startServerProcess(env), startServerProcess(env)])));
    bases.push(...procs.map((p) => p.base));
    const a = bases[0]!;
    expect((await owner(a, "POST", "/api/v1/auth/sign-up", { firmName: "Search Firm", displayName: "Rhea", email: uniqueEmail("search2"), password: PASSWORD })).status).toBe(201);
    for (const item of DEMO_PRICE_BOOK) expect((await owner(a, "POST", "/api/v1/price-book/items", item)).status).toBe(201);
    projectId = (await owner(a, "POST", "/api/v1/projects", { title: "Searched from both" })).body.id as string;
    const saved = await owner(a, "PUT", `/api/v1/projects/${projectId}/plan`, { baseVersion: 0, document: demoPlan });
    expect(saved.status).toBe(200);
    body = {
      setup: { planVersion: saved.body.version, source: { kind: "airborne", spaceId: "cafe", spectrum: { kind: "library", id: "speech-raised" } }, receiverId: "record", target: { kind: "nc", nc: 25 } },
      elementIds: ["door-studio", "outlet-party", "supply-duct", "shopfront"],
      limits: { budget: 1500 },
    };
  });
  afterAll(async () => {
    await Promise.all(procs.map((p) => p.kill("SIGTERM")));
    await mail.close();
  });

  it("a search started on one process shows its progress and its result on the other", async () => {
    const [a, b] = bases as [string, string];
    const started = await owner(a, "POST", `/api/v1/projects/${projectId}/option-searches`, body);
    expect(started.status, JSON.stringify(started.body)).toBe(202);
    const seen = new Set<number>();
    let last: { status: string; progress: { done: number }; result: { best: { cost: number } } | null } | null = null;
    for (let i = 0; i < 400; i += 1) {
      const r = await owner(b, "GET", `/api/v1/projects/${projectId}/option-searches/${started.body.id}`);
      expect(r.status).toBe(200);
      last = r.body;
      if (last!.status !== "running") break;
      seen.add(last!.progress.done);
      await sleep(100);
    }
    expect(last?.status).toBe("done");
    // Progress written by process a was read by process b while the search ran.
    expect([...seen].some((d) => d > 0)).toBe(true);
    expect(last!.result!.best.cost).toBeLessThanOrEqual(1500);
  });

  it("a cancel taken by the other process stops the search where it runs and frees its place", async () => {
    const [a, b] = bases as [string, string];
    // Each process runs four searches at once; fill process a.
    const ids: string[] = [];
    for (let i = 0; i < 4; i += 1) {
      const r = await owner(a, "POST", `/api/v1/projects/${projectId}/option-searches`, body);
      expect(r.status, JSON.stringify(r.body)).toBe(202);
      ids.push(r.body.id as string);
    }
    const refused = await owner(a, "POST", `/api/v1/projects/${projectId}/option-searches`, body);
    expect(refused.status).toBe(503);

    const cancelled = await owner(b, "DELETE", `/api/v1/projects/${projectId}/option-searches/${ids[0]}`);
    expect(cancelled.status).toBe(200);
    expect(cancelled.body.status).toBe("cancelled");
    // Process a sees the cancel on its next beat, ends that worker and takes a new search.
    let again = { status: 0, body: null as { id: string } | null };
    for (let i = 0; i < 30 && again.status !== 202; i += 1) {
      await sleep(100);
      again = await owner(a, "POST", `/api/v1/projects/${projectId}/option-searches`, body);
    }
    expect(again.status).toBe(202);
    const onA = await owner(a, "GET", `/api/v1/projects/${projectId}/option-searches/${ids[0]}`);
    expect(onA.body.status).toBe("cancelled");
    expect(onA.body.result).toBeNull();
    for (const id of [...ids.slice(1), again.body!.id]) expect((await owner(b, "DELETE", `/api/v1/projects/${projectId}/option-searches/${id}`)).body.status).toBe("cancelled");
    // A cancel of a finished search changes nothing.
    expect((await owner(a, "DELETE", `/api/v1/projects/${projectId}/option-searches/${ids[0]}`)).body.status).toBe("cancelled");
  });
});
