import { Router } from "express";
import type { DataSource } from "typeorm";
import { z } from "zod";
import type { Sessions } from "../auth/sessions.js";
import { parse } from "../http/parse.js";
import { mountRoutes } from "../http/routes.js";

const querySchema = z.object({ limit: z.coerce.number().int().min(1).max(500).default(100) });

/** `GET /api/v1/audit`: the firm's most recent audit events, for owners. */
export function auditRouter(dataSource: DataSource, sessions: Sessions): Router {
  const router = Router();
  mountRoutes(router, "/audit", sessions.authenticate, [
    {
      method: "get", path: "/", access: ["owner"],
      handler: async ({ req, actor }) => {
        const { limit } = parse(querySchema, req.query);
        const rows: { id: string; action: string; entity_type: string; entity_id: string | null; data: unknown; created_at: Date; actor: string | null }[] = await dataSource.query(
          `SELECT a.id, a.action, a.entity_type, a.entity_id, a.data, a.created_at, u.display_name AS actor FROM audit_events a
           LEFT JOIN users u ON u.id = a.actor_user_id WHERE a.organization_id = $1 ORDER BY a.created_at DESC LIMIT $2`,
          [actor.organizationId, limit],
        );
        return { events: rows.map((r) => ({ id: r.id, action: r.action, entityType: r.entity_type, entityId: r.entity_id, data: r.data, actor: r.actor, at: new Date(r.created_at).toISOString() })) };
      },
    },
  ]);
  return router;
}
