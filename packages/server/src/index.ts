import "reflect-metadata";
import { createServer } from "node:http";
import { fileURLToPath } from "node:url";
import { pino } from "pino";
import express from "express";
import { createApp } from "./app.js";
import { healthRouter } from "./http/health.js";
import { loadConfig } from "./config.js";
import { createDataSource } from "./data-source.js";

const config = loadConfig();
const logger = pino({ level: config.logLevel });
const webDist = config.webDist ?? fileURLToPath(new URL("../../web/dist", import.meta.url));
const dataSource = createDataSource(config.databaseUrl);

async function connectWithRetry(attempts = 30): Promise<void> {
  for (let i = 1; ; i += 1) {
    try {
      await dataSource.initialize();
      return;
    } catch (error) {
      if (i >= attempts) throw error;
      logger.warn({ attempt: i }, "database not reachable yet; retrying in 1 s");
      await new Promise((r) => setTimeout(r, 1000));
    }
  }
}

await connectWithRetry();
const pending = await dataSource.showMigrations();
if (pending) logger.warn("there are migrations that have not run; run `npm run -w @hushmark/server migrate`");

const { app, close } = createApp({ dataSource, config: { ...config, webDist }, logger });
// A worker process works the background jobs; its port answers only its health, for whatever
// keeps it running (the API is served by the `api` processes).
const server = config.role === "worker" ? createServer(workerOnly(express().use(healthRouter(dataSource)))) : createServer(app);
server.listen(config.port, config.host, () => {
  logger.info({ url: config.publicUrl, role: config.role }, config.role === "worker" ? "Hushmark worker is running" : "Hushmark is listening");
});

function workerOnly(health: express.Express): express.Express {
  return health.use((_req, res) => {
    res.status(404).json({ error: { code: "worker_process", message: "This process runs background jobs only; the API is served by the api processes." } });
  });
}

let stopping = false;
async function shutdown(signal: string) {
  if (stopping) return;
  stopping = true;
  logger.info({ signal }, "shutting down");
  server.close();
  server.closeIdleConnections();
  setTimeout(() => server.closeAllConnections(), 3000).unref();
  await close().catch(() => undefined);
  await dataSource.destroy().catch(() => undefined);
  process.exit(0);
}
process.on("SIGINT", () => void shutdown("SIGINT"));
process.on("SIGTERM", () => void shutdown("SIGTERM"));
