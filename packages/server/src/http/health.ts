import { Router } from "express";
import type { DataSource } from "typeorm";

/** `GET /api/v1/health`: answers 200 when the database answers, 503 otherwise. */
export function healthRouter(dataSource: DataSource): Router {
  const router = Router();
  router.get("/api/v1/health", async (_req, res) => {
    try {
      await dataSource.query("SELECT 1");
      res.json({ status: "ok", database: "ok" });
    } catch {
      res.status(503).json({ status: "degraded", database: "unreachable" });
    }
  });
  return router;
}
