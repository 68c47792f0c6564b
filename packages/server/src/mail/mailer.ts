import nodemailer, { type Transporter } from "nodemailer";
import type { Logger } from "pino";
import type { AppConfig } from "../config.js";

export interface OutgoingMail {
  to: string;
  subject: string;
  text: string;
  html?: string;
  /** A Message-ID of our own (`<…@…>`); the outbox derives it from the mail's key so a resend is the same message. */
  messageId?: string;
}

export interface Mailer {
  send(mail: OutgoingMail): Promise<void>;
  close(): void;
}

/** Sends mail through SMTP (the local fake in development and tests, a real relay in production). */
export function createMailer(config: AppConfig, logger: Logger): Mailer {
  const transport: Transporter = nodemailer.createTransport({
    host: config.smtp.host,
    port: config.smtp.port,
    secure: config.smtp.secure,
    ignoreTLS: config.env !== "production" && !config.smtp.secure,
    ...(config.smtp.user ? { auth: { user: config.smtp.user, pass: config.smtp.password ?? "" } } : {}),
    connectionTimeout: 5000,
    greetingTimeout: 5000,
    // The outbox holds its row's lock while sending; a relay that stops answering must not hold it for long.
    socketTimeout: 20_000,
  });
  return {
    async send(mail) {
      await transport.sendMail({ from: config.mailFrom, ...mail });
      logger.info({ to: mail.to, subject: mail.subject, messageId: mail.messageId }, "mail sent");
    },
    close: () => transport.close(),
  };
}

const escapeHtml = (s: string) => s.replace(/[&<>"']/g, (c) => ({ "&": "&amp;", "<": "&lt;", ">": "&gt;", '"': "&quot;", "'": "&#39;" })[c]!);

/** A plain message with one call to action, as text and simple HTML. */
export function linkMail(to: string, subject: string, lines: string[], link: { label: string; url: string }, footer: string): OutgoingMail {
  const text = [...lines, "", `${link.label}: ${link.url}`, "", footer].join("\n");
  const html = [
    `<div style="font-family: sans-serif; color: #1d2433; max-width: 520px">`,
    ...lines.map((l) => `<p>${escapeHtml(l)}</p>`),
    `<p><a href="${escapeHtml(link.url)}" style="color: #1f7a74; font-weight: 600">${escapeHtml(link.label)}</a></p>`,
    `<p style="color: #6b7080; font-size: 13px">${escapeHtml(footer)}</p>`,
    `</div>`,
  ].join("\n");
  return { to, subject, text, html };
}
