import { randomUUID } from "node:crypto";
import type supertest from "supertest";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { ROLES, type Role } from "@hushmark/schemas";
import { routeTable, type Access } from "../src/http/routes.js";
import { addMember, newFirm, startHarness, type Harness } from "./harness.js";

/**
 * The documented role matrix (docs/roles.md). Every route the app registers must appear here;
 * a new route without an entry fails the first test.
 */
const EXPECTED: Record<string, Access> = {
  "post /auth/sign-up": "public",
  "post /auth/sign-in": "public",
  "post /auth/refresh": "public",
  "post /auth/sign-out": "signed-in",
  "get /auth/me": "signed-in",
  "post /auth/switch-firm": "signed-in",
  "post /auth/password": "signed-in",
  "post /auth/password-reset/request": "public",
  "post /auth/password-reset": "public",
  "get /people": ["owner"],
  "post /people/invitations": ["owner"],
  "delete /people/invitations/:id": ["owner"],
  "patch /people/members/:id": ["owner"],
  "delete /people/members/:id": ["owner"],
  "get /invitations/:token": "public",
  "post /invitations/accept": "public",
  "get /projects": "signed-in",
  "post /projects": ["owner", "surveyor"],
  "get /projects/:projectId": "signed-in",
  "patch /projects/:projectId": ["owner", "surveyor"],
  "post /projects/:projectId/clients": ["owner", "surveyor"],
  "delete /projects/:projectId/clients/:membershipId": ["owner", "surveyor"],
  "get /projects/:projectId/plan": "signed-in",
  "put /projects/:projectId/plan": ["owner", "surveyor"],
  "get /projects/:projectId/plan/revisions": ["owner", "surveyor", "planner"],
  "get /projects/:projectId/plan/revisions/:version": ["owner", "surveyor", "planner"],
  "post /projects/:projectId/analyses": "signed-in",
  "post /projects/:projectId/analyses/drawing": "signed-in",
  "get /catalogue": ["owner", "surveyor", "planner"],
  "post /catalogue/constructions/preview": ["owner", "surveyor"],
  "post /catalogue/constructions": ["owner", "surveyor"],
  "delete /catalogue/constructions/:constructionId": ["owner", "surveyor"],
  "get /audit": ["owner"],
  "get /projects/:projectId/brief": "signed-in",
  "put /projects/:projectId/brief": ["owner", "surveyor"],
  "get /projects/:projectId/measurements": "signed-in",
  "post /projects/:projectId/measurements": ["owner", "surveyor"],
  "post /projects/:projectId/measurements/csv-preview": ["owner", "surveyor"],
  "get /projects/:projectId/measurements/:measurementId": "signed-in",
  "patch /projects/:projectId/measurements/:measurementId": ["owner", "surveyor"],
  "delete /projects/:projectId/measurements/:measurementId": ["owner", "surveyor"],
  "get /projects/:projectId/measurements/:measurementId/csv": "signed-in",
  "get /projects/:projectId/measurements/:measurementId/audio": "signed-in",
  "post /projects/:projectId/recordings": ["owner", "surveyor"],
  "get /projects/:projectId/photos": "signed-in",
  "post /projects/:projectId/photos": ["owner", "surveyor"],
  "get /projects/:projectId/photos/:photoId/image": "signed-in",
  "delete /projects/:projectId/photos/:photoId": ["owner", "surveyor"],
  "get /projects/:projectId/underlays": "signed-in",
  "post /projects/:projectId/underlays": ["owner", "surveyor"],
  "get /projects/:projectId/underlays/:underlayId/image": "signed-in",
  "delete /projects/:projectId/underlays/:underlayId": ["owner", "surveyor"],
  "get /price-book": ["owner", "surveyor", "planner"],
  "post /price-book/items": ["owner"],
  "patch /price-book/items/:itemId": ["owner"],
  "delete /price-book/items/:itemId": ["owner"],
  "get /price-book/export.csv": ["owner", "surveyor", "planner"],
  "post /price-book/import": ["owner"],
  "get /firm/settings": ["owner", "planner"],
  "put /firm/settings": ["owner"],
  "get /projects/:projectId/scenarios": ["owner", "planner", "surveyor"],
  "post /projects/:projectId/scenarios": ["owner", "planner"],
  "get /projects/:projectId/scenarios/:scenarioId": ["owner", "planner", "surveyor"],
  "patch /projects/:projectId/scenarios/:scenarioId": ["owner", "planner"],
  "delete /projects/:projectId/scenarios/:scenarioId": ["owner", "planner"],
  "post /projects/:projectId/option-searches": ["owner", "planner"],
  "get /projects/:projectId/option-searches/:searchId": ["owner", "planner"],
  "delete /projects/:projectId/option-searches/:searchId": ["owner", "planner"],
  "get /projects/:projectId/proposals": ["owner", "planner", "surveyor", "client"],
  "post /projects/:projectId/proposals": ["owner", "planner"],
  "get /projects/:projectId/work-orders": ["owner", "planner", "surveyor"],
  "get /projects/:projectId/verifications": "signed-in",
  "post /projects/:projectId/verifications": ["owner", "surveyor"],
  "get /projects/:projectId/verifications/:verificationId/report": "signed-in",
  "get /proposals": ["owner", "planner", "surveyor", "client"],
  "get /proposals/:proposalId": ["owner", "planner", "surveyor", "client"],
  "patch /proposals/:proposalId": ["owner", "planner"],
  "post /proposals/:proposalId/send": ["owner", "planner"],
  "post /proposals/:proposalId/comments": ["owner", "planner", "surveyor", "client"],
  "post /proposals/:proposalId/approve": ["client"],
  "post /proposals/:proposalId/changes": ["client"],
  "get /proposals/:proposalId/versions/:version/pdf": ["owner", "planner", "surveyor", "client"],
  "post /proposals/:proposalId/deposit": ["client"],
  "patch /work-order-tasks/:taskId": ["owner", "surveyor"],
  "post /payments/webhook": "public",
};

