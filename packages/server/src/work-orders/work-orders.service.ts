import { aWeightedLevelDb, ratingNc, spectrum } from "@hushmark/acoustics";
import type { Readable } from "node:stream";
import type { DataSource, EntityManager } from "typeorm";
import { In } from "typeorm";
import { proposalContentSchema, type ProposalContent, type Verification, type WorkOrder } from "@hushmark/schemas";
import type { Actor } from "../auth/actor.js";
import { recordAudit } from "../audit/audit.js";
import type { FilesService } from "../files/files.service.js";
import { StoredFile } from "../files/stored-file.entity.js";
import { HttpError, conflict, notFound } from "../http/errors.js";
import { PriceBookItem as PriceBookItemRow } from "../price-book/price-book-item.entity.js";
import type { ProjectsService } from "../projects/projects.service.js";
import type { ProposalsService } from "../proposals/proposals.service.js";
import { ProposalVersionRow } from "../proposals/proposal-version.entity.js";
import { ProposalRow } from "../proposals/proposal.entity.js";
import { renderClosingReport } from "./closing-report-pdf.js";
import { VerificationRow } from "./verification.entity.js";
import { workOrderDrafts } from "./work-order-plan.js";
import { WorkOrderRow, WorkOrderTaskRow } from "./work-order.entity.js";
import { advanceProjectStage } from "../projects/project-stage.js";

const round1 = (v: number) => Math.round(v * 10) / 10;

function single(levels: number[]): { dba: number; nc: number } {
  const s = spectrum("third-octave", levels);
  return { dba: round1(aWeightedLevelDb(s)), nc: ratingNc(s).value };
}

