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

  it("accepts a save from the current version and keeps it as a revision", async () => {
    const saved = await surveyor.put(`/api/v1/projects/${projectId}/plan`).send({ baseVersion: 0, document: { rooms: ["a"] } });
    expect(saved.status).toBe(200);
    expect(saved.body.version).toBe(1);
    const revisions = await owner.get(`/api/v1/projects/${projectId}/plan/revisions`);
    expect(revisions.body.revisions.map((r: { version: number }) => r.version)).toEqual([1]);
    const rev = await owner.get(`/api/v1/projects/${projectId}/plan/revisions/1`);
    expect(rev.body.document).toEqual({ rooms: ["a"] });
  });

  it("answers 409 to a stale save and leaves the stored plan unchanged", async () => {
    const before = await owner.get(`/api/v1/projects/${projectId}/plan`);
    const stale = await owner.put(`/api/v1/projects/${projectId}/plan`).send({ baseVersion: before.body.version - 1, document: { rooms: ["overwritten"] } });
    expect(stale.status).toBe(409);
    expect(stale.body.error.code).toBe("version_conflict");
    expect(stale.body.error.details.currentVersion).toBe(before.body.version);
    const after = await owner.get(`/api/v1/projects/${projectId}/plan`);
    expect(after.body).toEqual(before.body);
  });

  it("lets exactly one of several saves from the same version win", async () => {
    const base = (await owner.get(`/api/v1/projects/${projectId}/plan`)).body.version as number;
    const results = await Promise.all(
      Array.from({ length: 8 }, (_, i) => surveyor.put(`/api/v1/projects/${projectId}/plan`).send({ baseVersion: base, document: { writer: i } })),
    );
    const accepted = results.filter((r) => r.status === 200);
    expect(accepted).toHaveLength(1);
    expect(results.filter((r) => r.status === 409)).toHaveLength(7);
    const stored = await owner.get(`/api/v1/projects/${projectId}/plan`);
    expect(stored.body.document).toEqual(accepted[0]!.body.document);
    const revisions = await owner.get(`/api/v1/projects/${projectId}/plan/revisions`);
    expect(revisions.body.revisions[0].version).toBe(base + 1);
  });
});
