import { briefSaveSchema, projectIdParamSchema } from "@hushmark/schemas";
import { parse } from "../http/parse.js";
import type { RouteSpec } from "../http/routes.js";
import type { IntakeService } from "./intake.service.js";

/** Brief routes, mounted under `/projects`. */
export function intakeRoutes(intake: IntakeService): RouteSpec[] {
  return [
    { method: "get", path: "/:projectId/brief", access: "signed-in", handler: async ({ req, actor }) => intake.get(actor, parse(projectIdParamSchema, req.params).projectId) },
    {
      method: "put", path: "/:projectId/brief", access: ["owner", "surveyor"],
      handler: async ({ req, actor }) => intake.save(actor, parse(projectIdParamSchema, req.params).projectId, parse(briefSaveSchema, req.body)),
    },
  ];
}
