import type { DataSource } from "typeorm";
import { notFound } from "../http/errors.js";

/** The plan document of a project at a version (the current one or a kept revision). */
export async function planDocumentAt(dataSource: DataSource, projectId: string, version: number): Promise<Record<string, unknown>> {
  const current: { version: number; document: Record<string, unknown> }[] = await dataSource.query("SELECT version, document FROM plans WHERE project_id = $1", [projectId]);
  if (current[0]?.version === version) return current[0].document;
  const revision: { document: Record<string, unknown> }[] = await dataSource.query("SELECT document FROM plan_revisions WHERE project_id = $1 AND version = $2", [projectId, version]);
  if (!revision[0]) throw notFound(`Version ${version} of this plan`);
  return revision[0].document;
}