/** Work orders made on approval, their checklists, and the after-work verification. */
export function createWorkOrdersService(dataSource: DataSource, deps: { projects: ProjectsService; proposals: () => ProposalsService; files: FilesService }) {
  const orders = dataSource.getRepository(WorkOrderRow);
  const tasks = dataSource.getRepository(WorkOrderTaskRow);

  /** Called inside the approval's transaction: one work order per upgrade, with its checklist. */
  async function createForApproval(m: EntityManager, proposal: ProposalRow, content: ProposalContent): Promise<void> {
    const v = await m.getRepository(ProposalVersionRow).findOneByOrFail({ proposalId: proposal.id, version: proposal.currentVersion });
    const ids = [...new Set(content.evaluation.lines.map((l) => l.priceBookItemId))];
    const items = ids.length ? await m.getRepository(PriceBookItemRow).find({ where: { id: In(ids) } }) : [];
    const kinds = new Map(items.map((i) => [i.id, String((i.effect as { kind?: string }).kind ?? "")]));
    const drafts = workOrderDrafts(content, v.planDocument as { elements: Record<string, unknown> }, kinds);
    for (const [position, d] of drafts.entries()) {
      const inserted = await m.getRepository(WorkOrderRow).insert({ organizationId: proposal.organizationId, projectId: proposal.projectId, proposalId: proposal.id, position, title: d.title.slice(0, 200), elementId: d.elementId, elementName: d.elementName.slice(0, 200), materials: d.materials, steps: d.steps, cautions: d.cautions });
      const workOrderId = String(inserted.identifiers[0]?.id);
      await m.getRepository(WorkOrderTaskRow).insert(d.tasks.map((text, i) => ({ workOrderId, position: i, text, status: "todo" })));
    }
  }

  async function list(actor: Actor, projectId: string): Promise<WorkOrder[]> {
    await deps.projects.get(actor, projectId);
    const rows = await orders.find({ where: { projectId, organizationId: actor.organizationId }, order: { createdAt: "ASC", position: "ASC" } });
    if (rows.length === 0) return [];
    const all = await tasks.find({ where: { workOrderId: In(rows.map((r) => r.id)) }, order: { position: "ASC" } });
    const names: { id: string; display_name: string }[] = await dataSource.query("SELECT m.id, u.display_name FROM memberships m JOIN users u ON u.id = m.user_id WHERE m.organization_id = $1", [actor.organizationId]);
    const name = new Map(names.map((n) => [n.id, n.display_name]));
    return rows.map((r) => ({
      id: r.id, projectId: r.projectId, proposalId: r.proposalId, title: r.title, elementId: r.elementId, elementName: r.elementName, materials: r.materials, steps: r.steps, cautions: r.cautions,
      tasks: all.filter((t) => t.workOrderId === r.id).map((t) => ({ id: t.id, position: t.position, text: t.text, status: t.status as "todo" | "doing" | "done", assigneeMembershipId: t.assigneeMembershipId, assigneeName: t.assigneeMembershipId ? name.get(t.assigneeMembershipId) ?? null : null, updatedAt: t.updatedAt.toISOString() })),
    }));
  }

  async function updateTask(actor: Actor, taskId: string, input: { status?: "todo" | "doing" | "done" | undefined; assigneeMembershipId?: string | null | undefined; assignToMe?: true | undefined }): Promise<WorkOrder[]> {
    const { assignToMe, ...rest } = input;
    const patch = assignToMe ? { ...rest, assigneeMembershipId: actor.membershipId } : rest;
    const task = await tasks.findOne({ where: { id: taskId } });
    const order = task ? await orders.findOne({ where: { id: task.workOrderId, organizationId: actor.organizationId } }) : null;
    if (!task || !order) throw notFound("That checklist item");
    if (patch.assigneeMembershipId) {
      const member: unknown[] = await dataSource.query("SELECT 1 FROM memberships WHERE id = $1 AND organization_id = $2 AND role <> 'client'", [patch.assigneeMembershipId, actor.organizationId]);
      if (member.length === 0) throw new HttpError(400, "invalid_input", "Assign the item to someone on the firm's staff.", [{ path: "assigneeMembershipId", message: "Pick a person from the firm." }]);
    }
    await dataSource.transaction(async (m) => {
      await m.getRepository(WorkOrderTaskRow).update({ id: taskId }, { ...(patch.status ? { status: patch.status } : {}), ...(patch.assigneeMembershipId !== undefined ? { assigneeMembershipId: patch.assigneeMembershipId } : {}) });
      // Work has started once a checklist item moves after the deposit.
      if (patch.status && patch.status !== "todo") {
        await m.getRepository(ProposalRow).update({ id: order.proposalId, status: "deposit_paid" }, { status: "in_progress" });
        await advanceProjectStage(m, order.projectId, "in_progress");
      }
      await recordAudit(m, { organizationId: actor.organizationId, actorUserId: actor.userId, action: "work_order.task_changed", entityType: "work_order", entityId: order.id, data: { taskId, ...patch } });
    });
    return list(actor, order.projectId);
  }

  async function contentOf(proposalId: string): Promise<{ row: ProposalRow; content: ProposalContent }> {
    const row = await dataSource.getRepository(ProposalRow).findOneByOrFail({ id: proposalId });
    const v = await dataSource.getRepository(ProposalVersionRow).findOneByOrFail({ proposalId, version: row.currentVersion });
    return { row, content: proposalContentSchema.parse(v.content) };
  }

  function verificationDto(r: VerificationRow, content: ProposalContent): Verification {
    const before = single(r.beforeLevelsDb);
    const after = single(r.afterLevelsDb);
    const ev = content.evaluation;
    const measuredGain = round1(before.dba - after.dba);
    const predictedGain = round1(ev.before.dba - ev.after.dba);
    const t = ev.target;
    const met = t ? (t.kind === "nc" ? after.nc <= t.value : t.kind === "dba" ? after.dba <= t.value : measuredGain >= t.value) : null;
    const diff = round1(measuredGain - predictedGain);
    const closeness = Math.abs(diff) <= 3 ? "close to the predicted" : diff > 0 ? `${diff} dB better than the predicted` : `${-diff} dB short of the predicted`;
    return {
      id: r.id, proposalId: r.proposalId, before, after,
      predicted: { beforeDba: round1(ev.before.dba), afterDba: round1(ev.after.dba) },
      bands: { beforeDb: r.beforeLevelsDb, afterDb: r.afterLevelsDb, predictedAfterDb: ev.after.levelsDb },
      measuredGainDb: measuredGain, predictedGainDb: predictedGain,
      target: t && met !== null ? { kind: t.kind, value: t.value, met } : null,
      summary: `Measured in ${ev.receiver.name}: from ${before.dba} to ${after.dba} dBA (${measuredGain} dB quieter), ${closeness} drop of ${predictedGain} dB.${t ? (met ? " The target is met." : " The target is not met yet.") : ""}`,
      note: r.note,
      createdAt: r.createdAt.toISOString(),
    };
  }

  async function verify(actor: Actor, projectId: string, input: { proposalId: string; beforeLevelsDb: number[]; afterLevelsDb: number[]; note: string }): Promise<Verification> {
    await deps.projects.get(actor, projectId);
    const { row, content } = await contentOf(input.proposalId).catch(() => {
      throw notFound("That proposal");
    });
    if (row.projectId !== projectId || row.organizationId !== actor.organizationId) throw notFound("That proposal");
    if (!["deposit_paid", "in_progress", "verified"].includes(row.status)) throw conflict("not_started", "Verify after the work: the proposal's deposit is not paid yet.");
    const id = await dataSource.transaction(async (m) => {
      const inserted = await m.getRepository(VerificationRow).insert({ organizationId: actor.organizationId, projectId, proposalId: row.id, beforeLevelsDb: input.beforeLevelsDb, afterLevelsDb: input.afterLevelsDb, note: input.note, createdById: actor.userId });
      await m.getRepository(ProposalRow).update({ id: row.id }, { status: "verified" });
      await advanceProjectStage(m, projectId, "verified");
      await recordAudit(m, { organizationId: actor.organizationId, actorUserId: actor.userId, action: "proposal.verified", entityType: "proposal", entityId: row.id, data: {} });
      return String(inserted.identifiers[0]?.id);
    });
    return verificationDto(await dataSource.getRepository(VerificationRow).findOneByOrFail({ id }), content);
  }

  async function verifications(actor: Actor, projectId: string): Promise<{ row: VerificationRow; dto: Verification; content: ProposalContent }[]> {
    await deps.projects.get(actor, projectId);
    const rows = await dataSource.getRepository(VerificationRow).find({ where: { projectId, organizationId: actor.organizationId }, order: { createdAt: "DESC" } });
    const out = [];
    for (const r of rows) {
      const { content } = await contentOf(r.proposalId);
      out.push({ row: r, dto: verificationDto(r, content), content });
    }
    return out;
  }

  /**
   * The closing report of a verification, streamed from object storage. It is rendered and stored
   * on its first download (a verification never changes); when two downloads race, the first to
   * record its file keeps it and the other removes its own object.
   */
  async function closingReport(actor: Actor, projectId: string, verificationId: string): Promise<{ body: Readable; sizeBytes: number; filename: string }> {
    const found = (await verifications(actor, projectId)).find((v) => v.row.id === verificationId);
    if (!found) throw notFound("That verification");
    const filename = `closing-report-${verificationId.slice(0, 8)}.pdf`;
    const files = deps.files;
    let file = found.row.reportFileId ? await dataSource.getRepository(StoredFile).findOneBy({ id: found.row.reportFileId }) : null;
    if (!file) {
      const made = await files.store({ organizationId: found.row.organizationId, userId: null }, projectId, files.fromBuffer(await renderClosingReport(found.dto, found.content), { contentType: "application/pdf", originalName: filename }));
      const taken = await dataSource.getRepository(VerificationRow).createQueryBuilder().update().set({ reportFileId: made.id }).where("id = :id AND report_file_id IS NULL", { id: verificationId }).execute();
      if (taken.affected === 0) {
        await (await dataSource.transaction((m) => files.remove(m, made)))();
        const again = await dataSource.getRepository(VerificationRow).findOneByOrFail({ id: verificationId });
        file = await dataSource.getRepository(StoredFile).findOneByOrFail({ id: again.reportFileId ?? "" });
      } else file = made;
    }
    return { body: await files.open(file), sizeBytes: file.sizeBytes, filename };
  }

  return { createForApproval, list, updateTask, verify, verifications, closingReport };
}

export type WorkOrdersService = ReturnType<typeof createWorkOrdersService>;
