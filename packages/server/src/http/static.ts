import { existsSync } from "node:fs";
import { join } from "node:path";
import express, { Router } from "express";

/** Serves the built web app with an SPA fallback; hashed assets are cached for a year. */
export function webAppRouter(distDir: string | undefined): Router {
  const router = Router();
  if (!distDir || !existsSync(join(distDir, "index.html"))) {
    router.get("/", (_req, res) => {
      res.type("text").send("Hushmark API is running. The web app is not built yet: run `npm start` (it builds it) or `npm run build`.");
    });
    return router;
  }
  router.use("/assets", express.static(join(distDir, "assets"), { immutable: true, maxAge: "365d", fallthrough: false }));
  router.use(express.static(distDir, { index: false, maxAge: "1h" }));
  router.get("/{*splat}", (req, res, next) => {
    if (req.path.startsWith("/api/") || req.path.startsWith("/dev/")) return next();
    res.set("Cache-Control", "no-cache").sendFile(join(distDir, "index.html"));
  });
  return router;
}
