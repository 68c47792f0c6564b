import { randomUUID } from "node:crypto";
import fc from "fast-check";
import type supertest from "supertest";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { z } from "zod";
import * as s from "@hushmark/schemas";
import { routeTable } from "../src/http/routes.js";
import { demoPlan, pricedProject, SETUP, startMoneyHarness, type MoneyHarness } from "./money-harness.js";
import { arbitraryOf } from "./support/zod-arbitrary.js";
import { csvMutationOf, mutationOf, toJsonText } from "./support/mutations.js";
import { snapshot, type TableSpec } from "./support/snapshots.js";

/**
 * Property tests over every writing route: valid bodies made from the shared zod schemas, spoiled
 * in one way each (a field dropped, a wrong type, huge or odd strings, numbers JSON cannot say,
 * deep nesting, prototype keys, extra keys), sent as the firm's owner (or its client on the
 * client's routes). Never a 5xx, every refusal in the error shape with a message, and a refused
 * write leaves the tables it would have written unchanged.
 *
 * Seeded: HUSHMARK_PROPERTY_SEED replays a failure (fast-check prints the seed and path);
 * HUSHMARK_PROPERTY_RUNS sets the runs per route.
 */
const SEED = Number(process.env.HUSHMARK_PROPERTY_SEED ?? 20_261_201);
const RUNS = Number(process.env.HUSHMARK_PROPERTY_RUNS ?? 8);

interface Fixture {
  projectId: string;
  planVersion: number;
  scenarioId: string;
  proposalId: string;
  measurementId: string;
  itemId: string;
  plannerMembershipId: string;
}

interface RouteCase {
  /** The body's schema; absent for routes without a JSON body (they get spoiled `{}`s). */
  schema?: z.ZodType;
  /** A valid body of this route, when the schema alone makes few (a whole plan, a live version). */
  valid?: (f: Fixture) => fc.Arbitrary<unknown>;
  /** Fills in values only known at send time (the plan's current version). */
  live?: (body: unknown, f: Fixture) => Promise<unknown>;
  /** The tables a write on this route changes. */
  tables: TableSpec[];
  /** Routes the owner may not call are sent by the project's client. */
  as?: "client";
  /** A route with a capacity limit may answer 503 `busy` (with a message) when valid bodies fill it. */
  limited?: boolean;
}

const PROPOSAL_TABLES: TableSpec[] = ["proposals", "proposal_comments", "payments", { table: "proposal_versions", columns: ["proposal_id", "version", "content", "sent_at"] }];
const MEASUREMENT_TABLES: TableSpec[] = [{ table: "measurements", columns: ["id", "label", "kind", "taken_at", "room_id", "point", "device", "calibration_db", "leq_db", "lmax_db"] }, "photos", "stored_files"];
const AUTH_TABLES: TableSpec[] = ["users", "organizations", "memberships", "password_resets"];

