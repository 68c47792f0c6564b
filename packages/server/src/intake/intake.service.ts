import type { DataSource } from "typeorm";
import { BRIEF_FORMAT_VERSION, briefSchema, type BriefResponse, type BriefSave } from "@hushmark/schemas";
import type { Actor } from "../auth/actor.js";
import { conflict } from "../http/errors.js";
import type { ProjectsService } from "../projects/projects.service.js";
import { ProjectBrief } from "./project-brief.entity.js";

/** The brief (intake) of a project: one versioned document, saved as the surveyor types. */
export function createIntakeService(dataSource: DataSource, projects: ProjectsService) {
  const repo = dataSource.getRepository(ProjectBrief);

  const toDto = (projectId: string, row: ProjectBrief | null): BriefResponse => ({
    projectId,
    version: row?.version ?? 0,
    formatVersion: row?.formatVersion ?? BRIEF_FORMAT_VERSION,
    brief: briefSchema.parse(row?.brief ?? {}),
    updatedAt: row ? new Date(row.updatedAt).toISOString() : null,
    updatedBy: row?.updatedById ?? null,
  });

  async function get(actor: Actor, projectId: string): Promise<BriefResponse> {
    await projects.get(actor, projectId);
    return toDto(projectId, await repo.findOneBy({ projectId }));
  }

  /** Saves when `baseVersion` is the stored version (0 before the first save); 409 otherwise. */
  async function save(actor: Actor, projectId: string, input: BriefSave): Promise<BriefResponse> {
    await projects.get(actor, projectId);
    const row = await dataSource.transaction(async (manager) => {
      const r = manager.getRepository(ProjectBrief);
      const current = await r.findOne({ where: { projectId }, lock: { mode: "pessimistic_write" } });
      const version = current?.version ?? 0;
      if (version !== input.baseVersion) {
        throw conflict("version_conflict", "The brief was changed elsewhere since you opened it; reload to see the newer version.", { currentVersion: version });
      }
      if (current) {
        await r.update({ projectId }, { brief: input.brief as never, version: version + 1, formatVersion: BRIEF_FORMAT_VERSION, updatedById: actor.userId });
      } else {
        // A first save racing another: the primary key makes the loser fail, answered as a conflict.
        await r.insert({ projectId, brief: input.brief as never, version: 1, formatVersion: BRIEF_FORMAT_VERSION, updatedById: actor.userId }).catch(() => {
          throw conflict("version_conflict", "The brief was changed elsewhere since you opened it; reload to see the newer version.", { currentVersion: 1 });
        });
      }
      return r.findOneByOrFail({ projectId });
    });
    return toDto(projectId, row);
  }

  return { get, save };
}

export type IntakeService = ReturnType<typeof createIntakeService>;
