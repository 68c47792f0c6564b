import pg from "pg";
import type supertest from "supertest";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { newFirm, startHarness, type Harness } from "./harness.js";

async function waitUntil(check: () => Promise<boolean>, timeoutMs: number): Promise<number> {
  const started = Date.now();
  while (Date.now() - started < timeoutMs) {
    if (await check()) return Date.now() - started;
    await new Promise((r) => setTimeout(r, 50));
  }
  throw new Error(`not recovered within ${timeoutMs} ms`);
}

describe("database faults", () => {
  let h: Harness;
  let owner: supertest.Agent;
  let projectId: string;

  beforeAll(async () => {
    h = await startHarness();
    owner = (await newFirm(h)).agent;
    projectId = (await owner.post("/api/v1/projects").send({ title: "Fault lines" })).body.id;
  });
  afterAll(async () => h.close());

  const plan = async () => (await owner.get(`/api/v1/projects/${projectId}/plan`)).body as { version: number; document: Record<string, unknown> };
  const revisionCount = async () => Number((await h.dataSource.query("SELECT count(*)::int AS n FROM plan_revisions WHERE project_id = $1", [projectId]))[0].n);

  it("a connection killed in the middle of a save writes nothing half-way, answers 503, and the next save works", async () => {
    const before = await plan();
    // Hold the plan row from another connection so the save blocks inside its transaction.
    const holder = new pg.Client({ connectionString: process.env.DATABASE_URL });
    await holder.connect();
    await holder.query("BEGIN");
    await holder.query("SELECT 1 FROM plans WHERE project_id = $1 FOR UPDATE", [projectId]);
    const saving = owner.put(`/api/v1/projects/${projectId}/plan`).send({ baseVersion: before.version, document: { ...before.document, name: "Never stored" } }).then((r) => r);
    // Watch from a third connection: inside the holder's transaction pg_stat_activity would be a frozen snapshot.
    const watcher = new pg.Client({ connectionString: process.env.DATABASE_URL });
    await watcher.connect();
    let pid = 0;
    await waitUntil(async () => {
      const rows = await watcher.query("SELECT pid, query FROM pg_stat_activity WHERE pid <> pg_backend_pid() AND wait_event_type = 'Lock'");
      pid = rows.rows.find((r) => String(r.query).startsWith("UPDATE plans SET document"))?.pid ?? 0;
      return pid > 0;
    }, 5000);
    await watcher.query("SELECT pg_terminate_backend($1)", [pid]);
    await watcher.end();
    await holder.query("ROLLBACK");
    await holder.end();
    const res = await saving;
    expect(res.status).toBe(503);
    expect(res.body.error.message).toMatch(/nothing was saved/);
    const after = await plan();
    expect(after.version).toBe(before.version);
    expect(after.document.name).toBe(before.document.name);
    expect(await revisionCount()).toBe(before.version);
    const retry = await owner.put(`/api/v1/projects/${projectId}/plan`).send({ baseVersion: before.version, document: { ...before.document, name: "Stored" } });
    expect(retry.status).toBe(200);
    expect(await revisionCount()).toBe(before.version + 1);
  });

  it("answers again within seconds after every database connection is cut", async () => {
    const admin = new pg.Client({ connectionString: process.env.DATABASE_URL });
    await admin.connect();
    await admin.query("SELECT pg_terminate_backend(pid) FROM pg_stat_activity WHERE datname = current_database() AND pid <> pg_backend_pid()");
    await admin.end();
    const ms = await waitUntil(async () => (await owner.get(`/api/v1/projects/${projectId}`)).status === 200, 10_000);
    expect(ms).toBeLessThan(10_000);
    expect((await h.request().get("/api/v1/health")).status).toBe(200);
  });
});
