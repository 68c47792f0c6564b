import { ListObjectsV2Command, S3Client } from "@aws-sdk/client-s3";
import { PDFParse } from "pdf-parse";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createCatalogueService } from "../src/catalogue/catalogue.service.js";
import { loadConfig } from "../src/config.js";
import { createFilesService } from "../src/files/files.service.js";
import { createObjectStorage, type ObjectStorage } from "../src/files/object-storage.js";
import { StoredFile } from "../src/files/stored-file.entity.js";
import { PdfsInObjectStorage1796159000000 } from "../src/migrations/1796159000000-PdfsInObjectStorage.js";
import { renderProposalVersion } from "../src/proposals/proposal-pdf-job.js";
import { demoPlan, pricedProject, SETUP, startMoneyHarness, until, type MoneyHarness } from "./money-harness.js";

const BUCKET = "hushmark-money-test";

async function pdfText(bytes: Buffer): Promise<string> {
  const parser = new PDFParse({ data: new Uint8Array(bytes) });
  const text = (await parser.getText()).text;
  await parser.destroy();
  return text;
}

async function readAll(stream: AsyncIterable<unknown>): Promise<Buffer> {
  const parts: Buffer[] = [];
  for await (const chunk of stream) parts.push(chunk as Buffer);
  return Buffer.concat(parts);
}

const binary = (res: { on: (e: string, f: (d?: Buffer) => void) => void }, cb: (err: Error | null, body: Buffer) => void) => {
  const chunks: Buffer[] = [];
  res.on("data", (d) => chunks.push(d!));
  res.on("end", () => cb(null, Buffer.concat(chunks)));
};

const money = (v: number) => new Intl.NumberFormat("en-US", { style: "currency", currency: "USD" }).format(v);

