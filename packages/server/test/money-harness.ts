import "reflect-metadata";
import { readFileSync } from "node:fs";
import { createServer, type Server } from "node:http";
import type { AddressInfo } from "node:net";
import { pino } from "pino";
import supertest from "supertest";
import type { DataSource } from "typeorm";
import { startMailFake, startPaymentsFake, startS3Fake, type MailFake, type PaymentsFake, type S3Fake } from "@hushmark/fakes";
import type { PriceBookItem } from "@hushmark/schemas";
import { createApp } from "../src/app.js";
import { loadConfig } from "../src/config.js";
import { createDataSource } from "../src/data-source.js";
import { DEMO_PRICE_BOOK } from "../src/price-book/demo-price-book.js";
import { addMember, newFirm, type Harness } from "./harness.js";

export const WEBHOOK_SECRET = "whsec_test_money";
export const demoPlan = JSON.parse(readFileSync(new URL("../../../examples/fernhollow-studio.plan.json", import.meta.url), "utf8")) as Record<string, unknown>;

export interface MoneyHarness extends Harness {
  payments: PaymentsFake;
  /** Where proposal PDFs and closing reports are kept. */
  s3: S3Fake;
  baseUrl: string;
}

/**
 * The real app listening on a port (the payments fake posts its webhooks there), with in-process
 * mail and payments fakes; the server's SDK points at the fake through host, port and protocol.
 */
export async function startMoneyHarness(): Promise<MoneyHarness> {
  const mail = await startMailFake();
  const s3 = await startS3Fake();
  const dataSource: DataSource = createDataSource(process.env.DATABASE_URL!, { poolSize: 5 });
  await dataSource.initialize();
  // Listen first so the public URL (mailed links) and the webhook URL know the port.
  const server: Server = createServer();
  await new Promise<void>((r) => server.listen(0, "127.0.0.1", () => r()));
  const boot = portOf(server);
  const payments = await startPaymentsFake({ webhookUrl: `http://127.0.0.1:${boot}/api/v1/payments/webhook`, webhookSecret: WEBHOOK_SECRET, retryDelaysMs: [100, 300, 1000] });
  const baseUrl = `http://127.0.0.1:${boot}`;
  const config = loadConfig({
    ...process.env,
    NODE_ENV: "test",
    HUSHMARK_SMTP_PORT: String(mail.smtpPort),
    HUSHMARK_MAIL_API_URL: `http://127.0.0.1:${mail.httpPort}`,
    HUSHMARK_PUBLIC_URL: baseUrl,
    HUSHMARK_LOG_LEVEL: "silent",
    HUSHMARK_S3_ENDPOINT: s3.endpoint,
    HUSHMARK_S3_BUCKET: "hushmark-money-test",
  });
  const { app, close } = createApp({
    dataSource,
    config,
    logger: pino({ level: process.env.HUSHMARK_TEST_LOG_LEVEL ?? "silent" }),
    signInLimits: { windowMs: 60_000, perAddress: 100_000, perAccountAndAddress: 100_000, perAccount: 100_000 },
    accountLimitPerAddress: 100_000,
    money: { payments: { secretKey: "sk_test_money", webhookSecret: WEBHOOK_SECRET, host: "127.0.0.1", port: payments.port, protocol: "http" } },
  });
  server.on("request", app);
  return {
    dataSource,
    mail,
    payments,
    s3,
    baseUrl,
    request: () => supertest.agent(baseUrl),
    close: async () => {
      server.closeAllConnections();
      await new Promise<void>((r) => server.close(() => r()));
      await payments.close();
      await close();
      await mail.close();
      await s3.close();
      await dataSource.destroy();
    },
  };
}

/** A firm with the demo price book, a planner, a client, and a project holding the demo plan. */
export async function pricedProject(h: Harness) {
  const { agent: owner } = await newFirm(h, "Money Test Firm");
  const items: PriceBookItem[] = [];
  for (const item of DEMO_PRICE_BOOK) {
    const res = await owner.post("/api/v1/price-book/items").send(item);
    if (res.status !== 201) throw new Error(`price book item answered ${res.status}: ${JSON.stringify(res.body)}`);
    items.push(res.body as PriceBookItem);
  }
  await owner.put("/api/v1/firm/settings").send({ currency: "USD", taxRatePercent: 10, depositPercent: 25, validityDays: 30, terms: "Balance on completion." });
  const planner = (await addMember(h, owner, "planner")).agent;
  const client = await addMember(h, owner, "client");
  const projectId = (await owner.post("/api/v1/projects").send({ title: "Studio next to a café" })).body.id as string;
  await owner.post(`/api/v1/projects/${projectId}/clients`).send({ membershipId: client.membershipId });
  const saved = await owner.put(`/api/v1/projects/${projectId}/plan`).send({ baseVersion: 0, document: demoPlan });
  if (saved.status !== 200) throw new Error(`plan save answered ${saved.status}`);
  const byCode = (code: string) => items.find((i) => i.code === code)!;
  return { owner, planner, client, projectId, planVersion: saved.body.version as number, items, byCode };
}

export const SETUP = (planVersion: number) => ({
  planVersion,
  source: { kind: "airborne", spaceId: "cafe", spectrum: { kind: "library", id: "speech-raised" } },
  receiverId: "record",
  target: { kind: "nc", nc: 25 },
});

export async function until<T>(what: string, probe: () => Promise<T | undefined>, timeoutMs = 20_000): Promise<T> {
  const end = Date.now() + timeoutMs;
  while (Date.now() < end) {
    const v = await probe();
    if (v !== undefined) return v;
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error(`timed out waiting for ${what}`);
}

export const portOf = (s: Server) => (s.address() as AddressInfo).port;
