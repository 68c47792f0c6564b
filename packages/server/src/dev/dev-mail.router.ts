import { Router } from "express";
import type { AppConfig } from "../config.js";

interface FakeMessage {
  id: string;
  to: string[];
  subject: string;
  text: string;
  html: string;
  links: string[];
  receivedAt: string;
}

const escapeHtml = (s: string) => s.replace(/[&<>"']/g, (c) => ({ "&": "&amp;", "<": "&lt;", ">": "&gt;", '"': "&quot;", "'": "&#39;" })[c]!);

/**
 * Development only: the mail the local SMTP fake received, as a page (`/dev/mail`) and as JSON
 * (`/api/v1/dev/mail`). Never mounted in production.
 */
export function devMailRouter(config: AppConfig): Router {
  const router = Router();
  async function fetchMessages(to?: string): Promise<FakeMessage[]> {
    const url = new URL(`${config.mailApiUrl}/messages`);
    if (to) url.searchParams.set("to", to);
    const res = await fetch(url);
    if (!res.ok) throw new Error(`mail fake answered ${res.status}`);
    return ((await res.json()) as { messages: FakeMessage[] }).messages;
  }
  router.get("/api/v1/dev/mail", async (req, res) => {
    const to = typeof req.query.to === "string" ? req.query.to : undefined;
    try {
      res.json({ messages: await fetchMessages(to) });
    } catch {
      res.status(503).json({ error: { code: "mail_fake_unavailable", message: "The local mail fake is not running." } });
    }
  });
  router.get("/dev/mail", async (_req, res) => {
    let body: string;
    try {
      const messages = await fetchMessages();
      body = messages.length
        ? messages
            .map(
              (m) => `<article class="mail"><header><h2>${escapeHtml(m.subject)}</h2><p class="meta">to ${escapeHtml(m.to.join(", "))} · ${escapeHtml(new Date(m.receivedAt).toLocaleString("en-GB"))}</p></header>
<pre>${escapeHtml(m.text)}</pre>
<ul class="links">${m.links.map((l) => `<li><a href="${escapeHtml(l)}">${escapeHtml(l)}</a></li>`).join("")}</ul></article>`,
            )
            .join("\n")
        : `<p class="empty">No mail yet. Invitations and password resets sent by the app appear here.</p>`;
    } catch {
      body = `<p class="empty">The local mail fake is not running, so there is nothing to show.</p>`;
    }
    res.type("html").send(`<!doctype html><html lang="en"><head><meta charset="utf-8"><title>Development inbox · Hushmark</title>
<meta name="viewport" content="width=device-width, initial-scale=1"><link rel="icon" href="data:,"><link rel="stylesheet" href="/dev/mail.css"></head>
<body><main><h1>Development inbox</h1><p class="note">Mail the app sent while running locally. This page does not exist in production.</p>${body}</main></body></html>`);
  });
  router.get("/dev/mail.css", (_req, res) => {
    res.type("css").send(`body{font-family:system-ui,sans-serif;background:#f7f5f0;color:#1d2433;margin:0}main{max-width:760px;margin:0 auto;padding:24px}
h1{font-size:22px}.note,.meta{color:#6b7080;font-size:14px}.mail{background:#fff;border:1px solid #d9d4c7;border-radius:8px;padding:16px;margin:16px 0}
.mail h2{font-size:17px;margin:0}pre{white-space:pre-wrap;font:inherit}a{color:#1f7a74;word-break:break-all}.empty{color:#6b7080}`);
  });
  return router;
}
