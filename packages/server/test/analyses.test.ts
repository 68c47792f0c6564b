import { spawnSync } from "node:child_process";
import { readFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import type supertest from "supertest";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { SHARE_LEGEND, constructionCatalogue, generateSyntheticBuilding, serializePlan } from "@hushmark/floorplan";
import { evaluateScenario } from "../src/scenarios/scenario-evaluate.js";
import { PDFParse } from "pdf-parse";
import { addMember, newFirm, startHarness, type Harness } from "./harness.js";

const demoPlanUrl = new URL("../../../examples/fernhollow-studio.plan.json", import.meta.url);
const demoPlan = JSON.parse(readFileSync(demoPlanUrl, "utf8")) as Record<string, unknown>;
const root = fileURLToPath(new URL("../../../", import.meta.url));

const request = (planVersion: number, extra: Record<string, unknown> = {}) => ({
  planVersion,
  source: { kind: "airborne", spaceId: "cafe", spectrum: { kind: "library", id: "speech-raised" } },
  receiverId: "record",
  target: { kind: "nc", nc: 25 },
  ...extra,
});

describe("the analysis API", () => {
  let h: Harness;
  let owner: supertest.Agent;
  let client: supertest.Agent;
  let projectId: string;
  let version: number;

  beforeAll(async () => {
    h = await startHarness();
    owner = (await newFirm(h)).agent;
    const member = await addMember(h, owner, "client");
    client = member.agent;
    projectId = (await owner.post("/api/v1/projects").send({ title: "Studio next to a café" })).body.id;
    await owner.post(`/api/v1/projects/${projectId}/clients`).send({ membershipId: member.membershipId });
    const saved = await owner.put(`/api/v1/projects/${projectId}/plan`).send({ baseVersion: 0, document: demoPlan });
    expect(saved.status).toBe(200);
    version = saved.body.version;
  });
  afterAll(async () => h.close());

  it("analyses the demo plan: the receiver is quieter than the source, elements ranked by share", async () => {
    const res = await owner.post(`/api/v1/projects/${projectId}/analyses`).send(request(version));
    expect(res.status, JSON.stringify(res.body).slice(0, 400)).toBe(200);
    const body = res.body;
    expect(body.cached).toBe(false);
    expect(body.receiver.levelsDb).toHaveLength(21);
    expect(body.receiver.dba).toBeLessThan(body.source.dba - 20);
    expect(body.elements.length).toBeGreaterThan(2);
    const shares = body.elements.map((e: { share: number }) => e.share);
    expect([...shares].sort((a, b) => b - a)).toEqual(shares);
    for (const e of body.elements) expect(e.gainIfPerfectDb).toBeGreaterThanOrEqual(0);
    expect(body.paths.length).toBeGreaterThan(0);
    expect(body.paths[0].label).toMatch(/^Path 1 — /);
    expect(body.target).toMatchObject({ kind: "nc", value: 25 });
  });

  it("gives the command line's numbers and the scenarios' before-levels for the same inputs", async () => {
    const api = (await owner.post(`/api/v1/projects/${projectId}/analyses`).send(request(version, { paths: 3 }))).body;
    const cli = spawnSync(process.execPath, ["scripts/hushmark.mjs", "analyze", fileURLToPath(demoPlanUrl), "--source", "cafe", "--receiver", "record", "--spectrum", "speech-raised", "--target-nc", "25", "--k", "3", "--json"], { cwd: root, encoding: "utf8" });
    expect(cli.status, cli.stderr).toBe(0);
    const out = JSON.parse(cli.stdout);
    // The command line rounds levels and gains to 0.01 dB and shares to 0.0001.
    api.receiver.levelsDb.forEach((v: number, b: number) => expect(Math.abs(v - out.receiver.levelsDb[b])).toBeLessThanOrEqual(0.005 + 1e-9));
    expect(Math.abs(api.receiver.dba - out.receiver.dba)).toBeLessThanOrEqual(0.005 + 1e-9);
    expect(out.receiver.nc).toBe(api.receiver.nc);
    expect(out.elements.map((e: { elementId: string }) => e.elementId)).toEqual(api.elements.map((e: { elementId: string }) => e.elementId));
    api.elements.forEach((e: { share: number; gainIfPerfectDb: number; gainExact: boolean }, i: number) => {
      expect(Math.abs(e.share - out.elements[i].share)).toBeLessThanOrEqual(0.00005 + 1e-9);
      if (Number.isFinite(e.gainIfPerfectDb)) expect(Math.abs(e.gainIfPerfectDb - out.elements[i].gainIfPerfectDb)).toBeLessThanOrEqual(0.005 + 1e-9);
      expect(out.elements[i].gainExact).toBe(e.gainExact);
    });
    // A door's own gain comes from re-solving without it, on the API as on the command line.
    expect(api.elements.some((e: { kind: string; gainExact: boolean }) => e.kind === "door" && e.gainExact)).toBe(true);
    expect(out.paths.map((p: { steps: unknown }) => p.steps)).toEqual(api.paths.map((p: { steps: unknown }) => p.steps));
    const scenario = evaluateScenario(demoPlan, { planVersion: version, source: request(version).source as never, receiverId: "record", target: { kind: "nc", nc: 25 } }, [], constructionCatalogue);
    if (!scenario.ok) throw new Error(scenario.message);
    scenario.evaluation.before.levelsDb.forEach((v, b) => expect(v).toBeCloseTo(api.receiver.levelsDb[b], 6));
    expect(scenario.evaluation.before.dba).toBeCloseTo(api.receiver.dba, 6);
  });

  it("serves the same inputs from the cache with the same numbers", async () => {
    const first = await owner.post(`/api/v1/projects/${projectId}/analyses`).send(request(version, { paths: 3 }));
    const second = await owner.post(`/api/v1/projects/${projectId}/analyses`).send(request(version, { paths: 3 }));
    expect(second.body.cached).toBe(true);
    expect(second.body.receiver).toEqual(first.body.receiver);
    expect(second.body.elements).toEqual(first.body.elements);
  });

  it("aims at the brief's target when the request names none", async () => {
    const none = await owner.post(`/api/v1/projects/${projectId}/analyses`).send(request(version, { target: undefined }));
    expect(none.status).toBe(200);
    expect(none.body.target).toBeNull();
    const saved = await owner.put(`/api/v1/projects/${projectId}/brief`).send({ baseVersion: 0, brief: { target: { kind: "level", levelDba: 22 } } });
    expect(saved.status, JSON.stringify(saved.body)).toBe(200);
    const fromBrief = await owner.post(`/api/v1/projects/${projectId}/analyses`).send(request(version, { target: undefined }));
    expect(fromBrief.body.target).toMatchObject({ kind: "dba", value: 22 });
    expect(fromBrief.body.target.met).toBe(fromBrief.body.receiver.dba <= 22);
    // A target in the request still wins.
    const asked = await owner.post(`/api/v1/projects/${projectId}/analyses`).send(request(version));
    expect(asked.body.target).toMatchObject({ kind: "nc", value: 25 });
  });

  it("lets the project's client read a result", async () => {
    const res = await client.post(`/api/v1/projects/${projectId}/analyses`).send(request(version));
    expect(res.status).toBe(200);
  });

  it("answers 400 for an unknown receiver and for an unknown spectrum, with a message", async () => {
    const unknown = await owner.post(`/api/v1/projects/${projectId}/analyses`).send(request(version, { receiverId: "attic-that-is-not-there" }));
    expect(unknown.status).toBe(400);
    expect(unknown.body.error.message).toMatch(/not a room or space/);
    const spectrum = await owner
      .post(`/api/v1/projects/${projectId}/analyses`)
      .send(request(version, { source: { kind: "airborne", spaceId: "cafe", spectrum: { kind: "library", id: "no-such-sound" } } }));
    expect(spectrum.status).toBe(400);
    expect(spectrum.body.error.message).toMatch(/no source spectrum/);
    const missing = await owner.post(`/api/v1/projects/${projectId}/analyses`).send(request(version + 50));
    expect(missing.status).toBe(404);
  });

  it("answers 422 with the problems when the plan cannot be analysed", async () => {
    const broken = structuredClone(demoPlan) as { elements: Record<string, { type: string; widthM?: number }> };
    const door = Object.values(broken.elements).find((e) => e.type === "door")!;
    door.widthM = 40;
    const saved = await owner.put(`/api/v1/projects/${projectId}/plan`).send({ baseVersion: version, document: broken });
    expect(saved.status).toBe(200);
    const res = await owner.post(`/api/v1/projects/${projectId}/analyses`).send(request(saved.body.version));
    expect(res.status).toBe(422);
    expect(res.body.error.code).toBe("plan_problems");
    expect(res.body.error.details.length).toBeGreaterThan(0);
    expect(res.body.error.details[0].message.length).toBeGreaterThan(10);
    // The earlier version is still there and still analyses.
    expect((await owner.post(`/api/v1/projects/${projectId}/analyses`).send(request(version))).status).toBe(200);
    version = saved.body.version;
  });

  it("refuses a document that is not a plan, and keeps the stored one", async () => {
    const before = await owner.get(`/api/v1/projects/${projectId}/plan`);
    const res = await owner.put(`/api/v1/projects/${projectId}/plan`).send({ baseVersion: before.body.version, document: { format: "something-else" } });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe("invalid_plan");
    expect((await owner.get(`/api/v1/projects/${projectId}/plan`)).body).toEqual(before.body);
  });

  it("keeps answering other requests while a large plan is analysed in the worker pool", async () => {
    const big = JSON.parse(serializePlan(generateSyntheticBuilding({ rooms: 600, levels: 3, seed: 7 }))) as Record<string, unknown>;
    const bigProject = (await owner.post("/api/v1/projects").send({ title: "Big building" })).body.id as string;
    const saved = await owner.put(`/api/v1/projects/${bigProject}/plan`).send({ baseVersion: 0, document: big });
    expect(saved.status).toBe(200);
    const rooms = Object.values(big.elements as Record<string, { type: string; id: string }>).filter((e) => e.type === "room");
    const started = performance.now();
    let analysisDone = 0;
    const analysis = owner
      .post(`/api/v1/projects/${bigProject}/analyses`)
      .send({ planVersion: saved.body.version, source: { kind: "airborne", spaceId: rooms[0]!.id, spectrum: { kind: "library", id: "music-amplified-bass" } }, receiverId: rooms[rooms.length - 1]!.id })
      .then((r) => {
        analysisDone = performance.now();
        return r;
      });
    await new Promise((r) => setTimeout(r, 5));
    const health = await h.request().get("/api/v1/health");
    const healthDone = performance.now();
    const result = await analysis;
    expect(health.status).toBe(200);
    expect(result.status, JSON.stringify(result.body).slice(0, 300)).toBe(200);
    // The health answer did not wait for the analysis to finish.
    expect(healthDone).toBeLessThan(analysisDone);
    expect(healthDone - started).toBeLessThan(analysisDone - started);
  });

  it("draws the same analysis as a PDF for print, for the firm and the project's client", async () => {
    // An earlier case saved a plan that cannot be analysed; save the demo plan again on top.
    const current = (await owner.get(`/api/v1/projects/${projectId}/plan`)).body.version as number;
    const good = (await owner.put(`/api/v1/projects/${projectId}/plan`).send({ baseVersion: current, document: demoPlan })).body.version as number;
    const asJson = (await owner.post(`/api/v1/projects/${projectId}/analyses`).send(request(good))).body;
    const binary = (r: supertest.Test) => r.buffer(true).parse((res, done) => {
      const parts: Buffer[] = [];
      res.on("data", (c: Buffer) => parts.push(c));
      res.on("end", () => done(null, Buffer.concat(parts)));
    });
    for (const agent of [owner, client]) {
      const res = await binary(agent.post(`/api/v1/projects/${projectId}/analyses/drawing`).send(request(good)));
      expect(res.status, (res.body as Buffer).toString().slice(0, 300)).toBe(200);
      expect(res.headers["content-type"]).toMatch(/^application\/pdf/);
      expect(res.headers["content-disposition"]).toMatch(/attachment; filename="?studio-next-to-a-caf-sound-paths-v\d+\.pdf/);
      const bytes = res.body as Buffer;
      expect(bytes.subarray(0, 5).toString()).toBe("%PDF-");
      const parser = new PDFParse({ data: new Uint8Array(bytes) });
      const text = (await parser.getText()).text.replace(/\s+/g, " ");
      await parser.destroy();
      expect(text).toContain(`to ${asJson.receiver.name}`);
      expect(text).toContain(`about ${(Math.round(asJson.receiver.dba * 10) / 10).toFixed(1)} dBA`);
      expect(text).toContain(asJson.paths[0].label.replace(/\s+/g, " ").slice(0, 20));
      expect(text).toContain("Predictions are estimates");
      // The target in the trade's words, the app's legend, and no share written above all of it.
      expect(text).toContain(`target of NC 25`);
      // The strongest path is drawn on the plan with its tag: rank and level.
      expect(text).toContain(`1 ${Math.round(asJson.paths[0].dba)} dBA`);
      for (const l of SHARE_LEGEND) expect(text).toContain(l.label);
      for (const m of text.matchAll(/(\d+) ?%/g)) expect(Number(m[1]), m[0]).toBeLessThanOrEqual(100);
    }
  });

  it("answers a drawing of a receiver that is not in the plan with 400 and its message, not a file", async () => {
    const res = await owner.post(`/api/v1/projects/${projectId}/analyses/drawing`).send(request(version, { receiverId: "no-such-room" }));
    expect(res.status).toBe(400);
    expect(res.headers["content-type"]).toMatch(/json/);
    expect(res.body.error.message).toMatch(/no-such-room|receiver|room/i);
  });
});
