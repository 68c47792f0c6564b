import type { TestProject } from "vitest/node";
import pg from "pg";
import { freePort, runNode, startNode, waitFor } from "./stack.js";

declare module "vitest" {
  export interface ProvidedContext {
    baseUrl: string;
    mailApiUrl: string;
    paymentsUrl: string;
  }
}

/**
 * Starts the real stack for the browser tests: a clean `hushmark_e2e` database (migrated and
 * seeded with the demo firm), the mail fake and the server serving the built web app.
 */
export default async function setup(project: TestProject) {
  const databaseUrl = process.env.HUSHMARK_E2E_DATABASE_URL;
  if (!databaseUrl) throw new Error("HUSHMARK_E2E_DATABASE_URL is not set: run the browser tests through `npm test`.");
  const client = new pg.Client({ connectionString: databaseUrl });
  await client.connect();
  await client.query("DROP SCHEMA IF EXISTS public CASCADE; CREATE SCHEMA public;");
  await client.end();
  const [port, smtpPort, mailApiPort, s3Port, paymentsPort] = [await freePort(), await freePort(), await freePort(), await freePort(), await freePort()];
  const env = {
    ...process.env,
    NODE_ENV: "development" as const,
    DATABASE_URL: databaseUrl,
    HUSHMARK_PORT: String(port),
    HUSHMARK_PUBLIC_URL: `http://127.0.0.1:${port}`,
    HUSHMARK_SMTP_PORT: String(smtpPort),
    HUSHMARK_MAIL_API_PORT: String(mailApiPort),
    HUSHMARK_MAIL_API_URL: `http://127.0.0.1:${mailApiPort}`,
    HUSHMARK_S3_PORT: String(s3Port),
    HUSHMARK_S3_ENDPOINT: `http://127.0.0.1:${s3Port}`,
    HUSHMARK_LOG_LEVEL: "warn",
    HUSHMARK_PAYMENTS_PORT: String(paymentsPort),
    HUSHMARK_PAYMENTS_WEBHOOK_URL: `http://127.0.0.1:${port}/api/v1/payments/webhook`,
    HUSHMARK_STRIPE_PORT: String(paymentsPort),
  };
  await runNode(["packages/server/dist/scripts/migrate.js"], env);
  await runNode(["packages/server/dist/scripts/seed.js"], env);
  const fakes = startNode(["packages/fakes/dist/main.js"], env);
  await waitFor(`http://127.0.0.1:${mailApiPort}/health`, 15_000, fakes.child, fakes.output);
  await waitFor(`http://127.0.0.1:${s3Port}/`, 15_000, fakes.child, fakes.output);
  await waitFor(`http://127.0.0.1:${paymentsPort}/health`, 15_000, fakes.child, fakes.output);
  const server = startNode(["packages/server/dist/index.js"], env);
  await waitFor(`http://127.0.0.1:${port}/api/v1/health`, 30_000, server.child, server.output);
  project.provide("baseUrl", `http://127.0.0.1:${port}`);
  project.provide("mailApiUrl", `http://127.0.0.1:${mailApiPort}`);
  project.provide("paymentsUrl", `http://127.0.0.1:${paymentsPort}`);
  return async () => {
    for (const proc of [server, fakes]) {
      proc.child.kill("SIGTERM");
      await new Promise((r) => (proc.child.exitCode !== null ? r(null) : proc.child.once("exit", r)));
    }
  };
}
