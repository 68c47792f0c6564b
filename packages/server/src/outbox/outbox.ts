import { createHash } from "node:crypto";
import type { Logger } from "pino";
import type { DataSource, EntityManager } from "typeorm";
import type { Mailer, OutgoingMail } from "../mail/mailer.js";
import { OutboxMail } from "./outbox-mail.entity.js";

/** A mail to queue: what to send, who it is for, and the key that makes queuing it twice queue it once. */
export interface QueuedMail extends OutgoingMail {
  organizationId: string | null;
  kind: OutboxKind;
  /** Unique per effect, e.g. `receipt:<paymentId>`; a second queue with the same key is ignored. */
  key: string;
}

export type OutboxKind = "proposal-sent" | "receipt" | "password-reset" | "invitation";

/** Mails that carry a one-time link: their bodies are blanked once sent so the database keeps no usable token. */
const SECRET_KINDS: ReadonlySet<string> = new Set<OutboxKind>(["password-reset", "invitation"]);
export const SENT_SECRET_BODY = "(Removed after sending: this message held a one-time link.)";

export interface OutboxOptions {
  /** How often each process looks for due mail besides the kick after a commit (default 5 s). */
  pollMs?: number;
  /** Tries before a mail is marked failed (default 8: about 21 minutes of backoff at the defaults). */
  maxAttempts?: number;
  /** Wait after the first failure; doubled for each further one, capped at `maxDelayMs` (default 10 s). */
  baseDelayMs?: number;
  maxDelayMs?: number;
  /** Most mails one drain pass sends before yielding to the next (default 50). */
  batch?: number;
  /** Drain once as soon as the outbox is made (default true); tests that drive the drains turn it off. */
  drainOnStart?: boolean;
  /** The domain in generated Message-IDs (default: the From address's domain). */
  messageIdDomain?: string;
}

export interface DrainResult {
  sent: number;
  /** Failed this time and will be tried again after the backoff. */
  deferred: number;
  /** Gave up: attempts used up, kept as `failed` with the error. */
  failed: number;
}

export interface Outbox {
  /** Queues a mail inside the caller's transaction; answers false when its key was queued already. */
  queue(manager: EntityManager, mail: QueuedMail): Promise<boolean>;
  /** Starts a drain now (after a commit); returns at once. */
  kick(): void;
  /** Sends what is due; a pass already running is awaited and followed by one more. */
  drain(): Promise<DrainResult>;
  /** Puts failed mail back to pending for another round of attempts; answers how many. */
  retryFailed(ids?: string[]): Promise<number>;
  close(): Promise<void>;
}

/** A stable Message-ID for a key: a resend after a crash between the relay's accept and our update is the same message. */
export function messageIdFor(key: string, domain: string): string {
  return `<${createHash("sha256").update(key).digest("hex").slice(0, 40)}.outbox@${domain}>`;
}

const domainOf = (from: string) => /@([^>\s]+)>?\s*$/.exec(from)?.[1] ?? "hushmark.local";

/** Writes the row with the caller's manager, so it commits or rolls back with the business change. */
export async function queueMail(manager: EntityManager, mail: QueuedMail): Promise<boolean> {
  const rows: unknown[] = await manager.query(
    `INSERT INTO outbox_mails (organization_id, kind, idempotency_key, to_address, subject, text_body, html_body)
     VALUES ($1, $2, $3, $4, $5, $6, $7) ON CONFLICT (idempotency_key) DO NOTHING RETURNING id`,
    [mail.organizationId, mail.kind, mail.key, mail.to, mail.subject, mail.text, mail.html ?? null],
  );
  return rows.length > 0;
}

/** The wait before try number `attempts + 1`, after `attempts` failures. */
export function backoffMs(attempts: number, baseMs: number, maxMs: number): number {
  return Math.min(maxMs, baseMs * 2 ** Math.max(0, attempts - 1));
}

/**
 * The transactional outbox's sender. Each pass claims one due row at a time with
 * `FOR UPDATE SKIP LOCKED` (so two processes never send the same row at once), sends it while
 * holding the lock and marks it sent in the same transaction. A process killed mid-send drops its
 * connection, the lock goes with it and the row is still pending for the next process; the mail
 * is then sent again with the same Message-ID. Every process polls, so mail queued by a process
 * that died before its kick still goes out.
 */
