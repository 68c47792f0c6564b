import { applyAction, parseNetwork, solveNetwork, type Link } from "@hushmark/acoustics";
import { buildNetwork, constructionCatalogue, parsePlan, sourceSpectrum } from "@hushmark/floorplan";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { demoPlan, pricedProject, SETUP, startMoneyHarness, until, type MoneyHarness } from "./money-harness.js";

/** The same inputs straight through the engine: build the network, change the links, solve from scratch. */
function engineDba(changes: (links: Link[]) => Link[]): { before: number; after: number; nc: number; levels: readonly number[] } {
  const parsed = parsePlan(demoPlan);
  if (!parsed.ok) throw new Error("plan");
  const built = buildNetwork(parsed.plan, constructionCatalogue, { sources: [{ type: "airborne", spaceId: "cafe", levelsDb: [...sourceSpectrum("speech-raised")!.levelsDb] }] });
  if (!built.ok) throw new Error("build");
  const net = parseNetwork(built.network);
  if (!net.ok) throw new Error("network");
  const before = solveNetwork(net.value, { receiver: "record", k: 1, gains: 0 });
  const after = solveNetwork({ ...net.value, links: changes(net.value.links) }, { receiver: "record", k: 1, gains: 0 });
  return { before: before.dba, after: after.dba, nc: after.nc.value, levels: after.levelsDb };
}

