import { Router } from "express";
import { constructionUploadSchema } from "@hushmark/schemas";
import { z } from "zod";
import type { Sessions } from "../auth/sessions.js";
import { parse } from "../http/parse.js";
import { mountRoutes } from "../http/routes.js";
import type { CatalogueService } from "./catalogue.service.js";

const idParamSchema = z.object({ constructionId: z.string().regex(/^[a-z0-9][a-z0-9-]{2,59}$/, "That construction id is not valid.") });

/** `/api/v1/catalogue`: constructions (built-in and the firm's own), coverings, silencers, source spectra, finishes. */
export function catalogueRouter(catalogue: CatalogueService, sessions: Sessions): Router {
  const router = Router();
  mountRoutes(router, "/catalogue", sessions.authenticate, [
    { method: "get", path: "/", access: ["owner", "surveyor", "planner"], handler: async ({ actor }) => catalogue.list(actor) },
    {
      method: "post", path: "/constructions/preview", access: ["owner", "surveyor"],
      handler: async ({ req }) => {
        const { construction, notes } = catalogue.preview(parse(constructionUploadSchema, req.body));
        return { construction, notes };
      },
    },
    {
      method: "post", path: "/constructions", access: ["owner", "surveyor"], status: 201,
      handler: async ({ req, actor }) => catalogue.add(actor, parse(constructionUploadSchema, req.body)),
    },
    {
      method: "delete", path: "/constructions/:constructionId", access: ["owner", "surveyor"],
      handler: async ({ req, actor }) => {
        await catalogue.remove(actor, parse(idParamSchema, req.params).constructionId);
        return undefined;
      },
    },
  ]);
  return router;
}
