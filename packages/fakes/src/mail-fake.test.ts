import nodemailer from "nodemailer";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { startMailFake, type MailFake } from "./mail-fake.js";

describe("mail fake", () => {
  let fake: MailFake;
  beforeAll(async () => {
    fake = await startMailFake();
  });
  afterAll(async () => fake.close());

  it("keeps a message sent through nodemailer and lists it with its links over HTTP", async () => {
    const transport = nodemailer.createTransport({ host: "127.0.0.1", port: fake.smtpPort, secure: false, ignoreTLS: true });
    await transport.sendMail({
      from: "Hushmark <no-reply@hushmark.test>",
      to: "rhea@quietline.example",
      subject: "You are invited",
      text: "Open http://127.0.0.1:8080/invitations/abc123 to join.",
    });
    const res = await fetch(`http://127.0.0.1:${fake.httpPort}/messages?to=rhea@quietline.example`);
    const body = (await res.json()) as { messages: { subject: string; links: string[]; to: string[] }[] };
    expect(body.messages).toHaveLength(1);
    expect(body.messages[0]?.subject).toBe("You are invited");
    expect(body.messages[0]?.links).toEqual(["http://127.0.0.1:8080/invitations/abc123"]);
    const other = await fetch(`http://127.0.0.1:${fake.httpPort}/messages?to=someone@else.example`);
    expect(((await other.json()) as { messages: unknown[] }).messages).toHaveLength(0);
  });
});