const CASES: Record<string, RouteCase> = {
  "post /auth/sign-up": { schema: s.signUpSchema, tables: AUTH_TABLES },
  "post /auth/sign-in": { schema: s.signInSchema, tables: AUTH_TABLES },
  "post /auth/refresh": { tables: AUTH_TABLES },
  "post /auth/switch-firm": { schema: s.switchFirmSchema, tables: AUTH_TABLES },
  "post /auth/password": { schema: s.passwordChangeSchema, tables: AUTH_TABLES },
  "post /auth/password-reset/request": { schema: s.passwordResetRequestSchema, tables: ["users"] },
  "post /auth/password-reset": { schema: s.passwordResetSchema, tables: AUTH_TABLES },
  "post /people/invitations": { schema: s.inviteSchema, tables: ["invitations", "memberships"] },
  "delete /people/invitations/:id": { tables: ["invitations"] },
  "patch /people/members/:id": { schema: s.changeRoleSchema, tables: ["memberships"] },
  "delete /people/members/:id": { tables: ["memberships"] },
  "post /invitations/accept": { schema: s.acceptInvitationSchema, tables: ["invitations", "memberships", "users"] },
  "post /projects": { schema: s.projectInputSchema, tables: ["projects", "plans"] },
  "patch /projects/:projectId": { schema: s.projectUpdateSchema, tables: ["projects"] },
  "post /projects/:projectId/clients": { schema: s.addProjectClientSchema, tables: ["project_clients"] },
  "delete /projects/:projectId/clients/:membershipId": { tables: ["project_clients"] },
  "put /projects/:projectId/plan": {
    schema: s.planSaveSchema,
    valid: () => fc.record({ name: fc.string({ minLength: 1, maxLength: 40 }), message: fc.option(fc.string({ maxLength: 60 }), { nil: undefined }) }).map(({ name, message }) => ({ baseVersion: 0, document: { ...demoPlan, name }, ...(message === undefined ? {} : { message }) })),
    live: async (body, f) => ({ ...(body as object), baseVersion: await currentPlanVersion(f.projectId) }),
    tables: ["plans", "plan_revisions"],
  },
  "post /projects/:projectId/analyses": {
    schema: s.analysisRequestSchema,
    valid: (f) => fc.constantFrom({ planVersion: f.planVersion, source: SETUP(0).source, receiverId: "record", target: { kind: "nc", nc: 25 } }),
    tables: ["plans", "plan_revisions"],
  },
  "post /projects/:projectId/analyses/drawing": {
    schema: s.analysisRequestSchema,
    valid: (f) => fc.constantFrom({ planVersion: f.planVersion, source: SETUP(0).source, receiverId: "record", target: { kind: "nc", nc: 25 } }),
    tables: ["plans", "plan_revisions"],
  },
  "post /catalogue/constructions/preview": { schema: s.constructionUploadSchema, valid: () => constructionBody(), tables: ["firm_constructions"] },
  "post /catalogue/constructions": { schema: s.constructionUploadSchema, valid: () => constructionBody(), tables: ["firm_constructions"] },
  "delete /catalogue/constructions/:constructionId": { tables: ["firm_constructions"] },
  "put /projects/:projectId/brief": { schema: s.briefSaveSchema, tables: ["project_briefs"] },
  "post /projects/:projectId/measurements": { schema: s.measurementInputSchema, tables: MEASUREMENT_TABLES },
  "post /projects/:projectId/measurements/csv-preview": { schema: s.csvPreviewInputSchema, valid: () => spectrumCsv().map((text) => ({ text })), tables: MEASUREMENT_TABLES },
  "patch /projects/:projectId/measurements/:measurementId": { schema: s.measurementUpdateSchema, tables: MEASUREMENT_TABLES },
  "delete /projects/:projectId/measurements/:measurementId": { tables: MEASUREMENT_TABLES },
  "post /projects/:projectId/recordings": { tables: MEASUREMENT_TABLES },
  "post /projects/:projectId/photos": { tables: MEASUREMENT_TABLES },
  "delete /projects/:projectId/photos/:photoId": { tables: MEASUREMENT_TABLES },
  "post /projects/:projectId/underlays": { tables: ["underlay_files", "stored_files"] },
  "delete /projects/:projectId/underlays/:underlayId": { tables: ["underlay_files", "stored_files"] },
  "post /price-book/items": { schema: s.priceBookItemInputSchema, tables: ["price_book_items"] },
  "patch /price-book/items/:itemId": { schema: s.priceBookItemUpdateSchema, tables: ["price_book_items"] },
  "delete /price-book/items/:itemId": { tables: ["price_book_items"] },
  "post /price-book/import": { schema: s.priceBookImportSchema, valid: () => priceBookCsv(), tables: ["price_book_items"] },
  "put /firm/settings": { schema: s.firmSettingsSchema, tables: ["firm_settings"] },
  "post /projects/:projectId/scenarios": { schema: s.scenarioInputSchema, tables: ["scenarios"] },
  "patch /projects/:projectId/scenarios/:scenarioId": { schema: s.scenarioUpdateSchema, tables: ["scenarios"] },
  "delete /projects/:projectId/scenarios/:scenarioId": { tables: ["scenarios"] },
  "post /projects/:projectId/option-searches": { schema: s.optionSearchInputSchema, limited: true, tables: [{ table: "option_searches", columns: ["id", "project_id", "created_at"] }] },
  "delete /projects/:projectId/option-searches/:searchId": { tables: [{ table: "option_searches", columns: ["id", "cancel_requested"] }] },
  "post /projects/:projectId/proposals": { schema: s.proposalCreateSchema, tables: PROPOSAL_TABLES },
  "post /projects/:projectId/verifications": { schema: s.verificationInputSchema, tables: ["verifications"] },
  "patch /proposals/:proposalId": { schema: s.proposalUpdateSchema, tables: PROPOSAL_TABLES },
  "post /proposals/:proposalId/send": { tables: PROPOSAL_TABLES },
  "post /proposals/:proposalId/comments": { schema: s.proposalCommentInputSchema, tables: PROPOSAL_TABLES },
  "post /proposals/:proposalId/approve": { schema: s.proposalDecisionSchema, tables: PROPOSAL_TABLES, as: "client" },
  "post /proposals/:proposalId/changes": { schema: s.proposalChangesSchema, tables: PROPOSAL_TABLES, as: "client" },
  "post /proposals/:proposalId/deposit": { schema: s.depositStartSchema, tables: PROPOSAL_TABLES, as: "client" },
  "patch /work-order-tasks/:taskId": { schema: s.taskUpdateSchema, tables: ["work_order_tasks"] },
  "post /payments/webhook": { tables: ["payments", "payment_events"] },
};

