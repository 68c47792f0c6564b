import type { ErrorRequestHandler } from "express";
import { ZodError } from "zod";
import type { Logger } from "pino";

/** An error a route may throw on purpose; the error handler answers it as is. */
export class HttpError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly details?: unknown,
    readonly headers?: Record<string, string>,
  ) {
    super(message);
  }
}

export const badRequest = (message: string, details?: unknown) => new HttpError(400, "invalid_input", message, details);
export const notSignedIn = (message = "Please sign in.") => new HttpError(401, "not_signed_in", message);
export const forbidden = (message = "Your role does not allow this.") => new HttpError(403, "forbidden", message);
export const notFound = (what = "That record") => new HttpError(404, "not_found", `${what} was not found.`);
export const conflict = (code: string, message: string, details?: unknown) => new HttpError(409, code, message, details);

/** Turns zod issues into `{ path, message }` pairs with dotted field paths. */
export function fieldIssues(error: ZodError): { path: string; message: string }[] {
  return error.issues.map((issue) => ({ path: issue.path.map(String).join(".") || "(body)", message: issue.message }));
}

/** SQLSTATE classes and driver messages that mean the database went away, not that the request was wrong. */
const UNAVAILABLE_CODES = new Set(["57P01", "57P02", "57P03", "08000", "08003", "08006", "08001", "08004", "ECONNREFUSED", "ECONNRESET", "EPIPE", "ETIMEDOUT"]);

export function isDatabaseUnavailable(error: unknown): boolean {
  const e = error as { code?: string; driverError?: { code?: string; message?: string }; message?: string };
  const code = e.driverError?.code ?? e.code;
  if (code && UNAVAILABLE_CODES.has(code)) return true;
  const message = `${e.driverError?.message ?? ""} ${e.message ?? ""}`;
  return /Connection terminated|connection timeout|timeout exceeded when trying to connect|terminating connection|Client has encountered a connection error|Client was closed and is not queryable|the database system is (shutting down|starting up)/i.test(message);
}

interface BodyParserError extends Error {
  type?: string;
  status?: number;
}

/** The one error handler: known errors answer their status and message, the rest a 500 without detail. */
export function errorHandler(logger: Logger): ErrorRequestHandler {
  return (error, req, res, _next) => {
    if (res.headersSent) return;
    if (error instanceof ZodError) {
      res.status(400).json({ error: { code: "invalid_input", message: "Some fields need attention.", details: fieldIssues(error) } });
      return;
    }
    if (error instanceof HttpError) {
      if (error.headers) res.set(error.headers);
      res.status(error.status).json({ error: { code: error.code, message: error.message, ...(error.details === undefined ? {} : { details: error.details }) } });
      return;
    }
    const parserError = error as BodyParserError;
    if (parserError.type === "entity.parse.failed") {
      res.status(400).json({ error: { code: "invalid_json", message: "The request body is not valid JSON." } });
      return;
    }
    if (parserError.type === "entity.too.large") {
      res.status(413).json({ error: { code: "too_large", message: "The request body is too large." } });
      return;
    }
    if (parserError.status && parserError.status >= 400 && parserError.status < 500) {
      res.status(parserError.status).json({ error: { code: "bad_request", message: parserError.message } });
      return;
    }
    if (isDatabaseUnavailable(error)) {
      logger.warn({ err: error, url: req.originalUrl }, "database unavailable");
      res.status(503).set("Retry-After", "2").json({ error: { code: "database_unavailable", message: "The database connection dropped, so nothing was saved. Please try again in a moment." } });
      return;
    }
    logger.error({ err: error, url: req.originalUrl, method: req.method }, "unhandled error");
    res.status(500).json({ error: { code: "internal", message: "Something went wrong on our side. Nothing you sent was lost; please try again." } });
  };
}