describe("proposal PDFs and closing reports in object storage", () => {
  let h: MoneyHarness;
  let p: Awaited<ReturnType<typeof pricedProject>>;
  let storage: ObjectStorage;
  let s3: S3Client;
  let proposalId: string;
  let content: { total: number; subtotal: number; lines: { description: string; amount: number }[]; planShares: { before: Record<string, number>; after: Record<string, number> } };

  /** Keys of the project's objects in the store, and its file records that are PDFs. */
  const objects = async () => ((await s3.send(new ListObjectsV2Command({ Bucket: BUCKET, Prefix: `projects/${p.projectId}/` }))).Contents ?? []).map((o) => o.Key!);
  const pdfRecords = () => h.dataSource.getRepository(StoredFile).find({ where: { projectId: p.projectId, contentType: "application/pdf" } });
  const download = async (path: string) => {
    const r = await p.planner.get(path).buffer(true).parse(binary as never);
    return r.status === 200 ? (r.body as Buffer) : undefined;
  };

  beforeAll(async () => {
    h = await startMoneyHarness();
    p = await pricedProject(h);
    const s3Config = loadConfig({ ...process.env, HUSHMARK_S3_ENDPOINT: h.s3.endpoint, HUSHMARK_S3_BUCKET: BUCKET }).s3;
    storage = createObjectStorage(s3Config);
    s3 = new S3Client({ region: s3Config.region, endpoint: s3Config.endpoint!, forcePathStyle: true, credentials: { accessKeyId: "S3RVER", secretAccessKey: "S3RVER" } });
    const scenario = await p.planner.post(`/api/v1/projects/${p.projectId}/scenarios`).send({
      name: "Seal the door", setup: SETUP(p.planVersion),
      items: [{ priceBookItemId: p.byCode("door-bottom-auto").id, elementId: "door-studio" }, { priceBookItemId: p.byCode("outlet-putty-pads").id, elementId: "outlet-party" }],
    });
    expect(scenario.status).toBe(201);
    const made = await p.planner.post(`/api/v1/projects/${p.projectId}/proposals`).send({ scenarioId: scenario.body.id });
    expect(made.status).toBe(201);
    proposalId = made.body.id;
    content = made.body.content;
  });
  afterAll(async () => {
    storage.close();
    s3.destroy();
    await h.close();
  });

  it("keeps the PDF as one object with its record, no bytes in the database, and reads back its totals and line items", async () => {
    const pdf = await until("the PDF", () => download(`/api/v1/proposals/${proposalId}/versions/1/pdf`));
    const text = await pdfText(pdf);
    expect(text).toContain(money(content.total));
    expect(text).toContain(money(content.subtotal));
    for (const line of content.lines) expect(text).toContain(line.description.slice(0, 20));
    const records = await pdfRecords();
    expect(records).toHaveLength(1);
    expect(records[0]!.sizeBytes).toBe(pdf.length);
    expect(await objects()).toEqual([records[0]!.objectKey]);
    const columns: { column_name: string }[] = await h.dataSource.query(`SELECT column_name FROM information_schema.columns WHERE table_name = 'proposal_versions'`);
    expect(columns.map((c) => c.column_name)).not.toContain("pdf");
    expect(columns.map((c) => c.column_name)).toContain("pdf_file_id");
  });

  it("keeps each element's share before and after the work for the client's plan: the upgraded door lets through less", () => {
    const { before, after } = content.planShares;
    expect(Object.keys(before).length).toBeGreaterThan(5);
    expect(Object.keys(after).sort()).toEqual(Object.keys(before).sort());
    // Each is a fraction of the energy at the receiver.
    for (const v of [...Object.values(before), ...Object.values(after)]) expect(v >= 0 && v <= 1).toBe(true);
    expect(after["door-studio"]!).toBeLessThan(before["door-studio"]!);
  });

  it("a rerun of the job stores nothing more, and two runs racing leave one object", async () => {
    const files = createFilesService(h.dataSource, storage);
    const catalogues = createCatalogueService(h.dataSource);
    const [before] = await pdfRecords();
    await renderProposalVersion(h.dataSource, catalogues, files, { proposalId, version: 1 });
    expect((await pdfRecords()).map((r) => r.id)).toEqual([before!.id]);
    expect(await objects()).toHaveLength(1);

    // As after a lost record: the version has no PDF, and two workers render it at once.
    await (await h.dataSource.transaction((m) => files.remove(m, before!)))();
    expect(await objects()).toHaveLength(0);
    await Promise.all([1, 2].map(() => renderProposalVersion(h.dataSource, catalogues, files, { proposalId, version: 1 })));
    const after = await pdfRecords();
    expect(after).toHaveLength(1);
    expect(await objects()).toEqual([after[0]!.objectKey]);
    const again = await download(`/api/v1/proposals/${proposalId}/versions/1/pdf`);
    expect(await pdfText(again!)).toContain(money(content.total));
  });

  it("a run after one killed between storing its PDF and recording it removes the unrecorded file", async () => {
    const files = createFilesService(h.dataSource, storage);
    const catalogues = createCatalogueService(h.dataSource);
    const [recorded] = await pdfRecords();
    const [project] = await h.dataSource.query("SELECT project_id FROM proposals WHERE id = $1", [proposalId]);
    // What the killed run left: its file stored, and the version still without a PDF.
    await (await h.dataSource.transaction((m) => files.remove(m, recorded!)))();
    const orphan = await files.store({ organizationId: recorded!.organizationId, userId: null }, project.project_id, files.fromBuffer(Buffer.from("%PDF-1.7 killed run"), { contentType: "application/pdf", originalName: recorded!.originalName }));
    // A person's upload under the same name is not the job's to remove.
    const upload = await files.store({ organizationId: recorded!.organizationId, userId: (await h.dataSource.query("SELECT user_id FROM memberships WHERE organization_id = $1 LIMIT 1", [recorded!.organizationId]))[0].user_id }, project.project_id, files.fromBuffer(Buffer.from("%PDF-1.7 uploaded"), { contentType: "application/pdf", originalName: recorded!.originalName }));
    await renderProposalVersion(h.dataSource, catalogues, files, { proposalId, version: 1 });
    const after = (await pdfRecords()).filter((r) => r.id !== upload.id);
    expect(after).toHaveLength(1);
    expect(after[0]!.id).not.toBe(orphan.id);
    const [v] = await h.dataSource.query("SELECT pdf_file_id FROM proposal_versions WHERE proposal_id = $1 AND version = 1", [proposalId]);
    expect(v.pdf_file_id).toBe(after[0]!.id);
    expect((await objects()).sort()).toEqual([after[0]!.objectKey, upload.objectKey].sort());
    await (await h.dataSource.transaction((m) => files.remove(m, upload)))();
  });

  it("stores a closing report once, however often and however concurrently it is downloaded", async () => {
    await h.dataSource.query(`UPDATE proposals SET status = 'deposit_paid' WHERE id = $1`, [proposalId]);
    const before = Array.from({ length: 21 }, (_, i) => 50 - i * 0.5);
    const v = await p.owner.post(`/api/v1/projects/${p.projectId}/verifications`).send({ proposalId, beforeLevelsDb: before, afterLevelsDb: before.map((x) => x - 7) });
    expect(v.status, JSON.stringify(v.body)).toBe(201);
    const path = `/api/v1/projects/${p.projectId}/verifications/${v.body.id}/report`;
    const reports = await Promise.all([download(path), download(path), download(path)]);
    expect((await download(path))!.equals(reports[0]!)).toBe(true);
    for (const r of reports) expect(r!.equals(reports[0]!)).toBe(true);
    expect(await pdfText(reports[0]!)).toContain(`Measured drop: ${v.body.measuredGainDb} dB`);
    const records = (await pdfRecords()).filter((r) => r.originalName.startsWith("closing-report"));
    expect(records).toHaveLength(1);
    expect(await objects()).toHaveLength(2); // the proposal's PDF and the report
  });

  it("shows the client the plan the version was made on, not the plan as changed since", async () => {
    const now = await p.owner.get(`/api/v1/projects/${p.projectId}/plan`);
    const changed = await p.owner.put(`/api/v1/projects/${p.projectId}/plan`).send({ baseVersion: now.body.version, document: { ...demoPlan, name: "Changed after the proposal" } });
    expect(changed.status).toBe(200);
    const shown = await p.planner.get(`/api/v1/proposals/${proposalId}`);
    expect(shown.status).toBe(200);
    expect(shown.body.planDocument.name).toBe(demoPlan.name);
    expect(Object.keys(shown.body.planDocument.elements)).toContain("door-studio");
  });

  it("the migration moves existing PDF bytes to the store and back", async () => {
    const migration = new PdfsInObjectStorage1796159000000();
    const previous = { endpoint: process.env.HUSHMARK_S3_ENDPOINT, bucket: process.env.HUSHMARK_S3_BUCKET };
    process.env.HUSHMARK_S3_ENDPOINT = h.s3.endpoint;
    process.env.HUSHMARK_S3_BUCKET = BUCKET;
    const runner = h.dataSource.createQueryRunner();
    // In one transaction that is rolled back: the shared test database also holds other files'
    // proposals, whose PDFs are in stores that are gone, so they are set aside first.
    await runner.startTransaction();
    try {
      await runner.query(`UPDATE proposal_versions SET pdf_file_id = NULL WHERE proposal_id <> $1`, [proposalId]);
      await runner.query(`UPDATE verifications SET report_file_id = NULL WHERE proposal_id <> $1`, [proposalId]);
      const [stored] = (await pdfRecords()).filter((r) => r.originalName.startsWith("proposal-"));
      const bytes = await readAll(await storage.get(stored!.objectKey));
      await migration.down(runner);
      const [row] = await runner.query(`SELECT pdf FROM proposal_versions WHERE proposal_id = $1 AND version = 1`, [proposalId]);
      expect(Buffer.from(row.pdf).equals(bytes)).toBe(true);
      const [{ count }] = await runner.query(`SELECT count(*)::int AS count FROM stored_files WHERE project_id = $1 AND content_type = 'application/pdf'`, [p.projectId]);
      expect(count).toBe(0);

      await migration.up(runner);
      const [moved] = await runner.query(`SELECT f.object_key, f.size_bytes, f.sha256, f.state FROM proposal_versions v JOIN stored_files f ON f.id = v.pdf_file_id WHERE v.proposal_id = $1 AND v.version = 1`, [proposalId]);
      expect(moved.object_key).not.toBe(stored!.objectKey);
      expect(moved.state).toBe("stored");
      expect(Number(moved.size_bytes)).toBe(bytes.length);
      expect(moved.sha256).toBe(stored!.sha256);
      expect((await readAll(await storage.get(moved.object_key))).equals(bytes)).toBe(true);
      const columns: { column_name: string }[] = await runner.query(`SELECT column_name FROM information_schema.columns WHERE table_name = 'proposal_versions'`);
      expect(columns.map((c) => c.column_name)).not.toContain("pdf");
    } finally {
      await runner.rollbackTransaction();
      await runner.release();
      process.env.HUSHMARK_S3_ENDPOINT = previous.endpoint;
      process.env.HUSHMARK_S3_BUCKET = previous.bucket;
      if (previous.endpoint === undefined) delete process.env.HUSHMARK_S3_ENDPOINT;
      if (previous.bucket === undefined) delete process.env.HUSHMARK_S3_BUCKET;
    }
    // Rolled back: the version still serves the PDF it had.
    expect(await download(`/api/v1/proposals/${proposalId}/versions/1/pdf`)).toBeDefined();
  });
});
