import type { Request, RequestHandler, Response, Router } from "express";
import type { Role } from "@hushmark/schemas";
import type { Actor } from "../auth/actor.js";
import { forbidden, notSignedIn } from "./errors.js";

/** Who may call a route: anyone, any signed-in user, or the listed roles of the caller's firm. */
export type Access = "public" | "signed-in" | readonly Role[];

export interface RouteContext {
  req: Request;
  res: Response;
  /** Present on every route that is not public. */
  actor: Actor;
}

export interface RouteSpec {
  method: "get" | "post" | "put" | "patch" | "delete";
  path: string;
  access: Access;
  /** Answers the JSON body, or sends the response itself and answers undefined. */
  handler: (ctx: RouteContext) => Promise<unknown>;
  /** Status for a JSON answer (default 200). */
  status?: number;
  /** Extra middleware before the handler (a larger body limit, a rate limiter). */
  before?: RequestHandler[];
}

/** Every registered API route, for docs and the access-matrix test. */
export const routeTable: { method: string; path: string; access: Access }[] = [];

/**
 * Registers routes deny-by-default: every route names its access, the actor is loaded before the
 * handler, and a role outside the list answers 403 (records of other firms answer 404 in services).
 */
export function mountRoutes(router: Router, prefix: string, authenticate: RequestHandler, specs: RouteSpec[]): void {
  for (const spec of specs) {
    const fullPath = spec.path === "/" ? prefix : `${prefix}${spec.path}`;
    if (!routeTable.some((r) => r.method === spec.method && r.path === fullPath)) {
      routeTable.push({ method: spec.method, path: fullPath, access: spec.access });
    }
    const guard: RequestHandler = (req, _res, next) => {
      if (spec.access === "public") return next();
      const actor = req.actor;
      if (!actor) return next(notSignedIn());
      if (spec.access !== "signed-in" && !spec.access.includes(actor.role)) return next(forbidden());
      next();
    };
    const run: RequestHandler = async (req, res) => {
      const body = await spec.handler({ req, res, actor: req.actor as Actor });
      if (res.headersSent) return;
      if (body === undefined) res.status(spec.status ?? 204).end();
      else res.status(spec.status ?? 200).json(body);
    };
    const chain = spec.access === "public" ? [...(spec.before ?? []), run] : [authenticate, guard, ...(spec.before ?? []), run];
    router[spec.method](fullPath, ...chain);
  }
}