const allowed = (access: Access, role: Role) => access === "public" || access === "signed-in" || access.includes(role);

function concretePath(path: string): string {
  return `/api/v1${path}`
    .replace(":token", "x".repeat(43))
    .replace(":version", "1")
    .replace(":constructionId", "no-such-construction")
    .replace(/:[a-zA-Z]+/g, () => randomUUID());
}

describe("access-control matrix (generated from the route table)", () => {
  let h: Harness;
  const agents = new Map<Role, supertest.Agent>();

  beforeAll(async () => {
    h = await startHarness();
    const { agent: owner } = await newFirm(h, "Matrix Firm");
    agents.set("owner", owner);
    for (const role of ["surveyor", "planner", "client"] as const) agents.set(role, (await addMember(h, owner, role)).agent);
  });
  afterAll(async () => h.close());

  it("has a documented entry for every route, and every entry is a route", () => {
    const registered = Object.fromEntries(routeTable.map((r) => [`${r.method} ${r.path}`, r.access]));
    expect(Object.keys(registered).sort()).toEqual(Object.keys(EXPECTED).sort());
    expect(registered).toEqual(EXPECTED);
  });

  it("refuses every non-public route without a session (401)", async () => {
    for (const route of routeTable.filter((r) => r.access !== "public")) {
      const res = await h.request()[route.method as "get"](concretePath(route.path)).send({});
      expect(res.status, `${route.method} ${route.path}`).toBe(401);
    }
  });

  // Destructive routes get random ids, so an allowed role reaches the service and answers 404 or
  // 400, never 401/403; a refused role is stopped at the door with 403.
  it.each(ROLES)("answers the %s role as documented on every route", async (role) => {
    const agent = agents.get(role)!;
    for (const route of routeTable) {
      if (route.path === "/auth/sign-out" || route.path === "/auth/password" || route.path === "/auth/refresh") continue;
      const res = await agent[route.method as "get"](concretePath(route.path)).send({});
      const label = `${role} ${route.method} ${route.path} → ${res.status} ${JSON.stringify(res.body).slice(0, 120)}`;
      expect(res.status, label).toBeLessThan(500);
      if (allowed(route.access, role)) expect([401, 403], label).not.toContain(res.status);
      else expect(res.status, label).toBe(403);
    }
  });
});
