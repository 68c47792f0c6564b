import { readFileSync } from "node:fs";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { constructionCatalogue } from "@hushmark/floorplan";
import type { PriceBookItem } from "@hushmark/schemas";
import { OptionSearchRow } from "../src/scenarios/option-search.entity.js";
import { createSearchRegistry } from "../src/scenarios/search-registry.js";
import { DEMO_PRICE_BOOK } from "../src/price-book/demo-price-book.js";
import { newFirm, startHarness, type Harness } from "./harness.js";

const demoPlan = JSON.parse(readFileSync(new URL("../../../examples/fernhollow-studio.plan.json", import.meta.url), "utf8")) as Record<string, unknown>;
const until = async (probe: () => Promise<boolean>, what: string) => {
  for (let i = 0; i < 200; i += 1) {
    if (await probe()) return;
    await new Promise((r) => setTimeout(r, 50));
  }
  throw new Error(`timed out waiting for ${what}`);
};

describe("option searches kept in PostgreSQL", () => {
  let h: Harness;
  let organizationId: string;
  let projectId: string;
  let items: PriceBookItem[];

  beforeAll(async () => {
    h = await startHarness();
    const { agent, me } = await newFirm(h, "Registry Firm");
    organizationId = me.membership.organizationId;
    projectId = (await agent.post("/api/v1/projects").send({ title: "Searched" })).body.id;
    items = [];
    for (const item of DEMO_PRICE_BOOK.slice(0, 6)) items.push((await agent.post("/api/v1/price-book/items").send(item)).body as PriceBookItem);
  });
  afterAll(async () => h.close());

  const task = () => ({
    document: demoPlan,
    setup: { planVersion: 1, source: { kind: "airborne" as const, spaceId: "cafe", spectrum: { kind: "library" as const, id: "speech-raised" } }, receiverId: "record" },
    elementIds: ["door-studio", "outlet-party"],
    items,
    limits: {},
    catalogue: constructionCatalogue,
  });

  it("answers a running search whose process stopped beating as failed, and leaves a fresh one running", async () => {
    const registry = createSearchRegistry(h.dataSource, { staleMs: 5_000 });
    const repo = h.dataSource.getRepository(OptionSearchRow);
    const base = { organizationId, projectId, status: "running" as const, progress: { phase: "singles", done: 1, total: 4 }, error: null, result: null, createdById: null };
    await repo.insert({ ...base, id: "00000000-0000-4000-8000-000000000001", heartbeatAt: new Date(Date.now() - 60_000) });
    await repo.insert({ ...base, id: "00000000-0000-4000-8000-000000000002", heartbeatAt: new Date() });
    const stale = await registry.get(organizationId, projectId, "00000000-0000-4000-8000-000000000001");
    expect(stale).toMatchObject({ status: "failed", error: "The server running this search stopped; start the search again." });
    expect((await registry.get(organizationId, projectId, "00000000-0000-4000-8000-000000000002"))?.status).toBe("running");
    // Another firm, or another project, does not find it.
    expect(await registry.get("00000000-0000-4000-8000-00000000000f", projectId, "00000000-0000-4000-8000-000000000002")).toBeNull();
    expect(await registry.cancel(organizationId, "00000000-0000-4000-8000-00000000000f", "00000000-0000-4000-8000-000000000002")).toBeNull();
  });

  it("writes progress while it runs, and on shutdown leaves its searches failed rather than running for ever", async () => {
    const registry = createSearchRegistry(h.dataSource, { beatMs: 50, stepDelayMs: 150 });
    const started = await registry.start(organizationId, projectId, null, task());
    expect(started?.status).toBe("running");
    await until(async () => ((await registry.get(organizationId, projectId, started!.id))?.progress.done ?? 0) > 0, "progress in the row");
    expect(registry.running()).toBe(1);
    await registry.close();
    expect(registry.running()).toBe(0);
    expect(await registry.get(organizationId, projectId, started!.id)).toMatchObject({ status: "failed", result: null, error: "The server stopped during the search; start the search again." });
  });

  it("finishes with its result in the row; a cancel after that changes nothing", async () => {
    const registry = createSearchRegistry(h.dataSource, { beatMs: 50 });
    const started = await registry.start(organizationId, projectId, null, task());
    await until(async () => (await registry.get(organizationId, projectId, started!.id))?.status !== "running", "the end of the search");
    const done = await registry.get(organizationId, projectId, started!.id);
    expect(done?.status).toBe("done");
    expect(done?.result?.ranking.length).toBeGreaterThan(0);
    expect((await registry.cancel(organizationId, projectId, started!.id))?.status).toBe("done");
    await registry.close();
  });
});