export function createOutbox(deps: { dataSource: DataSource; mailer: Mailer; logger: Logger; mailFrom: string; options?: OutboxOptions | undefined }): Outbox {
  const { dataSource, mailer, logger } = deps;
  const o = deps.options ?? {};
  const pollMs = o.pollMs ?? 5000;
  const maxAttempts = o.maxAttempts ?? 8;
  const baseDelayMs = o.baseDelayMs ?? 10_000;
  const maxDelayMs = o.maxDelayMs ?? 15 * 60_000;
  const batch = o.batch ?? 50;
  const domain = o.messageIdDomain ?? domainOf(deps.mailFrom);
  let closed = false;
  let running: Promise<DrainResult> | null = null;
  let again = false;

  /** Claims and sends one due row not tried in this pass; null when nothing is due (or every due row is locked by another process). */
  async function sendOne(tried: string[]): Promise<keyof DrainResult | null> {
    return dataSource.transaction(async (m) => {
      const rows: { id: string; kind: string; idempotency_key: string; to_address: string; subject: string; text_body: string; html_body: string | null; attempts: number }[] = await m.query(
        `SELECT id, kind, idempotency_key, to_address, subject, text_body, html_body, attempts FROM outbox_mails
         WHERE status = 'pending' AND next_attempt_at <= now() AND id <> ALL($1::uuid[]) ORDER BY next_attempt_at, created_at LIMIT 1 FOR UPDATE SKIP LOCKED`,
        [tried],
      );
      const row = rows[0];
      if (!row) return null;
      // A short backoff could make the row due again within this pass; one try per pass.
      tried.push(row.id);
      const attempts = row.attempts + 1;
      try {
        await mailer.send({ to: row.to_address, subject: row.subject, text: row.text_body, ...(row.html_body ? { html: row.html_body } : {}), messageId: messageIdFor(row.idempotency_key, domain) });
      } catch (e) {
        const error = (e as Error).message.slice(0, 1000) || String(e);
        if (attempts >= maxAttempts) {
          await m.query("UPDATE outbox_mails SET status = 'failed', attempts = $2, last_error = $3 WHERE id = $1", [row.id, attempts, error]);
          logger.error({ outboxId: row.id, kind: row.kind, attempts, err: e }, "mail failed for good; kept in the outbox as failed");
          return "failed";
        }
        const wait = backoffMs(attempts, baseDelayMs, maxDelayMs);
        await m.query("UPDATE outbox_mails SET attempts = $2, last_error = $3, next_attempt_at = now() + make_interval(secs => $4) WHERE id = $1", [row.id, attempts, error, wait / 1000]);
        logger.warn({ outboxId: row.id, kind: row.kind, attempts, retryInMs: wait, err: e }, "mail not sent; will try again");
        return "deferred";
      }
      const secret = SECRET_KINDS.has(row.kind);
      await m.query(
        `UPDATE outbox_mails SET status = 'sent', attempts = $2, last_error = NULL, sent_at = now()${secret ? ", text_body = $3, html_body = NULL" : ""} WHERE id = $1`,
        secret ? [row.id, attempts, SENT_SECRET_BODY] : [row.id, attempts],
      );
      return "sent";
    });
  }

  async function pass(): Promise<DrainResult> {
    const result: DrainResult = { sent: 0, deferred: 0, failed: 0 };
    const tried: string[] = [];
    for (let i = 0; i < batch && !closed; i += 1) {
      const outcome = await sendOne(tried);
      if (!outcome) break;
      result[outcome] += 1;
    }
    return result;
  }

  function drain(): Promise<DrainResult> {
    if (running) {
      // A commit landed while a pass was running: run once more after it so its mail is not left for the poll.
      again = true;
      return running;
    }
    running = (async () => {
      const total: DrainResult = { sent: 0, deferred: 0, failed: 0 };
      do {
        again = false;
        const r = await pass();
        total.sent += r.sent;
        total.deferred += r.deferred;
        total.failed += r.failed;
      } while (again && !closed);
      return total;
    })().finally(() => {
      running = null;
    });
    return running;
  }

  function kick(): void {
    if (closed) return;
    drain().catch((e: unknown) => logger.error({ err: e }, "outbox drain failed; the next poll tries again"));
  }

  const timer = setInterval(kick, pollMs);
  timer.unref();
  // Mail left pending by a process that died goes out as soon as this one is up.
  if (o.drainOnStart !== false) setImmediate(kick);

  return {
    queue: queueMail,
    kick,
    drain,
    async retryFailed(ids) {
      // TypeORM answers an UPDATE as [rows, affected].
      const [, affected]: [unknown[], number] = await dataSource.query(
        `UPDATE outbox_mails SET status = 'pending', attempts = 0, next_attempt_at = now() WHERE status = 'failed'${ids ? " AND id = ANY($1::uuid[])" : ""}`,
        ids ? [ids] : [],
      );
      kick();
      return affected;
    },
    async close() {
      closed = true;
      clearInterval(timer);
      await running?.catch(() => undefined);
    },
  };
}
