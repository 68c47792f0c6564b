import type { Readable } from "node:stream";
import type { DataSource, EntityManager } from "typeorm";
import { proposalContentSchema, STAFF_ROLES, type Proposal, type ProposalContent, type ProposalStatus, type ScenarioSetup } from "@hushmark/schemas";
import type { Actor } from "../auth/actor.js";
import { recordAudit } from "../audit/audit.js";
import { HttpError, conflict, notFound } from "../http/errors.js";
import type { CatalogueService } from "../catalogue/catalogue.service.js";
import type { FilesService } from "../files/files.service.js";
import { StoredFile } from "../files/stored-file.entity.js";
import { linkMail } from "../mail/mailer.js";
import type { Outbox } from "../outbox/outbox.js";
import type { PriceBookService } from "../price-book/price-book.service.js";
import type { ProjectsService } from "../projects/projects.service.js";
import { planDocumentAt } from "../scenarios/plan-at-version.js";
import type { ScenariosService } from "../scenarios/scenarios.service.js";
import { PaymentRow } from "../payments/payment.entity.js";
import { ProposalCommentRow } from "./proposal-comment.entity.js";
import { planShares, sharesRecord } from "./plan-shares.js";
import { proposalContent } from "./proposal-content.js";
import { ProposalVersionRow } from "./proposal-version.entity.js";
import { ProposalRow } from "./proposal.entity.js";
import { advanceProjectStage } from "../projects/project-stage.js";

export interface ProposalHooks {
  /** Queues the PDF of a version (a background job). */
  renderPdf(proposalId: string, version: number): Promise<void>;
  /** Makes the work orders of an approved proposal (inside the approval's transaction). */
  onApproved(manager: EntityManager, proposal: ProposalRow, content: ProposalContent): Promise<void>;
}

const isStaff = (actor: Actor) => STAFF_ROLES.includes(actor.role);

