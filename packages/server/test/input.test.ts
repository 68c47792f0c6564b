import type supertest from "supertest";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { newFirm, startHarness, type Harness } from "./harness.js";

/** Bad input on every route with a body or parameters: 400 with the field paths, never 500. */
describe("bad input", () => {
  let h: Harness;
  let owner: supertest.Agent;
  let projectId: string;

  beforeAll(async () => {
    h = await startHarness();
    owner = (await newFirm(h)).agent;
    projectId = (await owner.post("/api/v1/projects").send({ title: "Input checks" })).body.id;
  });
  afterAll(async () => h.close());

  const cases: [string, string, (id: string) => string, unknown, string[]][] = [
    ["sign-up", "post", () => "/api/v1/auth/sign-up", { firmName: "", email: "nope", password: "short" }, ["firmName", "displayName", "email", "password"]],
    ["sign-in", "post", () => "/api/v1/auth/sign-in", { email: 42 }, ["email", "password"]],
    ["switch firm", "post", () => "/api/v1/auth/switch-firm", { organizationId: "x" }, ["organizationId"]],
    ["password change", "post", () => "/api/v1/auth/password", { newPassword: "x" }, ["currentPassword", "newPassword"]],
    ["reset request", "post", () => "/api/v1/auth/password-reset/request", {}, ["email"]],
    ["reset", "post", () => "/api/v1/auth/password-reset", { token: "abc" }, ["token", "password"]],
    ["accept", "post", () => "/api/v1/invitations/accept", { token: 5 }, ["token", "password"]],
    ["invitation preview", "get", () => "/api/v1/invitations/short", undefined, ["token"]],
    ["invite", "post", () => "/api/v1/people/invitations", { email: "x", role: "boss" }, ["email", "role"]],
    ["revoke invite", "delete", () => "/api/v1/people/invitations/not-a-uuid", undefined, ["id"]],
    ["change role", "patch", () => "/api/v1/people/members/not-a-uuid", { role: "boss" }, ["id"]],
    ["remove member", "delete", () => "/api/v1/people/members/not-a-uuid", undefined, ["id"]],
    ["create project", "post", () => "/api/v1/projects", { title: "", status: "done" }, ["title", "status"]],
    ["get project", "get", () => "/api/v1/projects/nope", undefined, ["projectId"]],
    ["update project", "patch", (id) => `/api/v1/projects/${id}`, { title: 3 }, ["title"]],
    ["update project site", "patch", (id) => `/api/v1/projects/${id}`, { site: { latDeg: 91, lonDeg: "east", planNorthBearingDeg: 360 } }, ["site.latDeg", "site.lonDeg", "site.planNorthBearingDeg"]],
    ["add client", "post", (id) => `/api/v1/projects/${id}/clients`, { membershipId: "x" }, ["membershipId"]],
    ["remove client", "delete", (id) => `/api/v1/projects/${id}/clients/x`, undefined, ["membershipId"]],
    ["get plan", "get", () => "/api/v1/projects/nope/plan", undefined, ["projectId"]],
    ["save plan", "put", (id) => `/api/v1/projects/${id}/plan`, { baseVersion: -1, document: [] }, ["baseVersion", "document"]],
    ["revisions", "get", () => "/api/v1/projects/nope/plan/revisions", undefined, ["projectId"]],
    ["revision", "get", (id) => `/api/v1/projects/${id}/plan/revisions/abc`, undefined, ["version"]],
    ["analysis", "post", (id) => `/api/v1/projects/${id}/analyses`, { planVersion: "x", source: { kind: "airborne" }, receiverId: "" }, ["planVersion", "source.spaceId", "source.spectrum", "receiverId"]],
    ["analysis drawing", "post", (id) => `/api/v1/projects/${id}/analyses/drawing`, { planVersion: "x", source: { kind: "airborne" }, receiverId: "" }, ["planVersion", "source.spaceId", "source.spectrum", "receiverId"]],
    ["construction preview", "post", () => "/api/v1/catalogue/constructions/preview", { id: "X", category: "roof", thicknessMm: -1 }, ["id", "name", "category", "thicknessMm", "csv"]],
    ["add construction", "post", () => "/api/v1/catalogue/constructions", { id: "ok-id", name: "Fine name", category: "wall", thicknessMm: 100, surfaceDensityKgM2: 20 }, ["sourceNote", "csv"]],
    ["remove construction", "delete", () => "/api/v1/catalogue/constructions/BAD_ID", undefined, ["constructionId"]],
    ["audit", "get", () => "/api/v1/audit?limit=0", undefined, ["limit"]],
    ["get brief", "get", () => "/api/v1/projects/nope/brief", undefined, ["projectId"]],
    ["save brief", "put", (id) => `/api/v1/projects/${id}/brief`, { baseVersion: -1, brief: { noises: [{ kind: "loud" }], target: { kind: "nc", nc: 5 } } }, ["baseVersion", "brief.noises.0.kind", "brief.noises.0.direction", "brief.target.nc"]],
    ["list measurements", "get", () => "/api/v1/projects/nope/measurements", undefined, ["projectId"]],
    ["add measurement", "post", (id) => `/api/v1/projects/${id}/measurements`, { label: "", kind: "loud", takenAt: "yesterday", leqDb: [1, 2] }, ["label", "kind", "takenAt", "leqDb"]],
    ["preview spectrum file", "post", (id) => `/api/v1/projects/${id}/measurements/csv-preview`, { text: "" }, ["text"]],
    ["get measurement", "get", (id) => `/api/v1/projects/${id}/measurements/nope`, undefined, ["measurementId"]],
    ["edit measurement", "patch", (id) => `/api/v1/projects/${id}/measurements/00000000-0000-4000-8000-000000000000`, { calibrationDb: "x", kind: "loud" }, ["calibrationDb", "kind"]],
    ["delete measurement", "delete", (id) => `/api/v1/projects/${id}/measurements/nope`, undefined, ["measurementId"]],
    ["export measurement", "get", (id) => `/api/v1/projects/${id}/measurements/nope/csv`, undefined, ["measurementId"]],
    ["play back", "get", (id) => `/api/v1/projects/${id}/measurements/00000000-0000-4000-8000-000000000000/audio?startS=-1&durationS=0`, undefined, ["startS", "durationS"]],
    ["upload recording", "post", (id) => `/api/v1/projects/${id}/recordings`, { label: "x" }, ["file"]],
    ["list photos", "get", () => "/api/v1/projects/nope/photos", undefined, ["projectId"]],
    ["upload photo", "post", (id) => `/api/v1/projects/${id}/photos`, {}, ["file"]],
    ["photo image", "get", (id) => `/api/v1/projects/${id}/photos/00000000-0000-4000-8000-000000000000/image?size=huge`, undefined, ["size"]],
    ["delete photo", "delete", (id) => `/api/v1/projects/${id}/photos/nope`, undefined, ["photoId"]],
    ["list underlays", "get", () => "/api/v1/projects/nope/underlays", undefined, ["projectId"]],
    ["upload underlay", "post", (id) => `/api/v1/projects/${id}/underlays`, {}, ["file"]],
    ["underlay image", "get", (id) => `/api/v1/projects/${id}/underlays/nope/image`, undefined, ["underlayId"]],
    ["delete underlay", "delete", (id) => `/api/v1/projects/${id}/underlays/nope`, undefined, ["underlayId"]],
    ["add price book item", "post", () => "/api/v1/price-book/items", { code: "X", family: "loud", appliesTo: [], effect: { kind: "added-layer", deltaTlDb: -1 } }, ["code", "name", "family", "appliesTo", "effect.deltaTlDb"]],
    ["edit price book item", "patch", () => "/api/v1/price-book/items/nope", { labourHours: -1 }, ["itemId"]],
    ["remove price book item", "delete", () => "/api/v1/price-book/items/nope", undefined, ["itemId"]],
    ["import price book", "post", () => "/api/v1/price-book/import", { csv: "", mode: "wipe" }, ["csv", "mode"]],
    ["firm settings", "put", () => "/api/v1/firm/settings", { currency: "dollars", taxRatePercent: -1, depositPercent: 200, validityDays: 0 }, ["currency", "taxRatePercent", "depositPercent", "validityDays", "terms"]],
    ["create scenario", "post", (id) => `/api/v1/projects/${id}/scenarios`, { name: "", setup: { planVersion: -1 }, items: [{ priceBookItemId: "x", elementId: "" }] }, ["name", "setup.planVersion", "setup.source", "setup.receiverId", "items.0.priceBookItemId", "items.0.elementId"]],
    ["get scenario", "get", (id) => `/api/v1/projects/${id}/scenarios/nope`, undefined, ["scenarioId"]],
    ["start option search", "post", (id) => `/api/v1/projects/${id}/option-searches`, { elementIds: [], limits: { budget: -5 } }, ["setup", "elementIds", "limits.budget"]],
    ["option search", "get", (id) => `/api/v1/projects/${id}/option-searches/nope`, undefined, ["searchId"]],
    ["create proposal", "post", (id) => `/api/v1/projects/${id}/proposals`, { scenarioId: "x", note: 5 }, ["scenarioId", "note"]],
    ["get proposal", "get", () => "/api/v1/proposals/nope", undefined, ["proposalId"]],
    ["change proposal", "patch", () => "/api/v1/proposals/nope", { validUntil: "soon" }, ["proposalId"]],
    ["comment on proposal", "post", () => "/api/v1/proposals/nope/comments", { body: "" }, ["proposalId"]],
    ["proposal PDF", "get", () => "/api/v1/proposals/nope/versions/0/pdf", undefined, ["proposalId", "version"]],
    ["checklist item", "patch", () => "/api/v1/work-order-tasks/nope", { status: "finished" }, ["taskId"]],
    ["verification", "post", (id) => `/api/v1/projects/${id}/verifications`, { proposalId: "x", beforeLevelsDb: [1], afterLevelsDb: "x" }, ["proposalId", "beforeLevelsDb", "afterLevelsDb"]],
  ];

  it.each(cases)("%s answers 400 with the field paths", async (_name, method, path, body, paths) => {
    const req = owner[method as "get"](path(projectId));
    const res = body === undefined ? await req : await req.send(body as object);
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe("invalid_input");
    const got = (res.body.error.details as { path: string; message: string }[]).map((d) => d.path);
    for (const p of paths) expect(got, JSON.stringify(res.body)).toContain(p);
    for (const d of res.body.error.details) expect(d.message.length).toBeGreaterThan(3);
  });

  it("refuses text PostgreSQL cannot store (a NUL, half an emoji) with 400 and the field's path, and stores nothing", async () => {
    const before = (await owner.get("/api/v1/projects")).body.projects.length;
    const res = await owner.post("/api/v1/projects").send({ title: "Bad\u0000title" });
    expect(res.status).toBe(400);
    expect(res.body.error.details).toEqual([{ path: "title", message: expect.stringMatching(/NUL character/) }]);
    const plan = (await owner.get(`/api/v1/projects/${projectId}/plan`)).body;
    const save = await owner.put(`/api/v1/projects/${projectId}/plan`).send({ baseVersion: plan.version, document: { ...plan.document, name: "a\u0000b" } });
    expect(save.status).toBe(400);
    expect(save.body.error.details[0].path).toBe("document.name");
    const half = await owner.patch(`/api/v1/projects/${projectId}`).send({ siteAddress: "12 Elm Row \ud83d" });
    expect(half.status).toBe(400);
    expect(half.body.error.details[0]).toEqual({ path: "siteAddress", message: expect.stringMatching(/broken character/) });
    expect((await owner.get("/api/v1/projects")).body.projects.length).toBe(before);
    expect((await owner.get(`/api/v1/projects/${projectId}/plan`)).body.version).toBe(plan.version);
  });

  it("answers malformed JSON with 400 and a readable message", async () => {
    const res = await owner.post("/api/v1/projects").set("content-type", "application/json").send('{"title": ');
    expect(res.status).toBe(400);
    expect(res.body.error.message).toMatch(/not valid JSON/);
  });

  it("answers an over-size body with 413", async () => {
    const res = await owner.post("/api/v1/projects").send({ title: "x".repeat(300_000) });
    expect(res.status).toBe(413);
  });

  it("answers an unknown API path with 404 in the error shape", async () => {
    const res = await owner.get("/api/v1/nothing-here");
    expect(res.status).toBe(404);
    expect(res.body.error.code).toBe("not_found");
  });
});
