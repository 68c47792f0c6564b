import express, { Router } from "express";
import type { Sessions } from "../auth/sessions.js";
import { mountRoutes } from "../http/routes.js";
import type { PaymentsService } from "./payments.service.js";

/**
 * The webhook, mounted before the JSON parser and the CSRF guard: the signature covers the raw
 * bytes, and the caller is the payment service, not a browser.
 */
export function paymentsWebhookRouter(payments: PaymentsService, sessions: Sessions): Router {
  const router = Router();
  mountRoutes(router, "/payments", sessions.authenticate, [
    {
      method: "post", path: "/webhook", access: "public",
      before: [express.raw({ type: () => true, limit: "512kb" })],
      handler: async ({ req }) => {
        const raw = Buffer.isBuffer(req.body) ? req.body : Buffer.alloc(0);
        const event = payments.verify(raw, req.header("stripe-signature"));
        const { duplicate } = await payments.handle(event);
        return { received: true, duplicate };
      },
    },
  ]);
  return router;
}

