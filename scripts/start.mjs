#!/usr/bin/env node
// `npm start`: installs what is missing, starts a project-local PostgreSQL on 127.0.0.1, migrates,
// seeds the demo firm once, starts the local fakes, builds and serves the app. Ctrl-C stops it all.
import { dirname, join } from "node:path";
import { fileURLToPath } from "node:url";
import { bold, done, fail, step } from "./lib/log.mjs";
import { stopCluster } from "./lib/postgres.mjs";
import { run, startService, stopChild, waitForHttp } from "./lib/run.mjs";
import { bringUpDatabase, buildAll, dataFolder, ensureDependencies, loadDotEnv, migrate, persistentSecret, startFakes } from "./lib/stack.mjs";

const root = join(dirname(fileURLToPath(import.meta.url)), "..");
const children = [];
let cluster = null;
let stopping = false;

async function stopAll(code) {
  if (stopping) return;
  stopping = true;
  for (const child of children.reverse()) await stopChild(child);
  if (cluster?.owned && cluster.pgDataDir) {
    stopCluster(cluster.pgDataDir);
    done("PostgreSQL stopped");
  }
  process.exit(code);
}
process.on("SIGINT", () => void stopAll(0));
process.on("SIGTERM", () => void stopAll(0));

try {
  loadDotEnv(root);
  ensureDependencies(root);
  const port = Number(process.env.HUSHMARK_PORT ?? 8080);
  const host = process.env.HUSHMARK_HOST ?? "127.0.0.1";
  const smtpPort = Number(process.env.HUSHMARK_SMTP_PORT ?? 55025);
  const mailApiPort = Number(process.env.HUSHMARK_MAIL_API_PORT ?? 55026);
  const s3Port = Number(process.env.HUSHMARK_S3_PORT ?? 55027);
  const paymentsPort = Number(process.env.HUSHMARK_PAYMENTS_PORT ?? 55028);
  const dir = dataFolder(root);
  cluster = await bringUpDatabase({ dir, port: Number(process.env.HUSHMARK_PG_PORT ?? 55432), database: "hushmark" });
  buildAll(root);
  step("migrating and seeding…");
  migrate(root, cluster.databaseUrl);
  run("node", ["packages/server/dist/scripts/seed.js"], { cwd: root, env: { ...process.env, DATABASE_URL: cluster.databaseUrl } });
  const publicUrl = process.env.HUSHMARK_PUBLIC_URL ?? `http://${host}:${port}`;
  children.push(await startFakes(root, { smtpPort, mailApiPort, s3Port, s3Dir: process.env.HUSHMARK_S3_DIR ?? join(dir, "objects"), paymentsPort, webhookUrl: `${publicUrl}/api/v1/payments/webhook` }));
  const server = startService("server", "node", ["packages/server/dist/index.js"], {
    cwd: root,
    env: {
      NODE_ENV: "development",
      HUSHMARK_LOG_LEVEL: "warn",
      ...process.env,
      DATABASE_URL: cluster.databaseUrl,
      HUSHMARK_PORT: String(port),
      HUSHMARK_HOST: host,
      HUSHMARK_PUBLIC_URL: publicUrl,
      HUSHMARK_SMTP_PORT: String(smtpPort),
      HUSHMARK_MAIL_API_URL: `http://127.0.0.1:${mailApiPort}`,
      HUSHMARK_S3_ENDPOINT: process.env.HUSHMARK_S3_ENDPOINT ?? `http://127.0.0.1:${s3Port}`,
      HUSHMARK_JWT_SECRET: process.env.HUSHMARK_JWT_SECRET ?? persistentSecret(dir, "jwt.secret"),
      HUSHMARK_STRIPE_PORT: process.env.HUSHMARK_STRIPE_PORT ?? String(paymentsPort),
    },
  });
  children.push(server);
  server.once("exit", (code) => {
    if (!stopping) {
      fail(`the server stopped (exit ${code})`);
      void stopAll(1);
    }
  });
  await waitForHttp(`${publicUrl}/api/v1/health`, 60_000, server);
  const { DEMO_PASSWORD, DEMO_PEOPLE } = await import("../packages/server/dist/scripts/demo-data.js");
  console.log("");
  console.log(bold(`Hushmark is running at ${publicUrl}`));
  console.log(`Development inbox (mail the app sent): ${publicUrl}/dev/mail`);
  console.log(`Demo sign-ins (password ${bold(DEMO_PASSWORD)} for each):`);
  for (const person of DEMO_PEOPLE) console.log(`  ${person.role.padEnd(9)} ${person.email}  (${person.displayName})`);
  console.log("Press Ctrl-C to stop.");
} catch (error) {
  fail(error.message);
  await stopAll(1);
}
