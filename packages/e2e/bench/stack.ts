import pg from "pg";
import { freePort, runNode, startNode, waitFor } from "../src/stack.js";

/** The real server on a clean database for a benchmark run; answers its URL and a stop function. */
export async function startBenchStack(databaseUrl: string): Promise<{ baseUrl: string; stop: () => Promise<void> }> {
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
    // Every fake on its own port, so a benchmark can run beside someone's browser tests.
    HUSHMARK_PAYMENTS_PORT: String(paymentsPort),
    HUSHMARK_STRIPE_PORT: String(paymentsPort),
    HUSHMARK_PAYMENTS_WEBHOOK_URL: `http://127.0.0.1:${port}/api/v1/payments/webhook`,
    HUSHMARK_LOG_LEVEL: "warn",
  };
  await runNode(["packages/server/dist/scripts/migrate.js"], env);
  await runNode(["packages/server/dist/scripts/seed.js"], env);
  const fakes = startNode(["packages/fakes/dist/main.js"], env);
  await waitFor(`http://127.0.0.1:${mailApiPort}/health`, 15_000, fakes.child, fakes.output);
  await waitFor(`http://127.0.0.1:${s3Port}/`, 15_000, fakes.child, fakes.output);
  const server = startNode(["packages/server/dist/index.js"], env);
  await waitFor(`http://127.0.0.1:${port}/api/v1/health`, 30_000, server.child, server.output);
  return {
    baseUrl: `http://127.0.0.1:${port}`,
    stop: async () => {
      for (const proc of [server, fakes]) {
        proc.child.kill("SIGTERM");
        await new Promise((r) => (proc.child.exitCode !== null ? r(null) : proc.child.once("exit", r)));
      }
    },
  };
}
