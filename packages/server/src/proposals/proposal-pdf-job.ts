import type { Logger } from "pino";
import type { DataSource } from "typeorm";
import { proposalContentSchema, scenarioSetupSchema } from "@hushmark/schemas";
import type { CatalogueService } from "../catalogue/catalogue.service.js";
import type { FilesService } from "../files/files.service.js";
import type { QueueSpec } from "../jobs/job-queue.js";
import { planShares } from "./plan-shares.js";
import { renderProposalPdf } from "./proposal-pdf.js";
import { StoredFile } from "../files/stored-file.entity.js";
import { ProposalVersionRow } from "./proposal-version.entity.js";
import { ProposalRow } from "./proposal.entity.js";

export const PROPOSAL_PDF_QUEUE = "proposal-pdf";

export interface ProposalPdfJob {
  proposalId: string;
  version: number;
}

/**
 * Renders one proposal version to PDF and stores it in object storage. Safe to run again: a
 * version that has its PDF is left alone, and of two runs racing only the first to record its
 * file keeps it (the other removes its own object). The record is only taken while the version
 * still holds the content that was drawn, so a render of content revised meanwhile is dropped.
 */
export async function renderProposalVersion(dataSource: DataSource, catalogues: CatalogueService, files: FilesService, job: ProposalPdfJob): Promise<void> {
  const versions = dataSource.getRepository(ProposalVersionRow);
  const v = await versions.findOne({ where: { proposalId: job.proposalId, version: job.version } });
  const proposal = await dataSource.getRepository(ProposalRow).findOne({ where: { id: job.proposalId } });
  if (!v || !proposal || v.pdfFileId) return;
  const originalName = `proposal-${proposal.id.slice(0, 8)}-v${job.version}.pdf`;
  if (!(await removeLeftovers(dataSource, files, job, proposal.projectId, originalName))) return;
  const content = proposalContentSchema.parse(v.content);
  const setup = scenarioSetupSchema.parse(v.scenarioSnapshot.setup);
  const { catalogue } = await catalogues.catalogueFor(proposal.organizationId);
  const { prepared, before, after } = await planShares(dataSource, catalogue, v.planDocument, setup, v.scenarioSnapshot.items);
  const markers = new Map<string, number>();
  for (const l of content.evaluation.lines) if (!markers.has(l.elementId)) markers.set(l.elementId, markers.size + 1);
  const pdf = await renderProposalPdf({ content, version: job.version, prepared, receiverId: setup.receiverId, sharesBefore: before, sharesAfter: after, markers });
  const file = await files.store({ organizationId: proposal.organizationId, userId: null }, proposal.projectId, files.fromBuffer(pdf, { contentType: "application/pdf", originalName }));
  const taken = await versions
    .createQueryBuilder()
    .update()
    .set({ pdfFileId: file.id, pdfStatus: "ready", pdfError: null })
    .where("proposal_id = :id AND version = :version AND pdf_file_id IS NULL AND content = CAST(:content AS jsonb)", { id: job.proposalId, version: job.version, content: JSON.stringify(v.content) })
    .execute()
    .catch((error: unknown) => {
      if (isMissingReference(error)) return { affected: 0 };
      throw error;
    });
  if (taken.affected === 0) {
    const undo = await dataSource.transaction((m) => files.remove(m, file));
    await undo();
  }
}

/**
 * A run killed after storing its PDF and before recording it leaves a file no version points at;
 * the next run of the same job removes it first. Only files the job itself made are candidates:
 * made by no person, under this version's name, and not any version's PDF. The version's row is
 * locked meanwhile, so a run recording its file waits, and a version that has its PDF by then is
 * left alone (answers false: nothing left to do).
 */
async function removeLeftovers(dataSource: DataSource, files: FilesService, job: ProposalPdfJob, projectId: string, originalName: string): Promise<boolean> {
  const undo = await dataSource.transaction(async (m) => {
    const [row] = (await m.query("SELECT pdf_file_id FROM proposal_versions WHERE proposal_id = $1 AND version = $2 FOR UPDATE", [job.proposalId, job.version])) as { pdf_file_id: string | null }[];
    if (!row || row.pdf_file_id) return undefined;
    const left = await m
      .getRepository(StoredFile)
      .createQueryBuilder("f")
      .where("f.projectId = :projectId AND f.originalName = :originalName AND f.createdById IS NULL", { projectId, originalName })
      .andWhere("NOT EXISTS (SELECT 1 FROM proposal_versions pv WHERE pv.pdf_file_id = f.id)")
      .getMany();
    const undos: (() => Promise<void>)[] = [];
    for (const file of left) undos.push(await files.remove(m, file));
    return async () => {
      for (const u of undos) await u();
    };
  });
  if (!undo) return false;
  await undo();
  return true;
}

/** True for a foreign-key violation: the file a run meant to record was removed by another run. */
const isMissingReference = (error: unknown) => (error as { driverError?: { code?: string } }).driverError?.code === "23503";

export function proposalPdfQueue(dataSource: DataSource, catalogues: CatalogueService, files: FilesService, logger: Logger): QueueSpec<ProposalPdfJob> {
  return {
    name: PROPOSAL_PDF_QUEUE,
    retryLimit: 3,
    retryDelaySeconds: 5,
    expireInSeconds: 120,
    handler: async (job) => {
      try {
        await renderProposalVersion(dataSource, catalogues, files, job.data);
      } catch (e) {
        logger.error({ err: e, job: job.data }, "proposal PDF failed");
        if (job.retryCount >= job.retryLimit) {
          await dataSource.getRepository(ProposalVersionRow).update({ proposalId: job.data.proposalId, version: job.data.version }, { pdfStatus: "failed", pdfError: (e as Error).message.slice(0, 500) });
          return;
        }
        throw e;
      }
    },
  };
}
