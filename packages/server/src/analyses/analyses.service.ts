import { createHash } from "node:crypto";
import type { DataSource } from "typeorm";
import { canonicalJson } from "@hushmark/floorplan";
import { analysisTargetOfBrief, type AnalysisResult } from "@hushmark/schemas";
import type { Actor } from "../auth/actor.js";
import { AnalysisCache } from "../entities/index.js";
import { HttpError, notFound } from "../http/errors.js";
import type { CatalogueService } from "../catalogue/catalogue.service.js";
import { agreedBrief } from "../intake/agreed-brief.js";
import type { ProjectsService } from "../projects/projects.service.js";
import { renderAnalysisPdf } from "./analysis-pdf.js";
import { catalogueFor, prepareNetwork, type ParsedAnalysisRequest } from "./compute.js";
import type { AnalysisPool } from "./pool.js";

/** Bumped when the computation changes, so older cached results are not served. */
const ENGINE_CACHE_GENERATION = "2";

function cacheKey(request: ParsedAnalysisRequest, catalogueDigest: string): string {
  const canonical = canonicalJson(request);
  return createHash("sha256").update(`${ENGINE_CACHE_GENERATION}|${catalogueDigest}|${canonical}`).digest("hex");
}

/**
 * Analyses of a project's plan at a given version: served from the cache when the same inputs
 * were computed before, otherwise computed in the worker pool and cached.
 */
export function createAnalysesService(dataSource: DataSource, projects: ProjectsService, catalogues: CatalogueService, pool: AnalysisPool) {
  const cache = dataSource.getRepository(AnalysisCache);

  async function documentAt(projectId: string, version: number): Promise<unknown> {
    const current: { version: number; document: unknown }[] = await dataSource.query("SELECT version, document FROM plans WHERE project_id = $1", [projectId]);
    if (current[0]?.version === version) return current[0].document;
    const revision: { document: unknown }[] = await dataSource.query("SELECT document FROM plan_revisions WHERE project_id = $1 AND version = $2", [projectId, version]);
    if (!revision[0]) throw notFound(`Version ${version} of this plan`);
    return revision[0].document;
  }

  async function analyse(actor: Actor, projectId: string, asked: ParsedAnalysisRequest): Promise<AnalysisResult> {
    await projects.get(actor, projectId);
    // No target in the request: aim at the one agreed in the brief.
    const briefTarget = asked.target ? undefined : analysisTargetOfBrief((await agreedBrief(dataSource, projectId)) ?? { target: null });
    const request: ParsedAnalysisRequest = briefTarget ? { ...asked, target: briefTarget } : asked;
    const { extra, digest } = await catalogues.catalogueFor(actor.organizationId);
    const key = cacheKey(request, digest);
    const hit = await cache.findOne({ where: { projectId, cacheKey: key } });
    if (hit) return { ...(hit.result as Omit<AnalysisResult, "cached" | "computeMs">), planVersion: request.planVersion, cached: true, computeMs: hit.computeMs };
    const document = await documentAt(projectId, request.planVersion);
    const outcome = await pool.run({ document, request, constructions: extra });
    if (!outcome.ok) throw new HttpError(outcome.status, outcome.code, outcome.message, outcome.problems.length ? outcome.problems : undefined);
    await cache
      .createQueryBuilder()
      .insert()
      .values({ projectId, cacheKey: key, planVersion: request.planVersion, result: outcome.result as never, computeMs: outcome.computeMs })
      .orIgnore()
      .execute();
    return { ...outcome.result, planVersion: request.planVersion, cached: false, computeMs: outcome.computeMs };
  }

  /** The analysis drawn as a one-page PDF (the marked-up plan for print), computed like `analyse`. */
  async function drawing(actor: Actor, projectId: string, asked: ParsedAnalysisRequest): Promise<{ filename: string; bytes: Buffer }> {
    const result = await analyse(actor, projectId, asked);
    const project = await projects.get(actor, projectId);
    const { extra } = await catalogues.catalogueFor(actor.organizationId);
    const document = await documentAt(projectId, result.planVersion);
    const prepared = prepareNetwork(document, { source: asked.source, receiverId: asked.receiverId }, catalogueFor(extra));
    // `analyse` has just computed this plan at this version, so it cannot fail here.
    if (!prepared.ok) throw new HttpError(prepared.status, prepared.code, prepared.message);
    const bytes = await renderAnalysisPdf({
      projectTitle: project.title,
      siteAddress: project.siteAddress ?? null,
      firmName: actor.organizationName,
      drawnOn: new Date().toISOString().slice(0, 10),
      result,
      prepared,
    });
    const safe = (s: string) => s.replace(/[^A-Za-z0-9]+/g, "-").replace(/^-|-$/g, "").toLowerCase() || "plan";
    return { filename: `${safe(project.title)}-sound-paths-v${result.planVersion}.pdf`, bytes };
  }

  return { analyse, drawing };
}

export type AnalysesService = ReturnType<typeof createAnalysesService>;