describe("scenarios, option searches and the price book over the API", () => {
  let h: MoneyHarness;
  let p: Awaited<ReturnType<typeof pricedProject>>;

  beforeAll(async () => {
    h = await startMoneyHarness();
    p = await pricedProject(h);
  });
  afterAll(async () => h.close());

  it("gives a scenario the engine's numbers for the same inputs", async () => {
    const res = await p.planner.post(`/api/v1/projects/${p.projectId}/scenarios`).send({
      name: "Door and duct",
      setup: SETUP(p.planVersion),
      items: [
        { priceBookItemId: p.byCode("door-bottom-auto").id, elementId: "door-studio" },
        { priceBookItemId: p.byCode("door-perimeter-seals").id, elementId: "door-studio" },
        { priceBookItemId: p.byCode("duct-silencer").id, elementId: "supply-duct" },
      ],
    });
    expect(res.status, JSON.stringify(res.body).slice(0, 500)).toBe(201);
    const ev = res.body.evaluation;
    const engine = engineDba((links) =>
      links.map((l) => {
        if (l.id === "duct:supply-duct") return applyAction(l, { kind: "add-duct-attenuation", attenuation_db: 20 });
        if (l.type === "partition" && l.parts.some((x) => x.id === "door-studio:undercut")) {
          const a = applyAction(l, { kind: "seal-leak", part: "door-studio:undercut", remaining_open_area_m2: 0 });
          return applyAction(a, { kind: "seal-leak", part: "door-studio:perimeter", remaining_open_area_m2: 0 });
        }
        return l;
      }),
    );
    expect(ev.before.dba).toBeCloseTo(engine.before, 6);
    expect(ev.after.dba).toBeCloseTo(engine.after, 6);
    expect(ev.after.nc).toBe(engine.nc);
    ev.after.levelsDb.forEach((v: number, b: number) => expect(v).toBeCloseTo(engine.levels[b]!, 6));
    // Costs: automatic door bottom 145 + 70, seal kit 85 + 90, silencer 480 + 320 (the demo price book).
    expect(ev.totals.cost).toBeCloseTo(145 + 70 + 85 + 90 + 480 + 320, 6);
    expect(ev.totals.labourHours).toBeCloseTo(1 + 1.5 + 6, 9);
    expect(ev.cautions.map((c: { text: string }) => c.text).join(" ")).toMatch(/pressure drop/);
    const analysis = await p.planner.post(`/api/v1/projects/${p.projectId}/analyses`).send(SETUP(p.planVersion));
    expect(analysis.body.receiver.dba).toBeCloseTo(ev.before.dba, 6);
  });

  it("refuses an upgrade on an element it does not suit, saying why", async () => {
    const res = await p.planner.post(`/api/v1/projects/${p.projectId}/scenarios`).send({
      name: "Wrong", setup: SETUP(p.planVersion), items: [{ priceBookItemId: p.byCode("duct-silencer").id, elementId: "door-studio" }],
    });
    expect(res.status).toBe(400);
    expect(res.body.error.message).toMatch(/applies to a vent or duct, not to a door/);
  });

  it("runs best within limits in the background with progress, and cancels a search", async () => {
    const body = { setup: SETUP(p.planVersion), elementIds: ["door-studio", "outlet-party", "supply-duct", "shopfront"], limits: { budget: 1500, allowedFlags: ["changes-appearance"] } };
    const started = await p.planner.post(`/api/v1/projects/${p.projectId}/option-searches`).send(body);
    expect(started.status, JSON.stringify(started.body)).toBe(202);
    const done = await until("the search", async () => {
      const r = await p.planner.get(`/api/v1/projects/${p.projectId}/option-searches/${started.body.id}`);
      return r.body.status === "running" ? undefined : r.body;
    });
    expect(done.status).toBe("done");
    expect(done.result.best.cost).toBeLessThanOrEqual(1500);
    expect(done.result.ranking.length).toBeGreaterThan(3);
    expect(done.result.best.excluded.some((e: { reason: string }) => /flag not allowed: reduces-ventilation/.test(e.reason))).toBe(true);

    const second = await p.planner.post(`/api/v1/projects/${p.projectId}/option-searches`).send(body);
    const cancelled = await p.planner.delete(`/api/v1/projects/${p.projectId}/option-searches/${second.body.id}`);
    expect(["cancelled", "done"]).toContain(cancelled.body.status);
    const other = await p.client.agent.get(`/api/v1/projects/${p.projectId}/option-searches/${second.body.id}`);
    expect(other.status).toBe(403);
  });

  it("works to the brief's budget and accepted flags when the search sets none", async () => {
    const brief = await p.owner.get(`/api/v1/projects/${p.projectId}/brief`);
    const saved = await p.owner.put(`/api/v1/projects/${p.projectId}/brief`).send({ baseVersion: brief.body.version, brief: { budget: { amount: 400, currency: "EUR" }, accepts: { doorLook: true } } });
    expect(saved.status, JSON.stringify(saved.body)).toBe(200);
    const started = await p.planner.post(`/api/v1/projects/${p.projectId}/option-searches`).send({ setup: SETUP(p.planVersion), elementIds: ["door-studio", "outlet-party", "supply-duct", "shopfront"] });
    expect(started.status).toBe(202);
    const done = await until("the search", async () => {
      const r = await p.planner.get(`/api/v1/projects/${p.projectId}/option-searches/${started.body.id}`);
      return r.body.status === "running" ? undefined : r.body;
    });
    expect(done.status).toBe("done");
    expect(done.result.best.cost).toBeLessThanOrEqual(400);
    expect(done.result.best.excluded.some((e: { reason: string }) => /flag not allowed: reduces-ventilation/.test(e.reason))).toBe(true);
  });

  it("exports the price book as CSV and imports it back, all or nothing", async () => {
    const csv = await p.owner.get("/api/v1/price-book/export.csv");
    expect(csv.headers["content-type"]).toMatch(/text\/csv/);
    expect(csv.text.split("\n")[0]).toMatch(/^code,name,family,applies_to,effect/);
    const edited = csv.text.replace(/^door-bottom-auto,Automatic door bottom,/m, "door-bottom-auto,Automatic door bottom (heavy duty),");
    const imported = await p.owner.post("/api/v1/price-book/import").send({ csv: edited });
    expect(imported.body).toEqual({ added: 0, updated: p.items.length, removed: 0 });
    const book = await p.planner.get("/api/v1/price-book");
    expect(book.body.items.find((i: { code: string }) => i.code === "door-bottom-auto").name).toBe("Automatic door bottom (heavy duty)");
    const bad = await p.owner.post("/api/v1/price-book/import").send({ csv: `${edited}new-thing,New,mass,wall,added-layer,-4,,0,0,0,0,0,0,1,0,,,yes\n` });
    expect(bad.status).toBe(400);
    expect(bad.body.error.details[0]).toMatchObject({ row: p.items.length + 2, column: "effect_value" });
    expect((await p.planner.get("/api/v1/price-book")).body.items).toHaveLength(p.items.length);
  });

  it("lets the owner edit the price book and not the planner", async () => {
    const item = p.byCode("gypsum-layer");
    expect((await p.planner.patch(`/api/v1/price-book/items/${item.id}`).send({ costs: { ...item.costs, perM2Materials: 1 } })).status).toBe(403);
    expect((await p.planner.post("/api/v1/price-book/items").send({ ...item, code: "planner-made" })).status).toBe(403);
    const ok = await p.owner.patch(`/api/v1/price-book/items/${item.id}`).send({ costs: { ...item.costs, perM2Materials: 15.5 } });
    expect(ok.status).toBe(200);
    expect(ok.body.costs.perM2Materials).toBe(15.5);
    const bad = await p.owner.patch(`/api/v1/price-book/items/${item.id}`).send({ labourHours: -2 });
    expect(bad.status).toBe(400);
    expect(bad.body.error.details[0].message).toMatch(/Labour cannot be negative/);
  });
});
