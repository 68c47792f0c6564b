import "reflect-metadata";
import { randomUUID } from "node:crypto";
import { createServer } from "node:net";
import type { AddressInfo } from "node:net";
import { pino } from "pino";
import type { DataSource } from "typeorm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { startMailFake, type MailFake } from "@hushmark/fakes";
import { loadConfig } from "../src/config.js";
import { createDataSource } from "../src/data-source.js";
import { createMailer } from "../src/mail/mailer.js";
import { createOutbox, messageIdFor, queueMail, SENT_SECRET_BODY, type Outbox, type OutboxOptions, type QueuedMail } from "../src/outbox/outbox.js";
import { mailedToken, newFirm, startHarness } from "./harness.js";
import { pricedProject, SETUP, startMoneyHarness, until, type MoneyHarness } from "./money-harness.js";

const logger = pino({ level: process.env.HUSHMARK_TEST_LOG_LEVEL ?? "silent" });
const DOMAIN = "hushmark.local"; // the default From address's domain (config.ts)

const freePort = () =>
  new Promise<number>((resolve) => {
    const s = createServer();
    s.listen(0, "127.0.0.1", () => {
      const { port } = s.address() as AddressInfo;
      s.close(() => resolve(port));
    });
  });

const aMail = (label: string): QueuedMail => {
  const key = `test:${label}:${randomUUID()}`;
  return { organizationId: null, kind: "receipt", key, to: `${label}-${key.slice(-8)}@test.example`, subject: `Outbox test ${label}`, text: `Body of ${label}` };
};

type Row = { status: string; attempts: number; last_error: string | null; sent_at: Date | null; text_body: string };
const rowOf = async (ds: DataSource, key: string): Promise<Row | undefined> => (await ds.query("SELECT status, attempts, last_error, sent_at, text_body FROM outbox_mails WHERE idempotency_key = $1", [key]))[0];

