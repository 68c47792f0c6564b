import { createServer, type Server } from "node:http";
import type { AddressInfo } from "node:net";
import { simpleParser } from "mailparser";
import { SMTPServer } from "smtp-server";

/** One message the fake received, as its HTTP API answers it. */
export interface ReceivedMail {
  id: string;
  /** The Message-ID header as sent (empty if the sender gave none), so a repeated send is recognisable. */
  messageId: string;
  from: string;
  to: string[];
  subject: string;
  text: string;
  html: string;
  links: string[];
  receivedAt: string;
}

export interface MailFakeOptions {
  host?: string;
  smtpPort?: number;
  httpPort?: number;
  /** Oldest messages are dropped past this count so a long-running fake stays bounded. */
  keep?: number;
}

export interface MailFake {
  smtpPort: number;
  httpPort: number;
  messages(): ReceivedMail[];
  clear(): void;
  close(): Promise<void>;
}

const LINK_PATTERN = /https?:\/\/[^\s"'<>]+/g;

function addressList(value: unknown): string[] {
  const list = Array.isArray(value) ? value : value ? [value] : [];
  return list.flatMap((entry: { value?: { address?: string }[] }) =>
    (entry.value ?? []).map((a) => a.address ?? "").filter(Boolean),
  );
}

/**
 * A local stand-in for an SMTP relay: accepts any message on loopback, keeps it in memory and
 * lists it over HTTP (`GET /messages`, `DELETE /messages`) so the dev inbox page and the tests
 * can read what the app sent.
 */
export async function startMailFake(options: MailFakeOptions = {}): Promise<MailFake> {
  const host = options.host ?? "127.0.0.1";
  const keep = options.keep ?? 500;
  let store: ReceivedMail[] = [];
  let counter = 0;

  const smtp = new SMTPServer({
    authOptional: true,
    disabledCommands: ["STARTTLS"],
    logger: false,
    onData(stream, _session, callback) {
      simpleParser(stream)
        .then((mail) => {
          counter += 1;
          const text = mail.text ?? "";
          const html = typeof mail.html === "string" ? mail.html : "";
          const links = [...new Set([...(text.match(LINK_PATTERN) ?? []), ...(html.match(LINK_PATTERN) ?? [])])];
          store.push({
            id: String(counter),
            messageId: mail.messageId ?? "",
            from: addressList(mail.from)[0] ?? "",
            to: addressList(mail.to),
            subject: mail.subject ?? "",
            text,
            html,
            links,
            receivedAt: new Date().toISOString(),
          });
          if (store.length > keep) store = store.slice(store.length - keep);
          callback();
        })
        .catch((error: Error) => callback(error));
    },
  });

  await new Promise<void>((resolve, reject) => {
    smtp.once("error", reject);
    smtp.listen(options.smtpPort ?? 0, host, () => resolve());
  });
  const smtpPort = (smtp.server.address() as AddressInfo).port;

  const http: Server = createServer((req, res) => {
    const url = new URL(req.url ?? "/", "http://fake");
    if (url.pathname === "/messages" && req.method === "GET") {
      const to = url.searchParams.get("to")?.toLowerCase();
      const list = to ? store.filter((m) => m.to.some((a) => a.toLowerCase() === to)) : store;
      res.writeHead(200, { "content-type": "application/json" });
      res.end(JSON.stringify({ messages: [...list].reverse() }));
      return;
    }
    if (url.pathname === "/messages" && req.method === "DELETE") {
      store = [];
      res.writeHead(204).end();
      return;
    }
    if (url.pathname === "/health") {
      res.writeHead(200, { "content-type": "application/json" }).end('{"status":"ok"}');
      return;
    }
    res.writeHead(404, { "content-type": "application/json" }).end('{"error":"not found"}');
  });
  await new Promise<void>((resolve, reject) => {
    http.once("error", reject);
    http.listen(options.httpPort ?? 0, host, () => resolve());
  });
  const httpPort = (http.address() as AddressInfo).port;

  return {
    smtpPort,
    httpPort,
    messages: () => [...store],
    clear: () => {
      store = [];
    },
    close: async () => {
      await new Promise<void>((resolve) => http.close(() => resolve()));
      await new Promise<void>((resolve) => smtp.close(() => resolve()));
    },
  };
}
