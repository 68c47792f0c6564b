import type { EntityManager } from "typeorm";
import type { ProjectStatus } from "@hushmark/schemas";

/** A project's stages in the order the work goes through them (archived stands apart). */
const STAGES: readonly ProjectStatus[] = ["brief", "survey", "diagnosis", "proposal", "approved", "in_progress", "verified"];

/**
 * Moves a project forward to `to` as its proposal moves (sent, approved and paid, work started,
 * verified), in the caller's transaction. Only forward: a project already further on, or
 * archived, keeps its stage, so a second proposal that is sent later does not pull it back.
 */
export async function advanceProjectStage(m: EntityManager, projectId: string, to: Exclude<ProjectStatus, "archived">): Promise<void> {
  await m.query(
    `UPDATE projects SET status = $2, updated_at = now()
      WHERE id = $1 AND status <> 'archived' AND coalesce(array_position($3::text[], status::text), 0) < array_position($3::text[], $2::text)`,
    [projectId, to, STAGES],
  );
}
