import type { DataSource } from "typeorm";
import { scenarioEvaluationSchema, type OptionSearchInput, type OptionSearchStatus, type Scenario, type ScenarioInput, type ScenarioSetup } from "@hushmark/schemas";
import { mergeSearchLimits, optionSearchInputSchema, scenarioInputSchema, searchLimitsOfBrief } from "@hushmark/schemas";
import type { z } from "zod";
import type { Actor } from "../auth/actor.js";
import type { CatalogueService } from "../catalogue/catalogue.service.js";
import { HttpError, notFound } from "../http/errors.js";
import { agreedBrief } from "../intake/agreed-brief.js";
import type { PriceBookService } from "../price-book/price-book.service.js";
import type { ProjectsService } from "../projects/projects.service.js";
import { planDocumentAt } from "./plan-at-version.js";
import { evaluateScenario, type EvaluationOutcome, type PickedUpgrade } from "./scenario-evaluate.js";
import { ScenarioRow } from "./scenario.entity.js";
import { SEARCH_KEEP_MINUTES, type SearchRegistry } from "./search-registry.js";

type Input = z.output<typeof scenarioInputSchema>;

function dto(r: ScenarioRow): Scenario {
  const evaluation = r.evaluation ? scenarioEvaluationSchema.safeParse(r.evaluation) : null;
  return { id: r.id, projectId: r.projectId, name: r.name, setup: r.setup as ScenarioSetup, items: r.items, evaluation: evaluation?.success ? evaluation.data : null, updatedAt: r.updatedAt.toISOString() };
}

/** Scenarios of a project: named sets of upgrades evaluated by the engine on save, and option searches. */
export function createScenariosService(dataSource: DataSource, projects: ProjectsService, catalogues: CatalogueService, priceBook: PriceBookService, searches: SearchRegistry) {
  const repo = dataSource.getRepository(ScenarioRow);

  async function picks(organizationId: string, items: Input["items"]): Promise<PickedUpgrade[]> {
    const book = await priceBook.byIds(organizationId, items.map((i) => i.priceBookItemId));
    return items.map((i, k) => {
      const item = book.get(i.priceBookItemId);
      if (!item) throw new HttpError(400, "invalid_input", `Upgrade ${k + 1} is not in the firm's price book.`, [{ path: `items.${k}.priceBookItemId`, message: "Pick an upgrade from the price book." }]);
      return { key: `u${k}`, item, elementId: i.elementId };
    });
  }

  async function evaluate(actor: Actor, projectId: string, setup: ScenarioSetup, items: Input["items"]) {
    const document = await planDocumentAt(dataSource, projectId, setup.planVersion);
    const { catalogue } = await catalogues.catalogueFor(actor.organizationId);
    const outcome: EvaluationOutcome = evaluateScenario(document, setup, await picks(actor.organizationId, items), catalogue);
    if (!outcome.ok) throw new HttpError(outcome.status, outcome.status === 422 ? "plan_problems" : "invalid_input", outcome.message, outcome.details);
    return outcome.evaluation;
  }

  async function find(actor: Actor, projectId: string, id: string): Promise<ScenarioRow> {
    await projects.get(actor, projectId);
    const row = await repo.findOne({ where: { id, projectId, organizationId: actor.organizationId } });
    if (!row) throw notFound("That scenario");
    return row;
  }

  return {
    async list(actor: Actor, projectId: string): Promise<Scenario[]> {
      await projects.get(actor, projectId);
      return (await repo.find({ where: { projectId, organizationId: actor.organizationId }, order: { createdAt: "ASC" } })).map(dto);
    },
    async get(actor: Actor, projectId: string, id: string): Promise<Scenario> {
      return dto(await find(actor, projectId, id));
    },
    async create(actor: Actor, projectId: string, input: Input): Promise<Scenario> {
      await projects.get(actor, projectId);
      const evaluation = await evaluate(actor, projectId, input.setup, input.items);
      const inserted = await repo.insert({ organizationId: actor.organizationId, projectId, name: input.name, setup: input.setup as never, items: input.items, evaluation: evaluation as never, createdById: actor.userId });
      return dto(await repo.findOneByOrFail({ id: String(inserted.identifiers[0]?.id) }));
    },
    async update(actor: Actor, projectId: string, id: string, patch: Partial<Input>): Promise<Scenario> {
      const row = await find(actor, projectId, id);
      const setup = patch.setup ?? (row.setup as ScenarioSetup);
      const items = patch.items ?? row.items;
      const evaluation = await evaluate(actor, projectId, setup, items);
      await repo.update({ id }, { name: patch.name ?? row.name, setup: setup as never, items, evaluation: evaluation as never });
      return dto(await repo.findOneByOrFail({ id }));
    },
    async remove(actor: Actor, projectId: string, id: string): Promise<void> {
      await find(actor, projectId, id);
      await repo.delete({ id });
    },
    /** Starts "best within limits" with the ranking and the frontier in a worker thread. */
    async startSearch(actor: Actor, projectId: string, input: z.output<typeof optionSearchInputSchema>): Promise<OptionSearchStatus> {
      await projects.get(actor, projectId);
      const document = await planDocumentAt(dataSource, projectId, input.setup.planVersion);
      const { catalogue } = await catalogues.catalogueFor(actor.organizationId);
      const items = await priceBook.list(actor);
      const brief = await agreedBrief(dataSource, projectId);
      const limits = brief ? mergeSearchLimits(input.limits, searchLimitsOfBrief(brief)) : input.limits;
      const started = await searches.start(actor.organizationId, projectId, actor.userId, { document, setup: input.setup, elementIds: input.elementIds, items, limits, catalogue });
      if (!started) throw new HttpError(503, "busy", "Several searches are running on this server already; wait for one to finish or cancel one, then try again.", undefined, { "Retry-After": "10" });
      return started;
    },
    async search(actor: Actor, projectId: string, id: string): Promise<OptionSearchStatus> {
      await projects.get(actor, projectId);
      const s = await searches.get(actor.organizationId, projectId, id);
      if (!s) throw notFound(`That search (searches are kept for ${SEARCH_KEEP_MINUTES} minutes after they end)`);
      return s;
    },
    async cancelSearch(actor: Actor, projectId: string, id: string): Promise<OptionSearchStatus> {
      await projects.get(actor, projectId);
      const s = await searches.cancel(actor.organizationId, projectId, id);
      if (!s) throw notFound("That search");
      return s;
    },
  };
}

export type ScenariosService = ReturnType<typeof createScenariosService>;
export type { OptionSearchInput, ScenarioInput };
