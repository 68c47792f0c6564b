import { planSaveSchema, projectIdParamSchema } from "@hushmark/schemas";
import { z } from "zod";
import { parse } from "../http/parse.js";
import type { RouteSpec } from "../http/routes.js";
import type { PlansService } from "./plans.service.js";

const revisionParamSchema = projectIdParamSchema.extend({ version: z.coerce.number().int("A version is a whole number.").nonnegative() });

/** Plan routes, mounted under `/projects` (so they share its prefix and route table). */
export function planRoutes(plans: PlansService): RouteSpec[] {
  return [
    { method: "get", path: "/:projectId/plan", access: "signed-in", handler: async ({ req, actor }) => plans.get(actor, parse(projectIdParamSchema, req.params).projectId) },
    {
      method: "put", path: "/:projectId/plan", access: ["owner", "surveyor"],
      handler: async ({ req, actor }) => plans.save(actor, parse(projectIdParamSchema, req.params).projectId, parse(planSaveSchema, req.body)),
    },
    {
      method: "get", path: "/:projectId/plan/revisions", access: ["owner", "surveyor", "planner"],
      handler: async ({ req, actor }) => plans.revisions(actor, parse(projectIdParamSchema, req.params).projectId),
    },
    {
      method: "get", path: "/:projectId/plan/revisions/:version", access: ["owner", "surveyor", "planner"],
      handler: async ({ req, actor }) => {
        const { projectId, version } = parse(revisionParamSchema, req.params);
        return plans.revision(actor, projectId, version);
      },
    },
  ];
}
