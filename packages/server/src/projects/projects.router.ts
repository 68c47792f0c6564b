import { Router } from "express";
import { addProjectClientSchema, projectIdParamSchema, projectInputSchema, projectUpdateSchema } from "@hushmark/schemas";
import { z } from "zod";
import type { Sessions } from "../auth/sessions.js";
import { parse } from "../http/parse.js";
import { mountRoutes, type RouteSpec } from "../http/routes.js";
import type { ProjectsService } from "./projects.service.js";

const clientParamSchema = projectIdParamSchema.extend({ membershipId: z.uuid("That person id is not valid.") });

/** `/api/v1/projects` and a project's clients. Plans mount their own routes under the same prefix. */
export function projectsRouter(projects: ProjectsService, sessions: Sessions, extra: RouteSpec[] = []): Router {
  const router = Router();
  mountRoutes(router, "/projects", sessions.authenticate, [
    { method: "get", path: "/", access: "signed-in", handler: async ({ actor }) => ({ projects: await projects.list(actor) }) },
    {
      method: "post", path: "/", access: ["owner", "surveyor"], status: 201,
      handler: async ({ req, actor }) => projects.create(actor, parse(projectInputSchema, req.body)),
    },
    { method: "get", path: "/:projectId", access: "signed-in", handler: async ({ req, actor }) => projects.get(actor, parse(projectIdParamSchema, req.params).projectId) },
    {
      method: "patch", path: "/:projectId", access: ["owner", "surveyor"],
      handler: async ({ req, actor }) => projects.update(actor, parse(projectIdParamSchema, req.params).projectId, parse(projectUpdateSchema, req.body)),
    },
    {
      method: "post", path: "/:projectId/clients", access: ["owner", "surveyor"],
      handler: async ({ req, actor }) => projects.addClient(actor, parse(projectIdParamSchema, req.params).projectId, parse(addProjectClientSchema, req.body).membershipId),
    },
    {
      method: "delete", path: "/:projectId/clients/:membershipId", access: ["owner", "surveyor"],
      handler: async ({ req, actor }) => {
        const { projectId, membershipId } = parse(clientParamSchema, req.params);
        return projects.removeClient(actor, projectId, membershipId);
      },
    },
    ...extra,
  ]);
  return router;
}