/** Proposals: versions frozen when sent, the client's comments and decision, and what the firm and the client see of them. */
export function createProposalsService(dataSource: DataSource, deps: { projects: ProjectsService; scenarios: ScenariosService; priceBook: PriceBookService; outbox: Outbox; files: FilesService; catalogue: CatalogueService; publicUrl: string; hooks: ProposalHooks }) {
  const proposals = dataSource.getRepository(ProposalRow);
  const versions = dataSource.getRepository(ProposalVersionRow);
  const comments = dataSource.getRepository(ProposalCommentRow);
  const payments = dataSource.getRepository(PaymentRow);
  const { projects, scenarios, priceBook, outbox, hooks } = deps;

  const portalUrl = (id: string) => `${deps.publicUrl}/portal/proposals/${id}`;

  /** The proposal if the caller may see it: staff of the firm, or a client of its project once a version was sent. */
  async function visible(actor: Actor, id: string): Promise<{ row: ProposalRow; version: number }> {
    const row = await proposals.findOne({ where: { id, organizationId: actor.organizationId } });
    if (!row) throw notFound("That proposal");
    await projects.get(actor, row.projectId).catch(() => {
      throw notFound("That proposal");
    });
    if (isStaff(actor)) return { row, version: row.currentVersion };
    const sent: { v: number | null }[] = await dataSource.query("SELECT max(version) AS v FROM proposal_versions WHERE proposal_id = $1 AND sent_at IS NOT NULL", [id]);
    const v = sent[0]?.v;
    if (!v) throw notFound("That proposal");
    return { row, version: Number(v) };
  }

  async function dto(row: ProposalRow, version: number, actor: Actor): Promise<Proposal> {
    const all = await versions.find({ where: { proposalId: row.id }, order: { version: "ASC" } });
    const shown = all.filter((v) => isStaff(actor) || v.sentAt !== null);
    const current = all.find((v) => v.version === version)!;
    const cs = await comments.find({ where: { proposalId: row.id }, order: { createdAt: "ASC" } });
    const ps = await payments.find({ where: { proposalId: row.id }, order: { createdAt: "ASC" } });
    // A client reading an older sent version while a new draft is made sees the state of what was sent.
    const status = (!isStaff(actor) && version !== row.currentVersion && row.status === "draft" ? "sent" : row.status) as ProposalStatus;
    return {
      id: row.id,
      projectId: row.projectId,
      scenarioId: row.scenarioId,
      status,
      currentVersion: version,
      content: proposalContentSchema.parse(current.content),
      planDocument: current.planDocument,
      versions: shown.map((v) => ({ version: v.version, createdAt: v.createdAt.toISOString(), sentAt: v.sentAt?.toISOString() ?? null, pdf: v.pdfStatus as "pending" | "ready" | "failed" })),
      comments: cs.map((c) => ({ id: c.id, version: c.version, kind: c.kind as "comment" | "changes_asked" | "approved", body: c.body, authorName: c.authorName, authorRole: c.authorRole, createdAt: c.createdAt.toISOString() })),
      payments: ps.map((p) => ({ id: p.id, version: p.version, amount: p.amountMinor / 100, currency: p.currency, status: p.status as "pending" | "paid" | "failed", failureMessage: p.failureMessage, createdAt: p.createdAt.toISOString(), paidAt: p.paidAt?.toISOString() ?? null })),
      approvedBy: row.approvedByName,
      approvedAt: row.approvedAt?.toISOString() ?? null,
      updatedAt: row.updatedAt.toISOString(),
    };
  }

  async function contentFor(actor: Actor, projectId: string, scenarioId: string, title: string, note: string, validUntil?: string) {
    const scenario = await scenarios.get(actor, projectId, scenarioId);
    if (scenario.items.length === 0) throw new HttpError(400, "invalid_input", "The scenario has no upgrades yet; add at least one before making a proposal.");
    // Re-evaluate so the proposal prices today's price book and the plan at the scenario's version.
    const fresh = await scenarios.update(actor, projectId, scenarioId, {});
    const project = await projects.get(actor, projectId);
    const settings = await priceBook.settings(actor.organizationId);
    const planDocument = await planDocumentAt(dataSource, projectId, fresh.setup.planVersion);
    const { catalogue } = await deps.catalogue.catalogueFor(actor.organizationId);
    const shares = await planShares(dataSource, catalogue, planDocument, fresh.setup, fresh.items);
    const content = {
      ...proposalContent({ title, note, project, firmName: actor.organizationName, settings, evaluation: fresh.evaluation!, planVersion: fresh.setup.planVersion, today: new Date(), ...(validUntil ? { validUntil } : {}) }),
      planShares: { before: sharesRecord(shares.before), after: sharesRecord(shares.after) },
    };
    return { content, planDocument, snapshot: { setup: fresh.setup as unknown as Record<string, unknown>, items: fresh.items } };
  }

  async function create(actor: Actor, projectId: string, input: { scenarioId: string; title?: string | undefined; note: string }): Promise<Proposal> {
    const scenario = await scenarios.get(actor, projectId, input.scenarioId);
    const title = input.title ?? `Sound insulation proposal — ${scenario.name}`;
    const made = await contentFor(actor, projectId, input.scenarioId, title, input.note);
    const id = await dataSource.transaction(async (m) => {
      const inserted = await m.getRepository(ProposalRow).insert({ organizationId: actor.organizationId, projectId, scenarioId: input.scenarioId, status: "draft", currentVersion: 1 });
      const pid = String(inserted.identifiers[0]?.id);
      await m.getRepository(ProposalVersionRow).insert({ proposalId: pid, version: 1, content: made.content as never, planDocument: made.planDocument as never, scenarioSnapshot: made.snapshot as never });
      await recordAudit(m, { organizationId: actor.organizationId, actorUserId: actor.userId, action: "proposal.created", entityType: "proposal", entityId: pid, data: { projectId, scenarioId: input.scenarioId } });
      return pid;
    });
    await hooks.renderPdf(id, 1);
    const row = await proposals.findOneByOrFail({ id });
    return dto(row, 1, actor);
  }

  async function list(actor: Actor, projectId: string | null) {
    const rows: { id: string; project_id: string; project_title: string; status: string; current_version: number; content: ProposalContent; updated_at: Date }[] = await dataSource.query(
      `SELECT p.id, p.project_id, pr.title AS project_title, p.status, p.current_version, v.content, p.updated_at
         FROM proposals p JOIN projects pr ON pr.id = p.project_id
         JOIN proposal_versions v ON v.proposal_id = p.id AND v.version = ${isStaff(actor) ? "p.current_version" : "(SELECT max(version) FROM proposal_versions s WHERE s.proposal_id = p.id AND s.sent_at IS NOT NULL)"}
        WHERE p.organization_id = $1 ${projectId ? "AND p.project_id = $2" : ""}
          ${isStaff(actor) ? "" : `AND EXISTS (SELECT 1 FROM project_clients pc WHERE pc.project_id = p.project_id AND pc.membership_id = $${projectId ? 3 : 2})`}
        ORDER BY p.updated_at DESC`,
      [actor.organizationId, ...(projectId ? [projectId] : []), ...(isStaff(actor) ? [] : [actor.membershipId])],
    );
    return rows.map((r) => ({ id: r.id, projectId: r.project_id, projectTitle: r.project_title, title: r.content.title, status: r.status as ProposalStatus, currentVersion: r.current_version, total: r.content.total, currency: r.content.currency, updatedAt: new Date(r.updated_at).toISOString() }));
  }

  async function update(actor: Actor, id: string, patch: { scenarioId?: string | undefined; title?: string | undefined; note?: string | undefined; validUntil?: string | undefined }): Promise<Proposal> {
    const { row } = await visible(actor, id);
    if (!["draft", "sent", "changes_asked"].includes(row.status)) throw conflict("proposal_locked", "This proposal is approved; make a new proposal for further changes.");
    const current = await versions.findOneByOrFail({ proposalId: id, version: row.currentVersion });
    const old = proposalContentSchema.parse(current.content);
    const scenarioId = patch.scenarioId ?? row.scenarioId;
    const made = await contentFor(actor, row.projectId, scenarioId, patch.title ?? old.title, patch.note ?? old.note, patch.validUntil ?? (patch.scenarioId ? undefined : old.validUntil));
    const next = current.sentAt ? row.currentVersion + 1 : row.currentVersion;
    let dropOldPdf: (() => Promise<void>) | null = null;
    await dataSource.transaction(async (m) => {
      if (current.sentAt) {
        await m.getRepository(ProposalVersionRow).insert({ proposalId: id, version: next, content: made.content as never, planDocument: made.planDocument as never, scenarioSnapshot: made.snapshot as never });
      } else {
        await m.getRepository(ProposalVersionRow).update({ proposalId: id, version: next }, { content: made.content as never, planDocument: made.planDocument as never, scenarioSnapshot: made.snapshot as never, pdfStatus: "pending", pdfError: null, pdfFileId: null });
        // The unsent version's old PDF shows content that is gone; its object goes once this commits.
        const old = current.pdfFileId ? await m.getRepository(StoredFile).findOneBy({ id: current.pdfFileId }) : null;
        if (old) dropOldPdf = await deps.files.remove(m, old);
      }
      await m.getRepository(ProposalRow).update({ id }, { currentVersion: next, scenarioId, status: "draft" });
      await recordAudit(m, { organizationId: actor.organizationId, actorUserId: actor.userId, action: "proposal.changed", entityType: "proposal", entityId: id, data: { version: next } });
    });
    await (dropOldPdf as (() => Promise<void>) | null)?.();
    await hooks.renderPdf(id, next);
    return dto(await proposals.findOneByOrFail({ id }), next, actor);
  }

  async function send(actor: Actor, id: string): Promise<Proposal> {
    const { row } = await visible(actor, id);
    const current = await versions.findOneByOrFail({ proposalId: id, version: row.currentVersion });
    if (current.sentAt) throw conflict("already_sent", `Version ${row.currentVersion} was sent already; change the proposal to make a new version, then send that.`);
    if (row.status !== "draft") throw conflict("proposal_locked", "Only a draft can be sent.");
    const project = await projects.get(actor, row.projectId);
    if (project.clients.length === 0) throw new HttpError(409, "no_client", "The project has no client to send the proposal to; add the client to the project first.");
    await dataSource.transaction(async (m) => {
      await m.getRepository(ProposalVersionRow).update({ proposalId: id, version: row.currentVersion }, { sentAt: new Date(), sentById: actor.userId });
      await m.getRepository(ProposalRow).update({ id }, { status: "sent" });
      await advanceProjectStage(m, row.projectId, "proposal");
      await recordAudit(m, { organizationId: actor.organizationId, actorUserId: actor.userId, action: "proposal.sent", entityType: "proposal", entityId: id, data: { version: row.currentVersion, to: project.clients.map((c) => c.email) } });
      const content = proposalContentSchema.parse(current.content);
      for (const client of project.clients) {
        await outbox.queue(m, {
          organizationId: actor.organizationId,
          kind: "proposal-sent",
          key: `proposal-sent:${id}:v${row.currentVersion}:${client.membershipId}`,
          ...linkMail(client.email, `${actor.organizationName}: proposal for ${project.title}`, [
            `Hello ${client.displayName},`,
            `${actor.organizationName} has sent you a proposal (version ${row.currentVersion}) for ${project.title}.`,
            content.predicted.summary,
            `Total ${content.currency} ${content.total.toFixed(2)}, valid until ${content.validUntil}. You can read it, comment, ask for changes or approve it in your portal.`,
          ], { label: "Open the proposal", url: portalUrl(id) }, "Predictions are estimates; the proposal explains their basis."),
        });
      }
    });
    outbox.kick();
    return dto(await proposals.findOneByOrFail({ id }), row.currentVersion, actor);
  }

  async function addComment(actor: Actor, id: string, kind: "comment" | "changes_asked" | "approved", body: string, version: number, m: EntityManager = dataSource.manager) {
    await m.getRepository(ProposalCommentRow).insert({ proposalId: id, version, kind, body, authorUserId: actor.userId, authorName: actor.displayName, authorRole: actor.role });
  }

  async function comment(actor: Actor, id: string, body: string): Promise<Proposal> {
    const { row, version } = await visible(actor, id);
    await addComment(actor, id, "comment", body, version);
    return dto(await proposals.findOneByOrFail({ id }), version, actor);
  }

  async function decide(actor: Actor, id: string, decision: "approved" | "changes_asked", readVersion: number, body: string): Promise<Proposal> {
    const { row, version } = await visible(actor, id);
    if (readVersion !== version) throw conflict("stale_version", `You read version ${readVersion}; the current version is ${version}. Reload and read it before deciding.`);
    if (row.currentVersion !== version) throw conflict("being_revised", "The firm is revising this proposal; the new version will reach you by e-mail.");
    if (row.status !== "sent") throw conflict("not_open", row.status === "approved" || row.status === "deposit_paid" ? "This proposal is approved already." : "This proposal is not waiting for a decision.");
    await dataSource.transaction(async (m) => {
      // The status check and the change happen in one statement so two decisions cannot both land.
      const res = await m.getRepository(ProposalRow).createQueryBuilder().update().set(decision === "approved" ? { status: "approved", approvedById: actor.userId, approvedByName: actor.displayName, approvedAt: new Date() } : { status: "changes_asked" }).where("id = :id AND status = 'sent' AND current_version = :v", { id, v: version }).execute();
      if (!res.affected) throw conflict("not_open", "This proposal changed while you were deciding; reload it.");
      if (decision === "approved") await advanceProjectStage(m, row.projectId, "approved");
      await addComment(actor, id, decision, body || (decision === "approved" ? "Approved." : ""), version, m);
      await recordAudit(m, { organizationId: actor.organizationId, actorUserId: actor.userId, action: `proposal.${decision}`, entityType: "proposal", entityId: id, data: { version } });
      if (decision === "approved") {
        const v = await m.getRepository(ProposalVersionRow).findOneByOrFail({ proposalId: id, version });
        await hooks.onApproved(m, await m.getRepository(ProposalRow).findOneByOrFail({ id }), proposalContentSchema.parse(v.content));
      }
    });
    return dto(await proposals.findOneByOrFail({ id }), version, actor);
  }

  async function get(actor: Actor, id: string): Promise<Proposal> {
    const { row, version } = await visible(actor, id);
    return dto(row, version, actor);
  }

  /** The version's PDF as a stream from object storage. */
  async function pdf(actor: Actor, id: string, version: number): Promise<{ body: Readable; sizeBytes: number; filename: string }> {
    const { row, version: visibleVersion } = await visible(actor, id);
    if (version > visibleVersion) throw notFound(`Version ${version} of this proposal`);
    const v = await versions.findOne({ where: { proposalId: id, version }, relations: { pdfFile: true } });
    if (!v || (!isStaff(actor) && !v.sentAt)) throw notFound(`Version ${version} of this proposal`);
    if (v.pdfStatus === "failed") throw new HttpError(409, "pdf_failed", `The PDF could not be made: ${v.pdfError ?? "unknown reason"}. Change the proposal to try again.`);
    if (v.pdfStatus !== "ready" || !v.pdfFile) throw new HttpError(409, "pdf_pending", "The PDF is still being made; try again in a few seconds.", undefined, { "Retry-After": "3" });
    return { body: await deps.files.open(v.pdfFile), sizeBytes: v.pdfFile.sizeBytes, filename: `proposal-${row.id.slice(0, 8)}-v${version}.pdf` };
  }

  return { create, list, get, update, send, comment, decide, pdf, visible, portalUrl };
}

export type ProposalsService = ReturnType<typeof createProposalsService>;
export type { ScenarioSetup };
