import type supertest from "supertest";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { addMember, newFirm, startHarness, type Harness } from "./harness.js";

const BANDS = [50, 63, 80, 100, 125, 160, 200, 250, 315, 400, 500, 630, 800, 1000, 1250, 1600, 2000, 2500, 3150, 4000, 5000];
// A lab curve 125–4000 Hz equal to the ASTM E413 contour set to 50 dB at 500 Hz (100 Hz below it; STC does not read 100 Hz).
const STC_CONTOUR = [-16, -13, -10, -7, -4, -1, 0, 1, 2, 3, 4, 4, 4, 4, 4, 4];
const labCsv = () =>
  ["frequency_hz,tl_db", "100,31", ...BANDS.slice(4, 20).map((f, i) => `${f},${50 + STC_CONTOUR[i]!}`)].join("\n");

const meta = { id: "lab-double-stud-2024", name: "Double stud, 2×15 mm board each side (lab report 24-117)", category: "wall", thicknessMm: 240, surfaceDensityKgM2: 48, sourceNote: "Lab report 24-117" };

describe("the construction catalogue", () => {
  let h: Harness;
  let owner: supertest.Agent;
  let planner: supertest.Agent;
  let otherOwner: supertest.Agent;

  beforeAll(async () => {
    h = await startHarness();
    owner = (await newFirm(h)).agent;
    planner = (await addMember(h, owner, "planner")).agent;
    otherOwner = (await newFirm(h, "Other firm")).agent;
  });
  afterAll(async () => h.close());

  it("lists the built-in constructions with ratings computed by the engine, and the source library", async () => {
    const res = await planner.get("/api/v1/catalogue");
    expect(res.status).toBe(200);
    expect(res.body.constructions.length).toBeGreaterThan(15);
    for (const c of res.body.constructions) {
      expect(c.tlDb).toHaveLength(21);
      expect(c.ratings.stc).toBeGreaterThan(10);
      expect(c.source.note.length).toBeGreaterThan(5);
    }
    expect(res.body.sources.map((s: { id: string }) => s.id)).toContain("speech-normal");
  });

  it("previews lab data with its ratings before saving: TL on the contour at 50 dB rates STC 52", async () => {
    const res = await owner.post("/api/v1/catalogue/constructions/preview").send({ ...meta, csv: labCsv() });
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    // ASTM E413: TL equal to the contour set to 50 at 500 Hz → STC 52: two 1 dB steps up give 16 × 2 = 32 dB of deficiencies, the limit (engine-notes, derived).
    expect(res.body.construction.ratings.stc).toBe(52);
    expect(res.body.notes.join(" ")).toMatch(/50, 63, 80 Hz|not measured/);
    const listed = await owner.get("/api/v1/catalogue");
    expect(listed.body.constructions.some((c: { id: string }) => c.id === meta.id)).toBe(false);
  });

  it("refuses unreadable lab data with line numbers", async () => {
    const bad = labCsv().replace("500,50", "500,fifty");
    const res = await owner.post("/api/v1/catalogue/constructions/preview").send({ ...meta, csv: bad });
    expect(res.status).toBe(400);
    expect(res.body.error.details[0].line).toBeGreaterThan(1);
    expect(res.body.error.details[0].message).toMatch(/^Line \d+:/);
  });

  it("saves a firm construction, keeps it to the firm, refuses a duplicate id, and deletes it", async () => {
    const saved = await owner.post("/api/v1/catalogue/constructions").send({ ...meta, csv: labCsv() });
    expect(saved.status).toBe(201);
    expect(saved.body.origin).toBe("firm");
    const again = await owner.post("/api/v1/catalogue/constructions").send({ ...meta, csv: labCsv() });
    expect(again.status).toBe(409);
    const builtIn = await owner.post("/api/v1/catalogue/constructions").send({ ...meta, id: "masonry-brick-100", csv: labCsv() });
    expect(builtIn.status).toBe(409);
    expect((await owner.get("/api/v1/catalogue")).body.constructions.some((c: { id: string }) => c.id === meta.id)).toBe(true);
    expect((await otherOwner.get("/api/v1/catalogue")).body.constructions.some((c: { id: string }) => c.id === meta.id)).toBe(false);
    expect((await otherOwner.delete(`/api/v1/catalogue/constructions/${meta.id}`)).status).toBe(404);
    expect((await planner.post("/api/v1/catalogue/constructions").send({ ...meta, id: "planner-try", csv: labCsv() })).status).toBe(403);
    expect((await owner.delete(`/api/v1/catalogue/constructions/${meta.id}`)).status).toBe(204);
    expect((await owner.delete(`/api/v1/catalogue/constructions/${meta.id}`)).status).toBe(404);
  });
});