/** The outbox on its own, with no app running, so no other drain takes these rows. */
describe("mail outbox", () => {
  let dataSource: DataSource;
  let mail: MailFake;
  const outboxes: Outbox[] = [];
  const open = (smtpPort: number, options: OutboxOptions = {}) => {
    const config = loadConfig({ ...process.env, NODE_ENV: "test", HUSHMARK_SMTP_PORT: String(smtpPort), HUSHMARK_LOG_LEVEL: "silent" });
    // A poll an hour apart: each test drives the drains itself.
    const outbox = createOutbox({ dataSource, mailer: createMailer(config, logger), logger, mailFrom: config.mailFrom, options: { pollMs: 3_600_000, drainOnStart: false, ...options } });
    outboxes.push(outbox);
    return outbox;
  };

  beforeAll(async () => {
    dataSource = createDataSource(process.env.DATABASE_URL!, { poolSize: 6 });
    await dataSource.initialize();
    mail = await startMailFake();
  });
  afterAll(async () => {
    for (const o of outboxes) await o.close();
    await mail?.close();
    await dataSource?.destroy();
  });

  it("queues nothing for a change that rolls back, and one row for one that commits", async () => {
    const lost = aMail("rolled-back");
    await expect(
      dataSource.transaction(async (m) => {
        expect(await queueMail(m, lost)).toBe(true);
        throw new Error("the business change failed");
      }),
    ).rejects.toThrow("the business change failed");
    expect(await rowOf(dataSource, lost.key)).toBeUndefined();

    const kept = aMail("committed");
    await dataSource.transaction((m) => queueMail(m, kept));
    expect((await rowOf(dataSource, kept.key))?.status).toBe("pending");
    // The same key again (a repeated job) is ignored, inside a transaction or not.
    expect(await dataSource.transaction((m) => queueMail(m, { ...kept, subject: "A second copy" }))).toBe(false);
    const n: { n: string }[] = await dataSource.query("SELECT count(*) AS n FROM outbox_mails WHERE idempotency_key = $1", [kept.key]);
    expect(Number(n[0]!.n)).toBe(1);
    await open(mail.smtpPort).drain();
    expect((await rowOf(dataSource, kept.key))?.status).toBe("sent");
  });

  it("sends once when drained twice, and from two processes at the same moment, with the Message-ID of its key", async () => {
    const one = aMail("twice");
    await dataSource.transaction((m) => queueMail(m, one));
    const a = open(mail.smtpPort);
    const b = open(mail.smtpPort);
    await Promise.all([a.drain(), b.drain(), a.drain()]);
    await a.drain();
    await b.drain();
    const got = mail.messages().filter((m) => m.to.includes(one.to));
    expect(got).toHaveLength(1);
    expect(got[0]!.messageId).toBe(messageIdFor(one.key, DOMAIN));
    expect(got[0]!.text.trim()).toBe(one.text);
    const row = await rowOf(dataSource, one.key);
    expect(row).toMatchObject({ status: "sent", attempts: 1, last_error: null });
    expect(row!.sent_at).not.toBeNull();
  });

  it("keeps the mail pending while the SMTP relay is down and sends it once the relay is back", async () => {
    const port = await freePort();
    const outbox = open(port, { baseDelayMs: 200, maxDelayMs: 200 });
    const queued = aMail("relay-down");
    await dataSource.transaction((m) => queueMail(m, queued));
    expect(await outbox.drain()).toEqual({ sent: 0, deferred: 1, failed: 0 });
    const waiting = await rowOf(dataSource, queued.key);
    expect(waiting).toMatchObject({ status: "pending", attempts: 1 });
    expect(waiting!.last_error).toMatch(/ECONNREFUSED|connect/i);
    // Not tried again before its backoff has passed.
    expect(await outbox.drain()).toEqual({ sent: 0, deferred: 0, failed: 0 });

    const relay = await startMailFake({ smtpPort: port });
    try {
      await new Promise((r) => setTimeout(r, 250));
      expect((await outbox.drain()).sent).toBe(1);
      const got = relay.messages().filter((m) => m.to.includes(queued.to));
      expect(got.map((m) => m.messageId)).toEqual([messageIdFor(queued.key, DOMAIN)]);
      expect(await rowOf(dataSource, queued.key)).toMatchObject({ status: "sent", attempts: 2, last_error: null });
    } finally {
      await relay.close();
    }
  });

  it("gives up after its attempts as failed with the error kept, and sends again when retried by hand", async () => {
    const port = await freePort();
    const down = open(port, { baseDelayMs: 1, maxDelayMs: 1, maxAttempts: 3 });
    const queued = aMail("gives-up");
    await dataSource.transaction((m) => queueMail(m, queued));
    const outcomes = [];
    for (let i = 0; i < 4; i += 1) {
      outcomes.push(await down.drain());
      await new Promise((r) => setTimeout(r, 20));
    }
    expect(outcomes.map((o) => o.deferred + 2 * o.failed)).toEqual([1, 1, 2, 0]);
    const failed = await rowOf(dataSource, queued.key);
    expect(failed).toMatchObject({ status: "failed", attempts: 3 });
    expect(failed!.last_error).toMatch(/ECONNREFUSED|connect/i);

    const [{ id }] = await dataSource.query("SELECT id FROM outbox_mails WHERE idempotency_key = $1", [queued.key]);
    const up = open(mail.smtpPort);
    expect(await up.retryFailed([id])).toBe(1);
    await until("the retried mail", async () => ((await rowOf(dataSource, queued.key))?.status === "sent" ? true : undefined), 10_000);
    expect(mail.messages().filter((m) => m.to.includes(queued.to))).toHaveLength(1);
  });
});

