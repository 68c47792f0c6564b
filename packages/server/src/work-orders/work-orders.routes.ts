import { pipeline } from "node:stream/promises";
import { Router } from "express";
import { projectIdParamSchema, taskParamSchema, taskUpdateSchema, verificationInputSchema, verificationParamSchema } from "@hushmark/schemas";
import type { Sessions } from "../auth/sessions.js";
import { parse } from "../http/parse.js";
import { mountRoutes, type RouteSpec } from "../http/routes.js";
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
        const report = await workOrders.closingReport(actor, projectId, verificationId);
        res.type("application/pdf").attachment(report.filename).set({ "content-length": String(report.sizeBytes), "x-content-type-options": "nosniff" });
        await pipeline(report.body, res);
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
