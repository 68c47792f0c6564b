import type { DataSource } from "typeorm";
import { briefSchema, type Brief } from "@hushmark/schemas";
import { ProjectBrief } from "./project-brief.entity.js";

/**
 * The project's brief once someone has saved it, else null. Analyses and option searches take
 * their target and limits from it when the request leaves them out; an unsaved brief says
 * nothing (its defaults would forbid every flagged upgrade). The caller checks access first.
 */
export async function agreedBrief(dataSource: DataSource, projectId: string): Promise<Brief | null> {
  const row = await dataSource.getRepository(ProjectBrief).findOneBy({ projectId });
  if (!row) return null;
  const parsed = briefSchema.safeParse(row.brief);
  return parsed.success ? parsed.data : null;
}
