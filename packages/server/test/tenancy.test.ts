import type supertest from "supertest";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { addMember, newFirm, startHarness, type Harness } from "./harness.js";

describe("tenant isolation and client scope", () => {
  let h: Harness;
  let ownerA: supertest.Agent;
  let ownerB: supertest.Agent;
  let clientA: supertest.Agent;
  let surveyorA: { agent: supertest.Agent; membershipId: string };
  let projectId: string;
  let otherProjectId: string;
  let clientMembershipId: string;
  let invitationId: string;

  beforeAll(async () => {
    h = await startHarness();
    ownerA = (await newFirm(h, "Firm A")).agent;
    ownerB = (await newFirm(h, "Firm B")).agent;
    surveyorA = await addMember(h, ownerA, "surveyor");
    const client = await addMember(h, ownerA, "client");
    clientA = client.agent;
    clientMembershipId = client.membershipId;
    projectId = (await ownerA.post("/api/v1/projects").send({ title: "Client's project" })).body.id;
    otherProjectId = (await ownerA.post("/api/v1/projects").send({ title: "Someone else's project" })).body.id;
    expect((await ownerA.post(`/api/v1/projects/${projectId}/clients`).send({ membershipId: clientMembershipId })).status).toBe(200);
    invitationId = (await ownerA.post("/api/v1/people/invitations").send({ email: "pending@test.example", role: "planner" })).body.id;
  });
  afterAll(async () => h.close());

  it("answers 404 to another firm's owner for every record of this firm", async () => {
    const attempts: [string, string, object?][] = [
      ["get", `/api/v1/projects/${projectId}`],
      ["patch", `/api/v1/projects/${projectId}`, { title: "Taken over" }],
      ["post", `/api/v1/projects/${projectId}/clients`, { membershipId: clientMembershipId }],
      ["delete", `/api/v1/projects/${projectId}/clients/${clientMembershipId}`],
      ["get", `/api/v1/projects/${projectId}/plan`],
      ["put", `/api/v1/projects/${projectId}/plan`, { baseVersion: 0, document: { hijacked: true } }],
      ["post", `/api/v1/projects/${projectId}/analyses`, { planVersion: 0, source: { kind: "impact", roomId: "r" }, receiverId: "q" }],
      ["get", `/api/v1/projects/${projectId}/plan/revisions`],
      ["get", `/api/v1/projects/${projectId}/plan/revisions/0`],
      ["patch", `/api/v1/people/members/${surveyorA.membershipId}`, { role: "client" }],
      ["delete", `/api/v1/people/members/${surveyorA.membershipId}`],
      ["delete", `/api/v1/people/invitations/${invitationId}`],
    ];
    for (const [method, path, body] of attempts) {
      const res = await ownerB[method as "get"](path).send(body ?? {});
      expect(res.status, `${method} ${path}`).toBe(404);
    }
    const listed = await ownerB.get("/api/v1/projects");
    expect(listed.body.projects).toEqual([]);
    const people = await ownerB.get("/api/v1/people");
    expect(people.body.members.map((m: { email: string }) => m.email)).not.toContain("pending@test.example");
    // Nothing of firm A changed.
    const project = await ownerA.get(`/api/v1/projects/${projectId}`);
    expect(project.body.title).toBe("Client's project");
    expect(project.body.planVersion).toBe(0);
  });

  it("shows a client only the projects they are a client of, read-only", async () => {
    const list = await clientA.get("/api/v1/projects");
    expect(list.body.projects.map((p: { id: string }) => p.id)).toEqual([projectId]);
    expect((await clientA.get(`/api/v1/projects/${otherProjectId}`)).status).toBe(404);
    expect((await clientA.get(`/api/v1/projects/${otherProjectId}/plan`)).status).toBe(404);
    expect((await clientA.get(`/api/v1/projects/${projectId}/plan`)).status).toBe(200);
    expect((await clientA.put(`/api/v1/projects/${projectId}/plan`).send({ baseVersion: 0, document: {} })).status).toBe(403);
    expect((await clientA.patch(`/api/v1/projects/${projectId}`).send({ title: "Mine now" })).status).toBe(403);
  });
});
