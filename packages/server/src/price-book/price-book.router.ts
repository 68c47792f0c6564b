import { Router } from "express";
import { firmSettingsSchema, priceBookImportSchema, priceBookItemInputSchema, priceBookItemParamSchema, priceBookItemUpdateSchema } from "@hushmark/schemas";
import type { Sessions } from "../auth/sessions.js";
import { parse } from "../http/parse.js";
import { mountRoutes } from "../http/routes.js";
import type { PriceBookService } from "./price-book.service.js";

const STAFF = ["owner", "surveyor", "planner"] as const;

/** `/api/v1/price-book` (upgrades, CSV) and `/api/v1/firm/settings` (tax, deposit, terms). Owners edit; staff read. */
export function priceBookRouter(priceBook: PriceBookService, sessions: Sessions): Router {
  const router = Router();
  mountRoutes(router, "/price-book", sessions.authenticate, [
    {
      method: "get", path: "/", access: STAFF,
      handler: async ({ actor }) => ({ currency: (await priceBook.settings(actor.organizationId)).currency, items: await priceBook.list(actor) }),
    },
    { method: "post", path: "/items", access: ["owner"], status: 201, handler: async ({ req, actor }) => priceBook.create(actor, parse(priceBookItemInputSchema, req.body)) },
    {
      method: "patch", path: "/items/:itemId", access: ["owner"],
      handler: async ({ req, actor }) => priceBook.update(actor, parse(priceBookItemParamSchema, req.params).itemId, parse(priceBookItemUpdateSchema, req.body)),
    },
    {
      method: "delete", path: "/items/:itemId", access: ["owner"],
      handler: async ({ req, actor }) => {
        await priceBook.remove(actor, parse(priceBookItemParamSchema, req.params).itemId);
        return undefined;
      },
    },
    {
      method: "get", path: "/export.csv", access: STAFF,
      handler: async ({ res, actor }) => {
        res.type("text/csv").attachment("price-book.csv").send(await priceBook.exportCsv(actor));
        return undefined;
      },
    },
    {
      method: "post", path: "/import", access: ["owner"],
      handler: async ({ req, actor }) => {
        const { csv, mode } = parse(priceBookImportSchema, req.body);
        return priceBook.importCsv(actor, csv, mode);
      },
    },
  ]);
  mountRoutes(router, "/firm/settings", sessions.authenticate, [
    { method: "get", path: "/", access: ["owner", "planner"], handler: async ({ actor }) => priceBook.settings(actor.organizationId) },
    { method: "put", path: "/", access: ["owner"], handler: async ({ req, actor }) => priceBook.saveSettings(actor, parse(firmSettingsSchema, req.body)) },
  ]);
  return router;
}
