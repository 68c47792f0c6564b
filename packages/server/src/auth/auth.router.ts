import { Router, type RequestHandler } from "express";
import {
  passwordChangeSchema, passwordResetRequestSchema, passwordResetSchema, signInSchema, signUpSchema, switchFirmSchema,
} from "@hushmark/schemas";
import type { AppConfig } from "../config.js";
import { parse } from "../http/parse.js";
import { mountRoutes } from "../http/routes.js";
import type { AuthService } from "./auth.service.js";
import { clearSessionCookies } from "./cookies.js";
import type { Sessions } from "./sessions.js";

export interface AuthRouterDeps {
  auth: AuthService;
  sessions: Sessions;
  config: AppConfig;
  signInLimit: RequestHandler[];
  resetLimit: RequestHandler[];
}

/** `/api/v1/auth/*`: sign-up, sign-in, refresh, sign-out, me, firm switch, password change and reset. */
export function authRouter({ auth, sessions, config, signInLimit, resetLimit }: AuthRouterDeps): Router {
  const router = Router();
  mountRoutes(router, "/auth", sessions.authenticate, [
    {
      method: "post", path: "/sign-up", access: "public", status: 201, before: resetLimit,
      handler: async ({ req, res }) => {
        const { user, membership } = await auth.signUp(parse(signUpSchema, req.body));
        const session = await sessions.issue(res, user.id, membership.id);
        return sessions.me((await sessions.loadActor(session.id, user.id))!);
      },
    },
    {
      method: "post", path: "/sign-in", access: "public", before: signInLimit,
      handler: async ({ req, res }) => {
        const { user, membership } = await auth.signIn(parse(signInSchema, req.body));
        const session = await sessions.issue(res, user.id, membership.id);
        return sessions.me((await sessions.loadActor(session.id, user.id))!);
      },
    },
    {
      method: "post", path: "/refresh", access: "public",
      handler: async ({ req, res }) => sessions.me(await sessions.rotate(req, res)),
    },
    {
      method: "post", path: "/sign-out", access: "signed-in",
      handler: async ({ res, actor }) => {
        await sessions.revokeAll(actor.userId);
        clearSessionCookies(res, config);
        return undefined;
      },
    },
    { method: "get", path: "/me", access: "signed-in", handler: async ({ actor }) => sessions.me(actor) },
    {
      method: "post", path: "/switch-firm", access: "signed-in",
      handler: async ({ req, actor }) => {
        const { organizationId } = parse(switchFirmSchema, req.body);
        const membership = await auth.membershipIn(actor.userId, organizationId);
        await sessions.switchMembership(actor.sessionId, membership.id);
        return sessions.me((await sessions.loadActor(actor.sessionId, actor.userId))!);
      },
    },
    {
      method: "post", path: "/password", access: "signed-in",
      handler: async ({ req, res, actor }) => {
        await auth.changePassword(actor.userId, parse(passwordChangeSchema, req.body));
        await sessions.revokeAll(actor.userId);
        await sessions.issue(res, actor.userId, actor.membershipId);
        return undefined;
      },
    },
    {
      method: "post", path: "/password-reset/request", access: "public", status: 202, before: resetLimit,
      handler: async ({ req }) => {
        const { email } = parse(passwordResetRequestSchema, req.body);
        await auth.requestReset(email);
        return { message: "If that e-mail has an account, a reset link is on its way." };
      },
    },
    {
      method: "post", path: "/password-reset", access: "public", before: resetLimit,
      handler: async ({ req, res }) => {
        const userId = await auth.resetPassword(parse(passwordResetSchema, req.body));
        await sessions.revokeAll(userId);
        clearSessionCookies(res, config);
        return undefined;
      },
    },
  ]);
  return router;
}