/** Ending the session is not a body's business: sign-out has no body and would sign the owner out. */
const NOT_SENT = new Set(["post /auth/sign-out"]);

let h: MoneyHarness;
const currentPlanVersion = async (projectId: string) => Number((await h.dataSource.query("SELECT version FROM plans WHERE project_id = $1", [projectId]))[0].version);

const BANDS = s.MEASUREMENT_BANDS_HZ;
const constructionBody = () =>
  fc.record({ tl: fc.integer({ min: 10, max: 60 }), id: fc.stringMatching(/^[a-z0-9][a-z0-9-]{2,20}$/), density: fc.integer({ min: 1, max: 500 }) }).map(({ tl, id, density }) => ({
    id,
    name: "Lab wall",
    category: "wall",
    thicknessMm: 120,
    surfaceDensityKgM2: density,
    sourceNote: "Lab report 12, 2026",
    csv: ["frequency_hz,tl_db", ...BANDS.filter((b) => b >= 100 && b <= 5000).map((b, i) => `${b},${tl + i}`)].join("\n"),
  }));
const spectrumCsv = () => fc.integer({ min: 20, max: 90 }).map((l) => ["Frequency (Hz);Leq (dB)", ...BANDS.map((b, i) => `${b};${(l + i / 2).toFixed(1).replace(".", ",")}`)].join("\n"));
const priceBookCsv = () =>
  fc.record({ code: fc.stringMatching(/^[a-z][a-z0-9-]{2,20}$/), hours: fc.integer({ min: 0, max: 40 }) }).map(({ code, hours }) => ({ csv: `${PRICE_BOOK_HEADER}\n${code},Door seal kit,sealing,door,sealed-gap,perimeter,,0,0,0,0,12,40,${hours},0,,,yes`, mode: "merge" }));
let PRICE_BOOK_HEADER = "";

