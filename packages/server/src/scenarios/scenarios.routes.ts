import { optionSearchInputSchema, projectIdParamSchema, scenarioInputSchema, scenarioParamSchema, scenarioUpdateSchema, searchParamSchema } from "@hushmark/schemas";
import { parse } from "../http/parse.js";
import type { RouteSpec } from "../http/routes.js";
import type { ScenariosService } from "./scenarios.service.js";

const PLANNING = ["owner", "planner"] as const;
const READ = ["owner", "planner", "surveyor"] as const;

/** Scenario and option-search routes, mounted under `/projects`. */
export function scenarioRoutes(scenarios: ScenariosService): RouteSpec[] {
  const project = (p: unknown) => parse(projectIdParamSchema, p).projectId;
  return [
    { method: "get", path: "/:projectId/scenarios", access: READ, handler: async ({ req, actor }) => ({ scenarios: await scenarios.list(actor, project(req.params)) }) },
    { method: "post", path: "/:projectId/scenarios", access: PLANNING, status: 201, handler: async ({ req, actor }) => scenarios.create(actor, project(req.params), parse(scenarioInputSchema, req.body)) },
    {
      method: "get", path: "/:projectId/scenarios/:scenarioId", access: READ,
      handler: async ({ req, actor }) => {
        const p = parse(scenarioParamSchema, req.params);
        return scenarios.get(actor, p.projectId, p.scenarioId);
      },
    },
    {
      method: "patch", path: "/:projectId/scenarios/:scenarioId", access: PLANNING,
      handler: async ({ req, actor }) => {
        const p = parse(scenarioParamSchema, req.params);
        return scenarios.update(actor, p.projectId, p.scenarioId, parse(scenarioUpdateSchema, req.body));
      },
    },
    {
      method: "delete", path: "/:projectId/scenarios/:scenarioId", access: PLANNING,
      handler: async ({ req, actor }) => {
        const p = parse(scenarioParamSchema, req.params);
        await scenarios.remove(actor, p.projectId, p.scenarioId);
        return undefined;
      },
    },
    { method: "post", path: "/:projectId/option-searches", access: PLANNING, status: 202, handler: async ({ req, actor }) => scenarios.startSearch(actor, project(req.params), parse(optionSearchInputSchema, req.body)) },
    {
      method: "get", path: "/:projectId/option-searches/:searchId", access: PLANNING,
      handler: async ({ req, actor }) => {
        const p = parse(searchParamSchema, req.params);
        return scenarios.search(actor, p.projectId, p.searchId);
      },
    },
    {
      method: "delete", path: "/:projectId/option-searches/:searchId", access: PLANNING,
      handler: async ({ req, actor }) => {
        const p = parse(searchParamSchema, req.params);
        return scenarios.cancelSearch(actor, p.projectId, p.searchId);
      },
    },
  ];
}
