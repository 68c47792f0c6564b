import type { DataSource } from "typeorm";
import type { PlanResponse, PlanSaveInput } from "@hushmark/schemas";
import type { Actor } from "../auth/actor.js";
import { recordAudit } from "../audit/audit.js";
import { PlanRevision } from "../entities/index.js";
import { HttpError, conflict, notFound } from "../http/errors.js";
import type { ProjectsService } from "../projects/projects.service.js";

/** Checks a plan document before it is stored; answers field issues, or none when it is acceptable. */
export type PlanDocumentCheck = (document: Record<string, unknown>) => { path: string; message: string }[];

interface PlanRow {
  project_id: string;
  version: number;
  document: Record<string, unknown>;
  updated_at: Date;
  updated_by: string | null;
}

function toDto(row: PlanRow): PlanResponse {
  return { projectId: row.project_id, version: row.version, document: row.document, updatedAt: new Date(row.updated_at).toISOString(), updatedBy: row.updated_by };
}

/**
 * Plans with optimistic concurrency: a save names the version it started from; the update only
 * happens when that is still the stored version (one atomic statement), and every accepted save
 * is kept as a revision in the same transaction. A stale save answers 409 and changes nothing.
 */
export function createPlansService(dataSource: DataSource, projects: ProjectsService, check: PlanDocumentCheck) {
  async function get(actor: Actor, projectId: string): Promise<PlanResponse> {
    await projects.get(actor, projectId);
    const rows: PlanRow[] = await dataSource.query(
      `SELECT p.project_id, p.version, p.document, p.updated_at, u.display_name AS updated_by FROM plans p LEFT JOIN users u ON u.id = p.updated_by WHERE p.project_id = $1`,
      [projectId],
    );
    if (!rows[0]) throw notFound("That project's plan");
    return toDto(rows[0]);
  }

  async function save(actor: Actor, projectId: string, input: PlanSaveInput): Promise<PlanResponse> {
    await projects.get(actor, projectId);
    const issues = check(input.document);
    if (issues.length) throw new HttpError(400, "invalid_plan", "The plan document is not valid.", issues.slice(0, 50));
    return dataSource.transaction(async (manager) => {
      const updated: PlanRow[] = await manager.query(
        `UPDATE plans SET document = $1, version = version + 1, updated_by = $2, updated_at = now()
         WHERE project_id = $3 AND version = $4 RETURNING project_id, version, document, updated_at, updated_by`,
        [JSON.stringify(input.document), actor.userId, projectId, input.baseVersion],
      );
      const rows = (Array.isArray(updated[0]) ? updated[0] : updated) as PlanRow[];
      const row = rows[0];
      if (!row) {
        const current: { version: number; updated_at: Date; updated_by: string | null }[] = await manager.query(
          "SELECT p.version, p.updated_at, u.display_name AS updated_by FROM plans p LEFT JOIN users u ON u.id = p.updated_by WHERE p.project_id = $1",
          [projectId],
        );
        const now = current[0];
        throw conflict(
          "version_conflict",
          `The plan changed since you opened it (you started from version ${input.baseVersion}; it is now version ${now?.version ?? "?"}). Nothing was overwritten.`,
          { currentVersion: now?.version ?? null, updatedAt: now ? new Date(now.updated_at).toISOString() : null, updatedBy: now?.updated_by ?? null },
        );
      }
      await manager.getRepository(PlanRevision).insert({ projectId, version: row.version, document: input.document as never, savedById: actor.userId, message: input.message ?? null });
      await recordAudit(manager, { organizationId: actor.organizationId, actorUserId: actor.userId, action: "plan.saved", entityType: "plan", entityId: projectId, data: { version: row.version } });
      return toDto({ ...row, updated_by: actor.displayName });
    });
  }

  async function revisions(actor: Actor, projectId: string) {
    await projects.get(actor, projectId);
    const rows: { version: number; saved_at: Date; saved_by: string | null; message: string | null }[] = await dataSource.query(
      `SELECT r.version, r.saved_at, u.display_name AS saved_by, r.message FROM plan_revisions r LEFT JOIN users u ON u.id = r.saved_by
       WHERE r.project_id = $1 ORDER BY r.version DESC LIMIT 500`,
      [projectId],
    );
    return { revisions: rows.map((r) => ({ version: r.version, savedAt: new Date(r.saved_at).toISOString(), savedBy: r.saved_by, message: r.message })) };
  }

  async function revision(actor: Actor, projectId: string, version: number): Promise<PlanResponse> {
    await projects.get(actor, projectId);
    const rows: PlanRow[] = await dataSource.query(
      `SELECT r.project_id, r.version, r.document, r.saved_at AS updated_at, u.display_name AS updated_by FROM plan_revisions r
       LEFT JOIN users u ON u.id = r.saved_by WHERE r.project_id = $1 AND r.version = $2`,
      [projectId, version],
    );
    if (!rows[0]) throw notFound(`Version ${version} of this plan`);
    return toDto(rows[0]);
  }

  return { get, save, revisions, revision };
}

export type PlansService = ReturnType<typeof createPlansService>;
