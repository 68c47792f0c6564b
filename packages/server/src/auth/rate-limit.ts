import type { RequestHandler } from "express";
import { ipKeyGenerator, rateLimit, type ClientRateLimitInfo, type Options, type Store } from "express-rate-limit";
import type { DataSource } from "typeorm";
import { HttpError } from "../http/errors.js";

/**
 * An express-rate-limit store in PostgreSQL, so every server process shares one count (a memory
 * store would let an attacker multiply the limit by the number of processes).
 */
export class PostgresRateLimitStore implements Store {
  localKeys = false;
  private windowMs = 60_000;

  constructor(
    private readonly dataSource: DataSource,
    readonly prefix: string,
  ) {}

  init(options: Options): void {
    this.windowMs = options.windowMs;
  }

  async get(key: string): Promise<ClientRateLimitInfo | undefined> {
    const rows: { hits: number; reset_at: Date }[] = await this.dataSource.query(
      "SELECT hits, reset_at FROM rate_limit_buckets WHERE key = $1 AND reset_at > now()",
      [this.prefix + key],
    );
    const row = rows[0];
    return row ? { totalHits: row.hits, resetTime: new Date(row.reset_at) } : undefined;
  }

  async increment(key: string): Promise<ClientRateLimitInfo> {
    const rows: { hits: number; reset_at: Date }[] = await this.dataSource.query(
      `INSERT INTO rate_limit_buckets (key, hits, reset_at) VALUES ($1, 1, now() + $2 * interval '1 millisecond')
       ON CONFLICT (key) DO UPDATE SET
         hits = CASE WHEN rate_limit_buckets.reset_at <= now() THEN 1 ELSE rate_limit_buckets.hits + 1 END,
         reset_at = CASE WHEN rate_limit_buckets.reset_at <= now() THEN EXCLUDED.reset_at ELSE rate_limit_buckets.reset_at END
       RETURNING hits, reset_at`,
      [this.prefix + key, this.windowMs],
    );
    const row = rows[0]!;
    return { totalHits: row.hits, resetTime: new Date(row.reset_at) };
  }

  async decrement(key: string): Promise<void> {
    await this.dataSource.query("UPDATE rate_limit_buckets SET hits = GREATEST(hits - 1, 0) WHERE key = $1", [this.prefix + key]);
  }

  async resetKey(key: string): Promise<void> {
    await this.dataSource.query("DELETE FROM rate_limit_buckets WHERE key = $1", [this.prefix + key]);
  }
}

export interface LimitSettings {
  windowMs: number;
  /** Attempts per address in the window. */
  perAddress: number;
  /** Failed attempts per account from one address in the window. */
  perAccountAndAddress: number;
  /** Failed attempts per account from all addresses in the window. */
  perAccount: number;
}

export const DEFAULT_SIGN_IN_LIMITS: LimitSettings = { windowMs: 15 * 60_000, perAddress: 100, perAccountAndAddress: 10, perAccount: 50 };

function emailOf(body: unknown): string {
  const email = (body as { email?: unknown } | undefined)?.email;
  return typeof email === "string" ? email.trim().toLowerCase().slice(0, 254) : "";
}

function limiter(dataSource: DataSource, prefix: string, windowMs: number, limit: number, key: Options["keyGenerator"], failuresOnly: boolean): RequestHandler {
  return rateLimit({
    windowMs,
    limit,
    store: new PostgresRateLimitStore(dataSource, prefix),
    keyGenerator: key,
    skipSuccessfulRequests: failuresOnly,
    standardHeaders: "draft-8",
    legacyHeaders: false,
    validate: { keyGeneratorIpFallback: false },
    handler: (req, _res, next) => {
      const resetTime = (req as { rateLimit?: { resetTime?: Date } }).rateLimit?.resetTime;
      const seconds = resetTime ? Math.max(1, Math.ceil((resetTime.getTime() - Date.now()) / 1000)) : Math.ceil(windowMs / 1000);
      next(
        new HttpError(429, "too_many_attempts", `Too many attempts. Please wait ${Math.ceil(seconds / 60)} minute(s) and try again.`, { retryAfterSeconds: seconds }, {
          "Retry-After": String(seconds),
        }),
      );
    },
  });
}

/**
 * Sign-in limits: per address (all attempts), per account from one address (failures) and per
 * account from everywhere (failures, a higher bar), all over fixed windows. The per-account bars
 * count failures only and reset with the window, so an attacker cannot lock a user out for good:
 * the user's own address keeps its own, separate allowance.
 */
export function signInLimiters(dataSource: DataSource, limits: LimitSettings, name = "sign-in"): RequestHandler[] {
  const ip: Options["keyGenerator"] = (req) => ipKeyGenerator(req.ip ?? "unknown");
  return [
    limiter(dataSource, `${name}:ip:`, limits.windowMs, limits.perAddress, ip, false),
    limiter(dataSource, `${name}:acct-ip:`, limits.windowMs, limits.perAccountAndAddress, (req) => `${emailOf(req.body)}|${ipKeyGenerator(req.ip ?? "unknown")}`, true),
    limiter(dataSource, `${name}:acct:`, limits.windowMs, limits.perAccount, (req) => emailOf(req.body) || "(none)", true),
  ];
}

/** A plain per-address limit (sign-up, password-reset requests, invitation acceptance). */
export function addressLimiter(dataSource: DataSource, name: string, windowMs: number, limit: number): RequestHandler[] {
  return [limiter(dataSource, `${name}:ip:`, windowMs, limit, (req) => ipKeyGenerator(req.ip ?? "unknown"), false)];
}
