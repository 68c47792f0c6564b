import { createHash, randomUUID } from "node:crypto";
import type { MigrationInterface, QueryRunner } from "typeorm";
import type { ObjectStorage } from "../files/object-storage.js";
import { storageFromEnvironment } from "../files/storage-from-env.js";

async function readAll(stream: AsyncIterable<unknown>): Promise<Buffer> {
  const parts: Buffer[] = [];
  for await (const chunk of stream) parts.push(chunk as Buffer);
  return Buffer.concat(parts);
}

/**
 * Proposal PDFs move from a bytea column to object storage (a `stored_files` record each), and
 * verifications get a column for their stored closing report. Existing PDFs are copied to the
 * store named by the environment (HUSHMARK_S3_*) before the column goes; the store is only
 * contacted when there are PDFs to move. If the migration fails after some puts, its transaction
 * rolls back and those objects are left under keys nothing names (harmless; run it again).
 */
export class PdfsInObjectStorage1796159000000 implements MigrationInterface {
  name = "PdfsInObjectStorage1796159000000";

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "proposal_versions" ADD "pdf_file_id" uuid`);
    await queryRunner.query(`ALTER TABLE "verifications" ADD "report_file_id" uuid`);
    await queryRunner.query(`ALTER TABLE "proposal_versions" ADD CONSTRAINT "FK_40c1f6b6b5e414ec953a553706a" FOREIGN KEY ("pdf_file_id") REFERENCES "stored_files"("id") ON DELETE SET NULL ON UPDATE NO ACTION`);
    await queryRunner.query(`ALTER TABLE "verifications" ADD CONSTRAINT "FK_6187a03055e9e3335b604cc2230" FOREIGN KEY ("report_file_id") REFERENCES "stored_files"("id") ON DELETE SET NULL ON UPDATE NO ACTION`);

    const rows: { proposal_id: string; version: number; pdf: Buffer; organization_id: string; project_id: string }[] = await queryRunner.query(
      `SELECT v.proposal_id, v.version, v.pdf, p.organization_id, p.project_id FROM proposal_versions v JOIN proposals p ON p.id = v.proposal_id WHERE v.pdf IS NOT NULL`,
    );
    let storage: ObjectStorage | null = null;
    try {
      for (const r of rows) {
        storage ??= storageFromEnvironment();
        const id = randomUUID();
        const key = `projects/${r.project_id}/files/${id}`;
        await storage.put(key, r.pdf, r.pdf.length, "application/pdf");
        await queryRunner.query(
          `INSERT INTO stored_files (id, organization_id, project_id, object_key, content_type, size_bytes, sha256, original_name, state) VALUES ($1, $2, $3, $4, 'application/pdf', $5, $6, $7, 'stored')`,
          [id, r.organization_id, r.project_id, key, r.pdf.length, createHash("sha256").update(r.pdf).digest("hex"), `proposal-${r.proposal_id.slice(0, 8)}-v${r.version}.pdf`],
        );
        await queryRunner.query(`UPDATE proposal_versions SET pdf_file_id = $1 WHERE proposal_id = $2 AND version = $3`, [id, r.proposal_id, r.version]);
      }
    } finally {
      (storage as ObjectStorage | null)?.close();
    }
    await queryRunner.query(`ALTER TABLE "proposal_versions" DROP COLUMN "pdf"`);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "proposal_versions" ADD "pdf" bytea`);
    const rows: { proposal_id: string; version: number; id: string; object_key: string }[] = await queryRunner.query(
      `SELECT v.proposal_id, v.version, f.id, f.object_key FROM proposal_versions v JOIN stored_files f ON f.id = v.pdf_file_id`,
    );
    // The objects stay in the store (a rolled-back down must not lose them); closing reports are rendered on request again.
    const reports: { id: string; object_key: string }[] = await queryRunner.query(`SELECT f.id, f.object_key FROM verifications r JOIN stored_files f ON f.id = r.report_file_id`);
    let storage: ObjectStorage | null = null;
    try {
      for (const r of rows) {
        storage ??= storageFromEnvironment();
        await queryRunner.query(`UPDATE proposal_versions SET pdf = $1 WHERE proposal_id = $2 AND version = $3`, [await readAll(await storage.get(r.object_key)), r.proposal_id, r.version]);
      }
      await queryRunner.query(`ALTER TABLE "verifications" DROP CONSTRAINT "FK_6187a03055e9e3335b604cc2230"`);
      await queryRunner.query(`ALTER TABLE "proposal_versions" DROP CONSTRAINT "FK_40c1f6b6b5e414ec953a553706a"`);
      const ids = [...rows, ...reports].map((r) => r.id);
      if (ids.length) await queryRunner.query(`DELETE FROM stored_files WHERE id = ANY($1::uuid[])`, [ids]);
      await queryRunner.query(`ALTER TABLE "proposal_versions" DROP COLUMN "pdf_file_id"`);
      await queryRunner.query(`ALTER TABLE "verifications" DROP COLUMN "report_file_id"`);
    } finally {
      (storage as ObjectStorage | null)?.close();
    }
  }
}