describe("property tests: spoiled bodies on every writing route", () => {
  let owner: supertest.Agent;
  let client: supertest.Agent;
  let f: Fixture;

  beforeAll(async () => {
    h = await startMoneyHarness();
    const p = await pricedProject(h);
    owner = p.owner;
    client = p.client.agent;
    const scenario = await p.owner.post(`/api/v1/projects/${p.projectId}/scenarios`).send({
      name: "Seal the door",
      setup: SETUP(p.planVersion),
      items: [{ priceBookItemId: p.byCode("door-bottom-auto").id, elementId: "door-studio" }],
    });
    if (scenario.status !== 201) throw new Error(`scenario answered ${scenario.status}`);
    const proposal = await p.owner.post(`/api/v1/projects/${p.projectId}/proposals`).send({ scenarioId: scenario.body.id });
    if (proposal.status !== 201) throw new Error(`proposal answered ${proposal.status}`);
    await p.owner.post(`/api/v1/proposals/${proposal.body.id}/send`).send({});
    const measurement = await p.owner.post(`/api/v1/projects/${p.projectId}/measurements`).send({ label: "Living room", kind: "background", takenAt: "2026-05-01T21:30:00Z", leqDb: BANDS.map(() => 40) });
    if (measurement.status !== 201) throw new Error(`measurement answered ${measurement.status}`);
    const people = await p.owner.get("/api/v1/people");
    const planner = (people.body.members as { role: string; membershipId: string }[]).find((m) => m.role === "planner")!;
    const exported = await p.owner.get("/api/v1/price-book/export.csv");
    PRICE_BOOK_HEADER = String(exported.text).split(/\r?\n/)[0]!;
    f = { projectId: p.projectId, planVersion: p.planVersion, scenarioId: scenario.body.id, proposalId: proposal.body.id, measurementId: measurement.body.id, itemId: p.items[0]!.id, plannerMembershipId: planner.membershipId };
  }, 120_000);
  afterAll(async () => h?.close());

  it("has a case for every writing route in the route table", () => {
    const writing = routeTable.filter((r) => r.method !== "get").map((r) => `${r.method} ${r.path}`).filter((k) => !NOT_SENT.has(k));
    expect(writing.filter((k) => !CASES[k])).toEqual([]);
    expect(Object.keys(CASES).filter((k) => !writing.includes(k))).toEqual([]);
  });

  /** Real ids where a valid body should reach the service; deletes get fresh ids so the fixture stays. */
  function concretePath(method: string, path: string): string {
    const real: Record<string, string> = {
      projectId: f.projectId,
      scenarioId: f.scenarioId,
      proposalId: f.proposalId,
      measurementId: f.measurementId,
      itemId: f.itemId,
      id: f.plannerMembershipId,
    };
    return `/api/v1${path}`.replace(/:([a-zA-Z]+)/g, (_m, name: string) => {
      if (name === "token") return "x".repeat(43);
      if (name === "constructionId") return "no-such-construction";
      if (name === "projectId") return f.projectId;
      return method !== "delete" && real[name] ? real[name]! : randomUUID();
    });
  }

  const writing = Object.entries(CASES);
  it.each(writing)("%s: no 5xx, refusals explain themselves, refused writes change nothing", async (key, c) => {
    const [method, path] = key.split(" ") as [string, string];
    const valid = c.valid ? c.valid(f) : c.schema ? arbitraryOf(c.schema) : fc.constant({});
    const body = valid.chain((v) => fc.tuple(fc.constant(v), fc.option(mutationOf(v), { nil: undefined, freq: 6 })));
    await fc.assert(
      fc.asyncProperty(body, async ([v, mutation]) => {
        const live = c.live ? await c.live(v, f) : v;
        const sent = mutation ? mutation.apply(live) : live;
        const text = toJsonText(sent);
        const before = await snapshot(h.dataSource, c.tables);
        const agent = c.as === "client" ? client : owner;
        const res = await agent[method as "post"](concretePath(method, path)).set("content-type", "application/json").send(text);
        const label = `${key} with ${mutation?.kind ?? "a valid body"} → ${res.status} ${JSON.stringify(res.body).slice(0, 300)} (sent ${text.slice(0, 200)})`;
        const busy = c.limited && res.status === 503 && res.body?.error?.code === "busy";
        if (!busy) expect(res.status, label).toBeLessThan(500);
        if (res.status >= 400) {
          expect(res.body?.error?.code, label).toEqual(expect.any(String));
          expect(String(res.body?.error?.message ?? "").trim().length, label).toBeGreaterThan(0);
          expect(await snapshot(h.dataSource, c.tables), `${label}: a refused write changed stored data`).toEqual(before);
        }
      }),
      { seed: SEED, numRuns: RUNS, endOnFailure: true },
    );
  });

  /** The CSV imports through their routes: the file spoiled the way spreadsheets and hand edits spoil it. */
  const csvRoutes: [string, TableSpec[], () => fc.Arbitrary<{ path: string; text: string; wrap: (text: string) => unknown }>][] = [
    ["post /price-book/import", ["price_book_items"], () => priceBookCsv().map((b) => ({ path: "/api/v1/price-book/import", text: b.csv, wrap: (csv) => ({ csv, mode: "merge" }) }))],
    ["post /catalogue/constructions", ["firm_constructions"], () => constructionBody().map((b) => ({ path: "/api/v1/catalogue/constructions", text: b.csv, wrap: (csv) => ({ ...b, csv }) }))],
    ["post /catalogue/constructions/preview", ["firm_constructions"], () => constructionBody().map((b) => ({ path: "/api/v1/catalogue/constructions/preview", text: b.csv, wrap: (csv) => ({ ...b, csv }) }))],
    ["post /projects/:projectId/measurements/csv-preview", MEASUREMENT_TABLES, () => spectrumCsv().map((text) => ({ path: `/api/v1/projects/${f.projectId}/measurements/csv-preview`, text, wrap: (t) => ({ text: t }) }))],
  ];
  it.each(csvRoutes)("%s with a spoiled CSV file: no 5xx, refusals explain themselves, refused imports change nothing", async (key, tables, make) => {
    const arb = fc.constant(null).chain(() => make()).chain((c) => fc.tuple(fc.constant(c), csvMutationOf(c.text)));
    await fc.assert(
      fc.asyncProperty(arb, async ([c, m]) => {
        const before = await snapshot(h.dataSource, tables);
        const res = await owner.post(c.path).send(c.wrap(m.text) as object);
        const label = `${key} with ${m.kind} → ${res.status} ${JSON.stringify(res.body).slice(0, 300)}`;
        expect(res.status, label).toBeLessThan(500);
        if (res.status >= 400) {
          expect(String(res.body?.error?.message ?? "").trim().length, label).toBeGreaterThan(0);
          expect(await snapshot(h.dataSource, tables), `${label}: a refused import changed stored data`).toEqual(before);
        }
      }),
      { seed: SEED, numRuns: RUNS * 2, endOnFailure: true },
    );
  });
});