describe("mail outbox in the app", () => {
  // Sign-ups and accepted invitations count against a per-address limit shared in the database by
  // every file run from loopback; apps made with the default limit later on must not inherit these.
  afterAll(async () => {
    const ds = createDataSource(process.env.DATABASE_URL!, { poolSize: 1 });
    await ds.initialize();
    await ds.query("DELETE FROM rate_limit_buckets");
    await ds.destroy();
  });

  it("sends a password reset through the outbox and keeps no usable link in the database afterwards", async () => {
    const h = await startHarness();
    try {
      const { email } = await newFirm(h);
      expect((await h.request().post("/api/v1/auth/password-reset/request").send({ email })).status).toBe(202);
      const token = await mailedToken(h, email, "/reset-password/");
      const rows: { status: string; text_body: string; html_body: string | null; idempotency_key: string }[] = await until("the sent row", async () => {
        const r = await h.dataSource.query("SELECT o.status, o.text_body, o.html_body, o.idempotency_key FROM outbox_mails o WHERE o.kind = 'password-reset' AND o.to_address = $1", [email]);
        return r[0]?.status === "sent" ? r : undefined;
      });
      expect(rows).toHaveLength(1);
      expect(rows[0]!.text_body).toBe(SENT_SECRET_BODY);
      expect(rows[0]!.html_body).toBeNull();
      expect(JSON.stringify(rows)).not.toContain(token);
      const message = h.mail.messages().find((m) => m.to.includes(email))!;
      expect(message.messageId).toBe(messageIdFor(rows[0]!.idempotency_key, DOMAIN));
    } finally {
      await h.close();
    }
  });

  describe("a payment's webhook delivered again", () => {
    let h: MoneyHarness;
    beforeAll(async () => {
      h = await startMoneyHarness();
    });
    afterAll(async () => {
      await h?.close();
    });

    it("queues and sends one receipt", async () => {
      const p = await pricedProject(h);
      const scenario = await p.planner.post(`/api/v1/projects/${p.projectId}/scenarios`).send({ name: "Door", setup: SETUP(p.planVersion), items: [{ priceBookItemId: p.byCode("door-bottom-auto").id, elementId: "door-studio" }] });
      const proposalId = (await p.planner.post(`/api/v1/projects/${p.projectId}/proposals`).send({ scenarioId: scenario.body.id })).body.id as string;
      expect((await p.planner.post(`/api/v1/proposals/${proposalId}/send`).send({})).status).toBe(200);
      expect((await p.client.agent.post(`/api/v1/proposals/${proposalId}/approve`).send({ version: 1 })).status).toBe(200);
      const start = await p.client.agent.post(`/api/v1/proposals/${proposalId}/deposit`).send({ version: 1 });
      expect(start.status, JSON.stringify(start.body)).toBe(201);
      const paymentId = start.body.paymentId as string;
      const paid = await fetch(start.body.url, { method: "POST", body: new URLSearchParams({ card: "4242 4242 4242 4242", expiry: "12/34", cvc: "123" }), redirect: "manual" });
      expect(paid.status).toBe(303);
      await h.payments.idle();
      const receipts = () => h.mail.messages().filter((m) => m.subject.startsWith("Receipt") && m.to.includes(p.client.email));
      await until("the receipt", async () => (receipts().length > 0 ? true : undefined));

      const completed = h.payments.events().find((e) => e.type === "checkout.session.completed" && JSON.stringify(e).includes(paymentId))!;
      for (let i = 0; i < 3; i += 1) {
        const again = await fetch(`${h.payments.url}/_fake/events/${completed.id}/resend`, { method: "POST" });
        expect(await again.json()).toEqual({ status: 200 });
      }
      // The in-process drain is kicked after every commit; one more pass settles anything queued.
      await new Promise((r) => setTimeout(r, 300));
      const rows: { status: string; kind: string }[] = await h.dataSource.query("SELECT status, kind FROM outbox_mails WHERE idempotency_key = $1", [`receipt:${paymentId}`]);
      expect(rows).toEqual([{ status: "sent", kind: "receipt" }]);
      expect(receipts()).toHaveLength(1);
      expect(receipts()[0]!.messageId).toBe(messageIdFor(`receipt:${paymentId}`, DOMAIN));
      expect(receipts()[0]!.text).toContain(paymentId);
    });
  });
});
