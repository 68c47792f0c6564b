import type { RequestHandler } from "express";
import { HttpError } from "./errors.js";

const SAFE = new Set(["GET", "HEAD", "OPTIONS"]);

/**
 * CSRF protection for cookie sessions: a state-changing request must carry a JSON body type
 * (which a cross-site HTML form cannot send without a CORS preflight we never grant) and, when
 * the browser names an Origin, it must be ours. Cookies are SameSite=Strict as a second layer.
 */
export function csrfGuard(allowedOrigins: string[]): RequestHandler {
  const allowed = new Set(allowedOrigins.map((o) => o.replace(/\/$/, "")));
  return (req, _res, next) => {
    if (SAFE.has(req.method)) return next();
    const origin = req.get("origin");
    if (origin && origin !== "null" && !allowed.has(origin)) {
      return next(new HttpError(403, "cross_site_request", "This request came from another site and was refused."));
    }
    if (origin === "null") return next(new HttpError(403, "cross_site_request", "This request came from another site and was refused."));
    const length = Number(req.get("content-length") ?? "0");
    const hasBody = length > 0 || req.get("transfer-encoding") !== undefined;
    // File uploads are multipart; they must carry our own header, which a cross-site form cannot set
    // and a cross-site script can only send after a CORS preflight we never grant.
    const upload = req.is("multipart/form-data") && req.get("x-hushmark-upload") === "1";
    if (hasBody && !req.is("application/json") && !upload) {
      return next(new HttpError(415, "unsupported_media_type", "Send the request body as JSON (Content-Type: application/json)."));
    }
    next();
  };
}
