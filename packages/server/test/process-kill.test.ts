import "reflect-metadata";
import { createServer, type Socket } from "node:net";
import type { AddressInfo } from "node:net";
import PgBoss from "pg-boss";
import supertest from "supertest";
import type { DataSource } from "typeorm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { startPaymentsFake, type MailFake, type PaymentsFake } from "@hushmark/fakes";
import { messageIdFor } from "../src/outbox/outbox.js";
import { PASSWORD, uniqueEmail, type Harness } from "./harness.js";
import { demoPlan, pricedProject, SETUP, until } from "./money-harness.js";
import { freePort, person, startProcessFixture, startServerProcess, type ServerProcess } from "./support/server-process.js";

const JOBS_SCHEMA = `pgboss_kill_${process.pid}`;

/**
 * The server process killed outright (SIGKILL: no shutdown hook runs) in the middle of saves and of
 * a background job; a new process on the same port takes over. Saves are whole or absent, and the
 * job's effect happens once, its e-mail included.
 */
describe("server process killed", () => {
  let fixture: Awaited<ReturnType<typeof startProcessFixture>>;
  let mail: MailFake;
  let payments: PaymentsFake;
  let dataSource: DataSource;
  let server: ServerProcess | undefined;
  let port: number;
  let env: Record<string, string>;

  const restart = async () => {
    server = await startServerProcess(env, port);
  };

  beforeAll(async () => {
    fixture = await startProcessFixture(JOBS_SCHEMA, "process-kill");
    ({ mail, dataSource } = fixture);
    port = await freePort();
    // Retries far enough apart for a new process to be up before the next delivery.
    payments = await startPaymentsFake({ webhookUrl: `http://127.0.0.1:${port}/api/v1/payments/webhook`, webhookSecret: "whsec_kill_test", retryDelaysMs: [1500, 3000, 6000, 10_000] });
    env = {
      ...fixture.env,
      HUSHMARK_STRIPE_SECRET_KEY: "sk_test_kill",
      HUSHMARK_STRIPE_WEBHOOK_SECRET: "whsec_kill_test",
      HUSHMARK_STRIPE_HOST: "127.0.0.1",
      HUSHMARK_STRIPE_PORT: String(payments.port),
      HUSHMARK_STRIPE_PROTOCOL: "http",
      HUSHMARK_PUBLIC_URL: `http://127.0.0.1:${port}`,
    };
    await restart();
  }, 60_000);
  afterAll(async () => {
    await server?.kill("SIGTERM");
    await payments?.close();
    await fixture?.close();
  }, 60_000);

  it("leaves each plan at a whole revision, old or new, when killed mid-save (4 kills at random moments)", async () => {
    const call = person(() => server!.base);
    expect((await call("POST", "/api/v1/auth/sign-up", { firmName: "Kill Firm", displayName: "Owner", email: uniqueEmail("kill"), password: PASSWORD })).status).toBe(201);
    const projectId = (await call("POST", "/api/v1/projects", { title: "Killed while saving" })).body.id as string;
    // About 700 kB of notes so that a save spends a while in the process and in the transaction.
    const notes = Object.fromEntries(Array.from({ length: 2000 }, (_, i) => [`note-${i}`, { type: "note", id: `note-${i}`, levelId: "ground", position: { x: i % 14, y: i % 9 }, text: `Survey note ${i} `.repeat(15) }]));
    const big = { ...demoPlan, elements: { ...(demoPlan.elements as object), ...notes } };
    const sent = new Set<string>();
    const acknowledged = new Map<number, string>();
    let version = (await call("GET", `/api/v1/projects/${projectId}/plan`)).body.version as number;

    for (let round = 0; round < 4; round += 1) {
      let running = true;
      let n = 0;
      const saver = (async () => {
        while (running) {
          const name = `Round ${round} save ${(n += 1)}`;
          sent.add(name);
          const res = await call("PUT", `/api/v1/projects/${projectId}/plan`, { baseVersion: version, document: { ...big, name } }).catch(() => ({ status: 0, body: null }));
          if (res.status === 200) {
            version = res.body.version;
            acknowledged.set(res.body.version, name);
          } else if (res.status === 0) running = false;
          else throw new Error(`a save answered ${res.status}: ${JSON.stringify(res.body).slice(0, 300)}`);
        }
      })();
      // At least one save of this round in, then the kill at a random moment of the next ones.
      const acked = acknowledged.size;
      for (let i = 0; i < 200 && acknowledged.size === acked; i += 1) await new Promise((r) => setTimeout(r, 50));
      await new Promise((r) => setTimeout(r, Math.floor(Math.random() * 600)));
      expect(await server!.kill("SIGKILL")).toBe("SIGKILL");
      running = false;
      await saver;
      await restart();
      version = (await call("GET", `/api/v1/projects/${projectId}/plan`)).body.version as number;

      const [plan] = await dataSource.query("SELECT version, document->>'name' AS name, md5(document::text) AS hash FROM plans WHERE project_id = $1", [projectId]);
      const revisions: { version: number; name: string; hash: string }[] = await dataSource.query(
        "SELECT version, document->>'name' AS name, md5(document::text) AS hash FROM plan_revisions WHERE project_id = $1 ORDER BY version",
        [projectId],
      );
      expect(revisions.map((r) => r.version), `round ${round}`).toEqual(Array.from({ length: plan.version }, (_, i) => i + 1));
      if (plan.version > 0) expect(revisions.at(-1)!.hash, `round ${round}: the plan is not its newest revision`).toBe(plan.hash);
      else expect(plan.name).toBe("Killed while saving");
      for (const r of revisions.slice(1)) expect(sent.has(r.name), `revision ${r.version} holds a document nobody sent`).toBe(true);
      for (const [v, name] of acknowledged) expect(revisions.find((r) => r.version === v)?.name, `acknowledged version ${v}`).toBe(name);
    }
    expect(acknowledged.size).toBeGreaterThan(0);
  }, 60_000);

  it("renders a proposal's PDF exactly once in effect when the process dies during the job", async () => {
    const h: Harness = { dataSource, mail, request: () => supertest.agent(server!.base), close: async () => undefined };
    const p = await pricedProject(h);
    const scenario = await p.planner.post(`/api/v1/projects/${p.projectId}/scenarios`).send({
      name: "Seal and line",
      setup: SETUP(p.planVersion),
      items: [
        { priceBookItemId: p.byCode("door-bottom-auto").id, elementId: "door-studio" },
        { priceBookItemId: p.byCode("baffle-box").id, elementId: "supply-duct" },
      ],
    });
    expect(scenario.status, JSON.stringify(scenario.body).slice(0, 300)).toBe(201);

    // Make proposals until the kill lands while a PDF job is running (a render takes a moment).
    let killed: { proposalId: string; jobId: string } | undefined;
    for (let attempt = 0; attempt < 5 && !killed; attempt += 1) {
      const created = await p.planner.post(`/api/v1/projects/${p.projectId}/proposals`).send({ scenarioId: scenario.body.id });
      expect(created.status).toBe(201);
      const job = await until("the PDF job", async () => {
        const rows: { id: string; state: string }[] = await dataSource.query(`SELECT id, state FROM ${JOBS_SCHEMA}.job WHERE name = 'proposal-pdf' AND data->>'proposalId' = $1`, [created.body.id]);
        return rows[0] && rows[0].state !== "created" ? rows[0] : undefined;
      }, 10_000).catch(() => undefined);
      if (job?.state === "active") {
        await server!.kill("SIGKILL");
        const [after] = await dataSource.query(`SELECT state FROM ${JOBS_SCHEMA}.job WHERE id = $1`, [job.id]);
        if (after.state === "active") killed = { proposalId: created.body.id, jobId: job.id };
        await restart();
      }
    }
    expect(killed, "never caught a PDF job running").toBeDefined();
    const { proposalId, jobId } = killed!;

    // The dead process's job stays active until its expiry (120 s); move its start back by an hour
    // instead of waiting, and let a maintenance pass (pg-boss's, every second here) take it back.
    await dataSource.query(`UPDATE ${JOBS_SCHEMA}.job SET started_on = now() - interval '1 hour' WHERE id = $1`, [jobId]);
    const maintenance = new PgBoss({ connectionString: process.env.DATABASE_URL!, schema: JOBS_SCHEMA, maintenanceIntervalSeconds: 1, schedule: false, max: 2 });
    maintenance.on("error", () => undefined);
    await maintenance.start();
    try {
      await until("the PDF after the crash", async () => {
        const r = await p.planner.get(`/api/v1/proposals/${proposalId}/versions/1/pdf`);
        return r.status === 200 ? true : undefined;
      }, 40_000);
    } finally {
      await maintenance.stop({ graceful: false, wait: true });
    }
    const [job] = await dataSource.query(`SELECT state, retry_count FROM ${JOBS_SCHEMA}.job WHERE id = $1`, [jobId]);
    expect(job.state).toBe("completed");
    expect(job.retry_count).toBeGreaterThanOrEqual(1);
    const [version] = await dataSource.query("SELECT pdf_status, pdf_file_id FROM proposal_versions WHERE proposal_id = $1 AND version = 1", [proposalId]);
    expect(version.pdf_status).toBe("ready");
    // One stored PDF for the version, and no orphan left by the killed render.
    const pdfs: { id: string }[] = await dataSource.query("SELECT id FROM stored_files WHERE project_id = $1 AND content_type = 'application/pdf' AND original_name LIKE $2", [p.projectId, `proposal-${proposalId.slice(0, 8)}-v1%`]);
    expect(pdfs.map((f) => f.id)).toEqual([version.pdf_file_id]);
  }, 90_000);

  it("records a deposit once when the process dies as the payment's webhook arrives", async () => {
    const h: Harness = { dataSource, mail, request: () => supertest.agent(server!.base), close: async () => undefined };
    const p = await pricedProject(h);
    const scenario = await p.planner.post(`/api/v1/projects/${p.projectId}/scenarios`).send({ name: "Door", setup: SETUP(p.planVersion), items: [{ priceBookItemId: p.byCode("door-bottom-auto").id, elementId: "door-studio" }] });
    const proposal = await p.planner.post(`/api/v1/projects/${p.projectId}/proposals`).send({ scenarioId: scenario.body.id });
    const proposalId = proposal.body.id as string;
    expect((await p.planner.post(`/api/v1/proposals/${proposalId}/send`).send({})).status).toBe(200);
    expect((await p.client.agent.post(`/api/v1/proposals/${proposalId}/approve`).send({ version: 1 })).status).toBe(200);
    const start = await p.client.agent.post(`/api/v1/proposals/${proposalId}/deposit`).send({ version: 1 });
    expect(start.status, JSON.stringify(start.body)).toBe(201);

    const eventsBefore = payments.events().length;
    const paid = await fetch(start.body.url, { method: "POST", body: new URLSearchParams({ card: "4242 4242 4242 4242", expiry: "12/34", cvc: "123" }), redirect: "manual" });
    expect(paid.status).toBe(303);
    // Kill a few milliseconds after the payment's events exist, as their first delivery is on its
    // way to the server or being handled there.
    await until("the payment's events", async () => (payments.events().length > eventsBefore ? true : undefined), 10_000);
    await new Promise((r) => setTimeout(r, Math.floor(Math.random() * 30)));
    await server!.kill("SIGKILL");
    const firstTries = payments.deliveries().filter((d) => d.attempt === 1 && payments.events().slice(eventsBefore).some((e) => e.id === d.eventId));
    console.info(`[process-kill] first webhook deliveries when killed: ${firstTries.map((d) => d.status ?? d.error).join(", ") || "none finished"}`);
    await restart();
    await payments.idle();
    const after = await until("the paid deposit", async () => {
      const r = await p.client.agent.get(`/api/v1/proposals/${proposalId}`);
      return r.body.status === "deposit_paid" ? r.body : undefined;
    }, 30_000);
    // Whatever the fake redelivers, one paid payment and one record of each event.
    const completed = payments.events().find((e) => e.type === "checkout.session.completed")!;
    await fetch(`${payments.url}/_fake/events/${completed.id}/resend`, { method: "POST" });
    const rows: { n: string }[] = await dataSource.query("SELECT count(*) AS n FROM payments WHERE proposal_id = $1 AND status = 'paid'", [proposalId]);
    expect(Number(rows[0]!.n)).toBe(1);
    expect(after.payments.filter((x: { status: string }) => x.status === "paid")).toHaveLength(1);
    const events: { n: string }[] = await dataSource.query("SELECT count(*) AS n FROM payment_events WHERE event_id = $1", [completed.id]);
    expect(Number(events[0]!.n)).toBe(1);
    // The receipt is queued in the payment's transaction, so it goes out whichever moment the kill
    // hit. A kill between the relay's accept and the outbox's update would send it twice, with one
    // Message-ID (the reader's mail program shows it once): count messages by that id.
    const paymentId = start.body.paymentId as string;
    const receipts = () => mail.messages().filter((m) => m.subject.startsWith("Receipt") && m.to.includes(p.client.email));
    await until("the receipt", async () => (receipts().length > 0 ? true : undefined), 20_000);
    await new Promise((r) => setTimeout(r, 500));
    console.info(`[process-kill] receipt messages in the mail fake: ${receipts().length}`);
    expect([...new Set(receipts().map((m) => m.messageId))]).toEqual([messageIdFor(`receipt:${paymentId}`, "hushmark.local")]);
    const queued: { status: string }[] = await dataSource.query("SELECT status FROM outbox_mails WHERE idempotency_key = $1", [`receipt:${paymentId}`]);
    expect(queued).toEqual([{ status: "sent" }]);
  }, 90_000);

  it("mails a sent proposal exactly once when the process dies after the commit, before the mail went out", async () => {
    const h: Harness = { dataSource, mail, request: () => supertest.agent(server!.base), close: async () => undefined };
    const p = await pricedProject(h);
    const scenario = await p.planner.post(`/api/v1/projects/${p.projectId}/scenarios`).send({ name: "Door", setup: SETUP(p.planVersion), items: [{ priceBookItemId: p.byCode("door-bottom-auto").id, elementId: "door-studio" }] });
    const proposalId = (await p.planner.post(`/api/v1/projects/${p.projectId}/proposals`).send({ scenarioId: scenario.body.id })).body.id as string;

    // A relay that takes the connection and never answers: the send is in flight when the kill lands.
    const held: Socket[] = [];
    const relay = createServer((socket) => {
      held.push(socket);
      socket.on("error", () => undefined);
    });
    await new Promise<void>((r) => relay.listen(0, "127.0.0.1", () => r()));
    const smtpPort = env.HUSHMARK_SMTP_PORT!;
    try {
      await server!.kill("SIGTERM");
      env = { ...env, HUSHMARK_SMTP_PORT: String((relay.address() as AddressInfo).port) };
      await restart();
      const sent = await p.planner.post(`/api/v1/proposals/${proposalId}/send`).send({});
      expect(sent.status, JSON.stringify(sent.body).slice(0, 300)).toBe(200);
      await until("the send reaching the relay", async () => (held.length > 0 ? true : undefined), 5000);
      expect(await server!.kill("SIGKILL")).toBe("SIGKILL");
    } finally {
      env = { ...env, HUSHMARK_SMTP_PORT: smtpPort };
      for (const s of held) s.destroy();
      await new Promise<void>((r) => relay.close(() => r()));
    }
    const key = `proposal-sent:${proposalId}:v1:${p.client.membershipId}`;
    const [pending] = await dataSource.query("SELECT status, attempts FROM outbox_mails WHERE idempotency_key = $1", [key]);
    // The killed send's transaction died with its connection: the row is as it was queued.
    expect(pending).toEqual({ status: "pending", attempts: 0 });
    expect(mail.messages().filter((m) => m.to.includes(p.client.email) && m.subject.includes("proposal"))).toHaveLength(0);

    await restart();
    const proposalMails = () => mail.messages().filter((m) => m.to.includes(p.client.email) && m.subject.includes("proposal"));
    await until("the proposal mail from the new process", async () => (proposalMails().length > 0 ? true : undefined), 20_000);
    await new Promise((r) => setTimeout(r, 500));
    expect(proposalMails()).toHaveLength(1);
    expect(proposalMails()[0]!.messageId).toBe(messageIdFor(key, "hushmark.local"));
    expect(proposalMails()[0]!.links.some((l) => l.endsWith(`/portal/proposals/${proposalId}`))).toBe(true);
    const [done] = await dataSource.query("SELECT status, attempts FROM outbox_mails WHERE idempotency_key = $1", [key]);
    expect(done).toEqual({ status: "sent", attempts: 1 });
  }, 90_000);
});
