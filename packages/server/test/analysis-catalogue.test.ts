// The firm catalogue that analyses are keyed by is kept in memory per process, keyed by the
// firm's constructions_version in PostgreSQL. A second service instance stands for a second
// server process: its own memory, the same database.
import { readFileSync } from "node:fs";
import type supertest from "supertest";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Actor } from "../src/auth/actor.js";
import { computeAnalysisWith } from "../src/analyses/compute.js";
import { createCatalogueService } from "../src/catalogue/catalogue.service.js";
import { newFirm, startHarness, type Harness } from "./harness.js";

const demoPlan = JSON.parse(readFileSync(new URL("../../../examples/fernhollow-studio.plan.json", import.meta.url), "utf8")) as { defaults: Record<string, unknown>; wallSettings: Record<string, Record<string, unknown>> };
const BANDS = [50, 63, 80, 100, 125, 160, 200, 250, 315, 400, 500, 630, 800, 1000, 1250, 1600, 2000, 2500, 3150, 4000, 5000];
/** A flat lab curve at `db` over 100–5000 Hz (invented lab data). */
const flatCsv = (db: number) => ["frequency_hz,tl_db", ...BANDS.slice(3).map((f) => `${f},${db}`)].join("\n");
const wall = (db: number) => ({ id: "lab-party-wall", name: "Party wall (lab report 31-002)", category: "wall" as const, thicknessMm: 200, surfaceDensityKgM2: 40, sourceNote: "Lab report 31-002", csv: flatCsv(db) });

describe("the firm catalogue behind analyses, across processes", () => {
  let h: Harness;
  let owner: supertest.Agent;
  let actor: Actor;
  let projectId: string;
  let version: number;
  // The lab wall as the café–recording-room party wall and every other interior wall.
  const party = "cafe:cafe4|record:record2";
  const plan = { ...demoPlan, defaults: { ...demoPlan.defaults, interiorWallConstructionId: "lab-party-wall" }, wallSettings: { ...demoPlan.wallSettings, [party]: { ...demoPlan.wallSettings[party], constructionId: "lab-party-wall" } } };

  beforeAll(async () => {
    h = await startHarness();
    const firm = await newFirm(h);
    owner = firm.agent;
    const org = firm.me.membership.organizationId;
    const [m] = await h.dataSource.query("SELECT id FROM memberships WHERE organization_id = $1 AND user_id = $2", [org, firm.me.user.id]);
    actor = { userId: firm.me.user.id, email: firm.email, displayName: "Owner Person", membershipId: m.id, organizationId: org, organizationName: "Test Firm", role: "owner", sessionId: "test" };
    projectId = (await owner.post("/api/v1/projects").send({ title: "Party wall" })).body.id;
    expect((await owner.post("/api/v1/catalogue/constructions").send(wall(55))).status).toBe(201);
    const saved = await owner.put(`/api/v1/projects/${projectId}/plan`).send({ baseVersion: 0, document: plan });
    expect(saved.status, JSON.stringify(saved.body).slice(0, 300)).toBe(200);
    version = saved.body.version;
  });
  afterAll(async () => h.close());

  const analyse = async () => {
    const res = await owner.post(`/api/v1/projects/${projectId}/analyses`).send({ planVersion: version, source: { kind: "airborne", spaceId: "cafe", spectrum: { kind: "library", id: "speech-raised" } }, receiverId: "record" });
    expect(res.status, JSON.stringify(res.body).slice(0, 300)).toBe(200);
    return res.body as { cached: boolean; receiver: { dba: number } };
  };

  it("serves one firm's catalogue from memory until its constructions change", async () => {
    const other = createCatalogueService(h.dataSource);
    const first = await other.catalogueFor(actor.organizationId);
    expect(first.extra.map((c) => c.id)).toEqual(["lab-party-wall"]);
    expect(await other.catalogueFor(actor.organizationId)).toBe(first);
    expect((await owner.delete("/api/v1/catalogue/constructions/lab-party-wall")).status).toBe(204);
    const after = await other.catalogueFor(actor.organizationId);
    expect(after.extra).toEqual([]);
    expect(after.digest).not.toBe(first.digest);
    await other.add(actor, wall(55));
  });

  it("does not serve an analysis cached for constructions another process has since changed", async () => {
    const before = await analyse();
    expect((await analyse()).cached).toBe(true);
    // The other process swaps the party wall for a far weaker one: the same id, new lab data.
    const other = createCatalogueService(h.dataSource);
    await other.remove(actor, "lab-party-wall");
    await other.add(actor, wall(10));
    const after = await analyse();
    expect(after.cached).toBe(false);
    // The answer is the one a fresh computation with the new lab data gives, not the old one.
    const fresh = computeAnalysisWith(plan, { planVersion: version, source: { kind: "airborne", spaceId: "cafe", spectrum: { kind: "library", id: "speech-raised" } }, receiverId: "record", paths: 5 }, (await other.catalogueFor(actor.organizationId)).extra);
    if (!fresh.ok) throw new Error(fresh.message);
    expect(after.receiver.dba).toBeCloseTo(fresh.result.receiver.dba, 9);
    expect(after.receiver.dba).toBeGreaterThan(before.receiver.dba + 3);
  });
});
