import { createHash } from "node:crypto";
import sharp from "sharp";
import type supertest from "supertest";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { startS3Fake, type S3Fake } from "@hushmark/fakes";
import { addMember, newFirm, startHarness, type Harness } from "./harness.js";

const JOBS_SCHEMA = `pgboss_underlays_${process.pid}`;
const sha = (b: Buffer) => createHash("sha256").update(b).digest("hex");

function bytesOf(req: supertest.Test) {
  return req.buffer(true).parse((r, cb) => {
    const parts: Buffer[] = [];
    r.on("data", (c: Buffer) => parts.push(c));
    r.on("end", () => cb(null, Buffer.concat(parts)));
  });
}

describe("underlay images", () => {
  let s3: S3Fake;
  let h: Harness;
  let owner: supertest.Agent;
  let surveyor: supertest.Agent;
  let planner: supertest.Agent;
  let client: supertest.Agent;
  let projectId: string;
  let png: Buffer;

  const upload = (agent: supertest.Agent, file: Buffer, name: string, fields: Record<string, string> = {}) => {
    const req = agent.post(`/api/v1/projects/${projectId}/underlays`).set("x-hushmark-upload", "1");
    for (const [k, v] of Object.entries(fields)) req.field(k, v);
    return req.attach("file", file, name);
  };
  const storedCount = async () => (await h.dataSource.query("SELECT count(*)::int AS n FROM stored_files WHERE project_id = $1", [projectId]))[0].n as number;

  beforeAll(async () => {
    s3 = await startS3Fake();
    process.env.HUSHMARK_S3_ENDPOINT = s3.endpoint;
    process.env.HUSHMARK_S3_BUCKET = "hushmark-test";
    process.env.HUSHMARK_JOBS_SCHEMA = JOBS_SCHEMA;
    h = await startHarness({ underlays: { maxBytes: 400_000, maxPixels: 4_000_000 } });
    owner = (await newFirm(h, "Trace Firm")).agent;
    surveyor = (await addMember(h, owner, "surveyor")).agent;
    planner = (await addMember(h, owner, "planner")).agent;
    const c = await addMember(h, owner, "client");
    client = c.agent;
    projectId = (await owner.post("/api/v1/projects").send({ title: "Larchmere flat" })).body.id;
    await owner.post(`/api/v1/projects/${projectId}/clients`).send({ membershipId: c.membershipId });
    png = await sharp({ create: { width: 1600, height: 1000, channels: 3, background: "#f4f1ea" } })
      .composite([{ input: { create: { width: 1200, height: 700, channels: 3, background: "#1d2433" } }, top: 150, left: 200 }]).png().toBuffer();
  });
  afterAll(async () => {
    await h.close();
    const { createDataSource } = await import("../src/data-source.js");
    const ds = createDataSource(process.env.DATABASE_URL!, { poolSize: 1 });
    await ds.initialize();
    await ds.query(`DROP SCHEMA IF EXISTS ${JOBS_SCHEMA} CASCADE`);
    await ds.destroy();
    await s3.close();
  });

  it("stores an uploaded plan image with its size, and gives back the same bytes to the firm and the project's client", async () => {
    const res = await upload(surveyor, png, "agent plan.png", { name: "Agent's plan" });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ name: "Agent's plan", source: "image", page: null, contentType: "image/png", widthPx: 1600, heightPx: 1000, sizeBytes: png.length });
    const fromPdf = await upload(surveyor, png, "landlord.pdf.png", { source: "pdf-page", page: "2" });
    expect(fromPdf.status).toBe(201);
    expect(fromPdf.body).toMatchObject({ name: "landlord.pdf", source: "pdf-page", page: 2 });
    const list = await planner.get(`/api/v1/projects/${projectId}/underlays`);
    expect(list.body.underlays.map((u: { id: string }) => u.id)).toEqual([res.body.id, fromPdf.body.id]);
    for (const agent of [owner, planner, client]) {
      const img = await bytesOf(agent.get(`/api/v1/projects/${projectId}/underlays/${res.body.id}/image`));
      expect(img.status).toBe(200);
      expect(img.headers["content-type"]).toBe("image/png");
      expect(sha(img.body as Buffer)).toBe(sha(png));
    }
  });

  it("refuses what is not a readable image, and stores nothing", async () => {
    const before = await storedCount();
    const listed = (await owner.get(`/api/v1/projects/${projectId}/underlays`)).body.underlays.length;
    const text = await upload(surveyor, Buffer.from("a floor plan, honestly"), "plan.png");
    expect(text.status).toBe(415);
    const pdf = await upload(surveyor, Buffer.from("%PDF-1.7\n1 0 obj\n<< /Type /Catalog >>\nendobj\ntrailer\n<< /Root 1 0 R >>\n%%EOF\n"), "plan.pdf");
    expect(pdf.status).toBe(415);
    expect(pdf.body.error.message).toMatch(/PDF page .* is turned into one/);
    const truncated = await upload(surveyor, png.subarray(0, Math.floor(png.length / 2)), "cut.png");
    expect(truncated.status).toBe(415);
    expect(truncated.body.error.message).toMatch(/damaged or cut short/);
    expect(await storedCount()).toBe(before);
    expect((await owner.get(`/api/v1/projects/${projectId}/underlays`)).body.underlays).toHaveLength(listed);
  });

  it("refuses a file over the size limit and an image over the pixel limit with 413", async () => {
    const before = await storedCount();
    const noisy = await sharp(Buffer.from(Array.from({ length: 600 * 600 * 3 }, (_, i) => (i * 2654435761) % 251)), { raw: { width: 600, height: 600, channels: 3 } }).png({ compressionLevel: 0 }).toBuffer();
    expect(noisy.length).toBeGreaterThan(400_000);
    expect((await upload(surveyor, noisy, "big.png")).status).toBe(413);
    const huge = await sharp({ create: { width: 2100, height: 2100, channels: 3, background: "#ffffff" } }).png().toBuffer();
    const res = await upload(surveyor, huge, "huge.png");
    expect(res.status).toBe(413);
    expect(res.body.error.message).toMatch(/2100 × 2100 px/);
    expect(await storedCount()).toBe(before);
  });

  it("lets only the firm's writers upload and delete; other firms and other clients see nothing", async () => {
    expect((await upload(planner, png, "p.png")).status).toBe(403);
    expect((await upload(client, png, "p.png")).status).toBe(403);
    const id = (await owner.get(`/api/v1/projects/${projectId}/underlays`)).body.underlays[0].id;
    const other = (await newFirm(h, "Elsewhere Firm")).agent;
    expect((await other.get(`/api/v1/projects/${projectId}/underlays`)).status).toBe(404);
    expect((await other.get(`/api/v1/projects/${projectId}/underlays/${id}/image`)).status).toBe(404);
    const otherProject = (await owner.post("/api/v1/projects").send({ title: "Not shared" })).body.id;
    expect((await client.get(`/api/v1/projects/${otherProject}/underlays`)).status).toBe(404);
    expect((await owner.get(`/api/v1/projects/${otherProject}/underlays/${id}/image`)).status).toBe(404);
  });

  it("keeps a drawing the saved plan still places; deletes it for good once it is off the plan", async () => {
    const u = (await owner.get(`/api/v1/projects/${projectId}/underlays`)).body.underlays[0];
    const plan = (await surveyor.get(`/api/v1/projects/${projectId}/plan`)).body;
    const levelId = Object.values(plan.document.elements as Record<string, { type: string; id: string }>).find((e) => e.type === "level")!.id;
    const placed = { ...plan.document, underlays: [{ id: "u1", fileId: u.id, levelId, widthPx: 1600, heightPx: 1000, origin: { x: 0, y: 10 }, scaleMPerPx: 0.01, rotationDeg: 0, opacity: 0.5, locked: true, visible: true, calibrated: true, name: "" }] };
    const saved = await surveyor.put(`/api/v1/projects/${projectId}/plan`).send({ baseVersion: plan.version, document: placed });
    expect(saved.status).toBe(200);
    expect((await owner.get(`/api/v1/projects/${projectId}/plan`)).body.document.underlays[0]).toMatchObject({ fileId: u.id, scaleMPerPx: 0.01, locked: true });
    const refused = await surveyor.delete(`/api/v1/projects/${projectId}/underlays/${u.id}`);
    expect(refused.status).toBe(409);
    expect(refused.body.error.message).toMatch(/still on the plan/);
    const { underlays: _gone, ...off } = placed;
    expect((await surveyor.put(`/api/v1/projects/${projectId}/plan`).send({ baseVersion: saved.body.version, document: off })).status).toBe(200);
    const before = await storedCount();
    expect((await surveyor.delete(`/api/v1/projects/${projectId}/underlays/${u.id}`)).status).toBe(204);
    expect(await storedCount()).toBe(before - 1);
    expect((await owner.get(`/api/v1/projects/${projectId}/underlays/${u.id}/image`)).status).toBe(404);
  });
});
