import "reflect-metadata";
import supertest from "supertest";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Harness } from "./harness.js";
import { pricedProject, SETUP, until } from "./money-harness.js";
import { startProcessFixture, startServerProcess, type ServerProcess } from "./support/server-process.js";

const JOBS_SCHEMA = `pgboss_roles_${process.pid}`;

/**
 * Scaling out: an API process that only queues background jobs, and a separate worker process
 * that works them, on one database and one object store. The API process leaves a job alone;
 * the worker renders it, and the API process serves the result.
 */
describe("an API process beside a separate worker process", () => {
  let fixture: Awaited<ReturnType<typeof startProcessFixture>>;
  let api: ServerProcess;
  let worker: ServerProcess | undefined;

  beforeAll(async () => {
    fixture = await startProcessFixture(JOBS_SCHEMA, "process-role");
    api = await startServerProcess({ ...fixture.env, HUSHMARK_ROLE: "api" });
  }, 60_000);
  afterAll(async () => {
    await worker?.kill("SIGTERM");
    await api?.kill("SIGTERM");
    await fixture?.close();
  }, 60_000);

  it("queues a proposal's PDF on the API process, which the worker process renders", async () => {
    const { dataSource, mail, env } = fixture;
    const h: Harness = { dataSource, mail, request: () => supertest.agent(api.base), close: async () => undefined };
    const p = await pricedProject(h);
    const scenario = await p.planner.post(`/api/v1/projects/${p.projectId}/scenarios`).send({ name: "Seal the studio door", setup: SETUP(p.planVersion), items: [{ priceBookItemId: p.byCode("door-bottom-auto").id, elementId: "door-studio" }] });
    expect(scenario.status, JSON.stringify(scenario.body).slice(0, 300)).toBe(201);
    const created = await p.planner.post(`/api/v1/projects/${p.projectId}/proposals`).send({ scenarioId: scenario.body.id });
    expect(created.status).toBe(201);
    const jobState = async () => {
      const rows: { state: string }[] = await dataSource.query(`SELECT state FROM ${JOBS_SCHEMA}.job WHERE name = 'proposal-pdf' AND data->>'proposalId' = $1`, [created.body.id]);
      return rows[0]?.state;
    };
    // With no worker running, the job waits: the API process only queued it (a process that
    // worked jobs polls every 0.5 s and would have taken it).
    expect(await until("the queued job", async () => (await jobState()) ?? undefined, 10_000)).toBe("created");
    await new Promise((r) => setTimeout(r, 2500));
    expect(await jobState()).toBe("created");
    expect((await p.planner.get(`/api/v1/proposals/${created.body.id}/versions/1/pdf`)).status).toBe(409);

    worker = await startServerProcess({ ...env, HUSHMARK_ROLE: "worker" });
    const pdf = await until("the PDF from the worker", async () => {
      const r = await p.planner.get(`/api/v1/proposals/${created.body.id}/versions/1/pdf`).buffer(true);
      return r.status === 200 ? r : undefined;
    }, 30_000);
    expect(pdf.headers["content-type"]).toMatch(/^application\/pdf/);
    expect(await jobState()).toBe("completed");
  }, 90_000);

  it("answers only its health on the worker's port", async () => {
    expect(worker).toBeDefined();
    const health = await fetch(`${worker!.base}/api/v1/health`);
    expect(health.status).toBe(200);
    const other = await fetch(`${worker!.base}/api/v1/projects`);
    expect(other.status).toBe(404);
    expect(((await other.json()) as { error: { message: string } }).error.message).toMatch(/background jobs only/);
  });

  it("refuses an unknown role with a message naming the choices", async () => {
    await expect(startServerProcess({ ...fixture.env, HUSHMARK_ROLE: "everything" })).rejects.toThrow(/HUSHMARK_ROLE is all \(the default\), api or worker/);
  });
});
