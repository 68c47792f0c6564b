import { readFile } from "node:fs/promises";
import type supertest from "supertest";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { addMember, newFirm, startHarness, type Harness } from "./harness.js";

describe("versioned plan saves", () => {
  let h: Harness;
  let owner: supertest.Agent;
  let surveyor: supertest.Agent;
  let projectId: string;

  beforeAll(async () => {
    h = await startHarness();
    owner = (await newFirm(h)).agent;
    surveyor = (await addMember(h, owner, "surveyor")).agent;
    projectId = (await surveyor.post("/api/v1/projects").send({ title: "Two rooms" })).body.id;
  });
  afterAll(async () => h.close());

  /** The project's starting plan, renamed: a valid document that differs from the stored one. */
  async function planNamed(name: string): Promise<Record<string, unknown>> {
    const current = await owner.get(`/api/v1/projects/${projectId}/plan`);
    return { ...current.body.document, name };
  }

  it("starts every project with a valid, empty plan at version 0", async () => {
    const plan = await owner.get(`/api/v1/projects/${projectId}/plan`);
    expect(plan.body.version).toBe(0);
    expect(plan.body.document).toMatchObject({ format: "hushmark-plan", name: "Two rooms" });
  });

  it("accepts a save from the current version and keeps it as a revision", async () => {
    const document = await planNamed("First save");
    const saved = await surveyor.put(`/api/v1/projects/${projectId}/plan`).send({ baseVersion: 0, document });
    expect(saved.status).toBe(200);
    expect(saved.body.version).toBe(1);
    const revisions = await owner.get(`/api/v1/projects/${projectId}/plan/revisions`);
    expect(revisions.body.revisions.map((r: { version: number }) => r.version)).toEqual([1]);
    const rev = await owner.get(`/api/v1/projects/${projectId}/plan/revisions/1`);
    expect(rev.body.document).toEqual(document);
  });

  it("answers 409 to a stale save and leaves the stored plan unchanged", async () => {
    const before = await owner.get(`/api/v1/projects/${projectId}/plan`);
    const stale = await owner.put(`/api/v1/projects/${projectId}/plan`).send({ baseVersion: before.body.version - 1, document: await planNamed("Overwritten") });
    expect(stale.status).toBe(409);
    expect(stale.body.error.code).toBe("version_conflict");
    expect(stale.body.error.details.currentVersion).toBe(before.body.version);
    const after = await owner.get(`/api/v1/projects/${projectId}/plan`);
    expect(after.body).toEqual(before.body);
  });

  it("lets exactly one of several saves from the same version win", async () => {
    const base = (await owner.get(`/api/v1/projects/${projectId}/plan`)).body.version as number;
    const documents = await Promise.all(Array.from({ length: 8 }, (_, i) => planNamed(`Writer ${i}`)));
    const results = await Promise.all(documents.map((document) => surveyor.put(`/api/v1/projects/${projectId}/plan`).send({ baseVersion: base, document })));
    const accepted = results.filter((r) => r.status === 200);
    expect(accepted).toHaveLength(1);
    expect(results.filter((r) => r.status === 409)).toHaveLength(7);
    const stored = await owner.get(`/api/v1/projects/${projectId}/plan`);
    expect(stored.body.document).toEqual(accepted[0]!.body.document);
    const revisions = await owner.get(`/api/v1/projects/${projectId}/plan/revisions`);
    expect(revisions.body.revisions[0].version).toBe(base + 1);
  });

  it("sends a large plan gzip-compressed to a client that accepts it, unchanged once unpacked", async () => {
    const demo = JSON.parse(await readFile(new URL("../../../examples/fernhollow-studio.plan.json", import.meta.url), "utf8"));
    const base = (await owner.get(`/api/v1/projects/${projectId}/plan`)).body.version as number;
    const saved = await surveyor.put(`/api/v1/projects/${projectId}/plan`).send({ baseVersion: base, document: demo });
    expect(saved.status, JSON.stringify(saved.body)).toBe(200);
    const zipped = await owner.get(`/api/v1/projects/${projectId}/plan`).set("accept-encoding", "gzip");
    expect(zipped.headers["content-encoding"]).toBe("gzip");
    const plain = await owner.get(`/api/v1/projects/${projectId}/plan`).set("accept-encoding", "identity");
    expect(plain.headers["content-encoding"]).toBeUndefined();
    expect(zipped.body).toEqual(plain.body);
    expect(plain.body.document.elements.length).toBe(demo.elements.length);
  });
});
