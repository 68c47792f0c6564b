import "reflect-metadata";
import { randomUUID } from "node:crypto";
import { pino } from "pino";
import supertest from "supertest";
import type { DataSource } from "typeorm";
import { startMailFake, type MailFake } from "@hushmark/fakes";
import type { Me, Role } from "@hushmark/schemas";
import { createApp, type AppDeps } from "../src/app.js";
import { loadConfig } from "../src/config.js";
import { createDataSource } from "../src/data-source.js";

export const PASSWORD = "a perfectly fine passphrase";

export interface Harness {
  dataSource: DataSource;
  mail: MailFake;
  request: () => supertest.Agent;
  close: () => Promise<void>;
}

/** The real app over the test database, with an in-process mail fake. */
export async function startHarness(overrides: Partial<AppDeps> = {}): Promise<Harness> {
  const mail = await startMailFake();
  const config = loadConfig({
    ...process.env,
    NODE_ENV: "test",
    HUSHMARK_SMTP_PORT: String(mail.smtpPort),
    HUSHMARK_MAIL_API_URL: `http://127.0.0.1:${mail.httpPort}`,
    HUSHMARK_PUBLIC_URL: "http://hushmark.test",
    HUSHMARK_LOG_LEVEL: "silent",
  });
  const dataSource = createDataSource(config.databaseUrl, { poolSize: 5 });
  await dataSource.initialize();
  const { app, close } = createApp({
    dataSource,
    config,
    logger: pino({ level: process.env.HUSHMARK_TEST_LOG_LEVEL ?? "silent" }),
    signInLimits: { windowMs: 60_000, perAddress: 100_000, perAccountAndAddress: 100_000, perAccount: 100_000 },
    accountLimitPerAddress: 100_000,
    ...overrides,
  });
  return {
    dataSource,
    mail,
    request: () => supertest.agent(app),
    close: async () => {
      await close();
      await mail.close();
      await dataSource.destroy();
    },
  };
}

export const uniqueEmail = (label: string) => `${label}-${randomUUID().slice(0, 8)}@test.example`;

/** Signs up a new firm and answers an agent signed in as its owner. */
export async function newFirm(h: Harness, name = "Test Firm"): Promise<{ agent: supertest.Agent; me: Me; email: string }> {
  const agent = h.request();
  const email = uniqueEmail("owner");
  const res = await agent.post("/api/v1/auth/sign-up").send({ firmName: name, displayName: "Owner Person", email, password: PASSWORD });
  if (res.status !== 201) throw new Error(`sign-up answered ${res.status}: ${JSON.stringify(res.body)}`);
  return { agent, me: res.body as Me, email };
}

/** The token at the end of the newest link mailed to `email`. */
export async function mailedToken(h: Harness, email: string, pathPart: string): Promise<string> {
  for (let i = 0; i < 50; i += 1) {
    const message = h.mail.messages().reverse().find((m) => m.to.includes(email));
    const link = message?.links.find((l) => l.includes(pathPart));
    if (link) return link.split("/").pop()!;
    await new Promise((r) => setTimeout(r, 50));
  }
  throw new Error(`no mail with a ${pathPart} link reached ${email}`);
}

/** Invites `email` with `role` as the owner, accepts from the mail, and answers the new member's agent. */
export async function addMember(h: Harness, owner: supertest.Agent, role: Role): Promise<{ agent: supertest.Agent; email: string; membershipId: string }> {
  const email = uniqueEmail(role);
  const invite = await owner.post("/api/v1/people/invitations").send({ email, role });
  if (invite.status !== 201) throw new Error(`invite answered ${invite.status}: ${JSON.stringify(invite.body)}`);
  const token = await mailedToken(h, email, "/invitations/");
  const agent = h.request();
  const accepted = await agent.post("/api/v1/invitations/accept").send({ token, displayName: `A ${role}`, password: PASSWORD });
  if (accepted.status !== 200) throw new Error(`accept answered ${accepted.status}: ${JSON.stringify(accepted.body)}`);
  const people = await owner.get("/api/v1/people");
  const membershipId = (people.body.members as { email: string; membershipId: string }[]).find((m) => m.email === email)!.membershipId;
  return { agent, email, membershipId };
}
