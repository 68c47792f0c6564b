import { Router } from "express";
import { projectIdParamSchema, taskParamSchema, taskUpdateSchema, verificationInputSchema, verificationParamSchema } from "@hushmark/schemas";
import type { Sessions } from "../auth/sessions.js";
import { notFound } from "../http/errors.js";
import { parse } from "../http/parse.js";
import { mountRoutes, type RouteSpec } from "../http/routes.js";
import { renderClosingReport } from "./closing-report-pdf.js";
import type { WorkOrdersService } from "./work-orders.service.js";

const STAFF = ["owner", "planner", "surveyor"] as const;
const FIELD = ["owner", "surveyor"] as const;

/** Work orders and verifications under `/projects`. */
export function workOrderProjectRoutes(workOrders: WorkOrdersService): RouteSpec[] {
  const project = (p: unknown) => parse(projectIdParamSchema, p).projectId;
  return [
    { method: "get", path: "/:projectId/work-orders", access: STAFF, handler: async ({ req, actor }) => ({ workOrders: await workOrders.list(actor, project(req.params)) }) },
    { method: "get", path: "/:projectId/verifications", access: "signed-in", handler: async ({ req, actor }) => ({ verifications: (await workOrders.verifications(actor, project(req.params))).map((v) => v.dto) }) },
    { method: "post", path: "/:projectId/verifications", access: FIELD, status: 201, handler: async ({ req, actor }) => workOrders.verify(actor, project(req.params), parse(verificationInputSchema, req.body)) },
    {
      method: "get", path: "/:projectId/verifications/:verificationId/report", access: "signed-in",
      handler: async ({ req, res, actor }) => {
        const projectId = project(req.params);
        const { verificationId } = parse(verificationParamSchema, { verificationId: req.params.verificationId });
        const found = (await workOrders.verifications(actor, projectId)).find((v) => v.row.id === verificationId);
        if (!found) throw notFound("That verification");
        res.type("application/pdf").attachment(`closing-report-${verificationId.slice(0, 8)}.pdf`).send(await renderClosingReport(found.dto, found.content));
        return undefined;
      },
    },
  ];
}

/** `/api/v1/work-order-tasks/:taskId`: a checklist item's status and assignee. */
export function workOrderTasksRouter(workOrders: WorkOrdersService, sessions: Sessions): Router {
  const router = Router();
  mountRoutes(router, "/work-order-tasks", sessions.authenticate, [
    {
      method: "patch", path: "/:taskId", access: FIELD,
      handler: async ({ req, actor }) => ({ workOrders: await workOrders.updateTask(actor, parse(taskParamSchema, req.params).taskId, parse(taskUpdateSchema, req.body)) }),
    },
  ]);
  return router;
}
