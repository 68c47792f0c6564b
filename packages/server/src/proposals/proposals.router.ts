import { pipeline } from "node:stream/promises";
import { Router } from "express";
import {
  depositStartSchema, projectIdParamSchema, proposalChangesSchema, proposalCommentInputSchema, proposalCreateSchema, proposalDecisionSchema,
  proposalParamSchema, proposalUpdateSchema, proposalVersionParamSchema,
} from "@hushmark/schemas";
import type { Sessions } from "../auth/sessions.js";
import { parse } from "../http/parse.js";
import { mountRoutes, type RouteSpec } from "../http/routes.js";
import type { PaymentsService } from "../payments/payments.service.js";
import type { ProposalsService } from "./proposals.service.js";

const PLANNING = ["owner", "planner"] as const;
const READERS = ["owner", "planner", "surveyor", "client"] as const;

/** Proposal routes under `/projects` (make, list). */
export function projectProposalRoutes(proposals: ProposalsService): RouteSpec[] {
  return [
    { method: "get", path: "/:projectId/proposals", access: READERS, handler: async ({ req, actor }) => ({ proposals: await proposals.list(actor, parse(projectIdParamSchema, req.params).projectId) }) },
    { method: "post", path: "/:projectId/proposals", access: PLANNING, status: 201, handler: async ({ req, actor }) => proposals.create(actor, parse(projectIdParamSchema, req.params).projectId, parse(proposalCreateSchema, req.body)) },
  ];
}

/** `/api/v1/proposals/…`: read, change, send, comment, decide, PDF, deposit. */
export function proposalsRouter(proposals: ProposalsService, payments: PaymentsService, sessions: Sessions): Router {
  const router = Router();
  const id = (p: unknown) => parse(proposalParamSchema, p).proposalId;
  mountRoutes(router, "/proposals", sessions.authenticate, [
    { method: "get", path: "/", access: READERS, handler: async ({ actor }) => ({ proposals: await proposals.list(actor, null) }) },
    { method: "get", path: "/:proposalId", access: READERS, handler: async ({ req, actor }) => proposals.get(actor, id(req.params)) },
    { method: "patch", path: "/:proposalId", access: PLANNING, handler: async ({ req, actor }) => proposals.update(actor, id(req.params), parse(proposalUpdateSchema, req.body)) },
    { method: "post", path: "/:proposalId/send", access: PLANNING, handler: async ({ req, actor }) => proposals.send(actor, id(req.params)) },
    { method: "post", path: "/:proposalId/comments", access: READERS, status: 201, handler: async ({ req, actor }) => proposals.comment(actor, id(req.params), parse(proposalCommentInputSchema, req.body).body) },
    {
      method: "post", path: "/:proposalId/approve", access: ["client"],
      handler: async ({ req, actor }) => {
        const d = parse(proposalDecisionSchema, req.body);
        return proposals.decide(actor, id(req.params), "approved", d.version, d.comment);
      },
    },
    {
      method: "post", path: "/:proposalId/changes", access: ["client"],
      handler: async ({ req, actor }) => {
        const d = parse(proposalChangesSchema, req.body);
        return proposals.decide(actor, id(req.params), "changes_asked", d.version, d.comment);
      },
    },
    {
      method: "get", path: "/:proposalId/versions/:version/pdf", access: READERS,
      handler: async ({ req, res, actor }) => {
        const p = parse(proposalVersionParamSchema, req.params);
        const file = await proposals.pdf(actor, p.proposalId, p.version);
        res.type("application/pdf").attachment(file.filename).set({ "content-length": String(file.sizeBytes), "x-content-type-options": "nosniff" });
        await pipeline(file.body, res);
        return undefined;
      },
    },
    {
      method: "post", path: "/:proposalId/deposit", access: ["client"], status: 201,
      handler: async ({ req, actor }) => payments.startDeposit(actor, id(req.params), parse(depositStartSchema, req.body).version),
    },
  ]);
  return router;
}
