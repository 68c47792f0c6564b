import { Router, type RequestHandler } from "express";
import { acceptInvitationSchema, changeRoleSchema, idParamSchema, inviteSchema, tokenSchema } from "@hushmark/schemas";
import { z } from "zod";
import type { Sessions } from "../auth/sessions.js";
import { parse } from "../http/parse.js";
import { mountRoutes } from "../http/routes.js";
import type { PeopleService } from "./people.service.js";

const tokenParamSchema = z.object({ token: tokenSchema });

/** `/api/v1/people/*` (owners) and `/api/v1/invitations/*` (the invitee, by token). */
export function peopleRouter(people: PeopleService, sessions: Sessions, acceptLimit: RequestHandler[]): Router {
  const router = Router();
  mountRoutes(router, "/people", sessions.authenticate, [
    { method: "get", path: "/", access: ["owner"], handler: async ({ actor }) => people.list(actor) },
    {
      method: "post", path: "/invitations", access: ["owner"], status: 201,
      handler: async ({ req, actor }) => people.invite(actor, parse(inviteSchema, req.body)),
    },
    {
      method: "delete", path: "/invitations/:id", access: ["owner"],
      handler: async ({ req, actor }) => {
        await people.revokeInvitation(actor, parse(idParamSchema, req.params).id);
        return undefined;
      },
    },
    {
      method: "patch", path: "/members/:id", access: ["owner"],
      handler: async ({ req, actor }) => people.changeRole(actor, parse(idParamSchema, req.params).id, parse(changeRoleSchema, req.body).role),
    },
    {
      method: "delete", path: "/members/:id", access: ["owner"],
      handler: async ({ req, actor }) => {
        await people.remove(actor, parse(idParamSchema, req.params).id);
        return undefined;
      },
    },
  ]);
  mountRoutes(router, "/invitations", sessions.authenticate, [
    { method: "get", path: "/:token", access: "public", handler: async ({ req }) => people.preview(parse(tokenParamSchema, req.params).token) },
    {
      method: "post", path: "/accept", access: "public", before: acceptLimit,
      handler: async ({ req, res }) => {
        const { userId, membershipId } = await people.accept(parse(acceptInvitationSchema, req.body));
        const session = await sessions.issue(res, userId, membershipId);
        return sessions.me((await sessions.loadActor(session.id, userId))!);
      },
    },
  ]);
  return router;
}
