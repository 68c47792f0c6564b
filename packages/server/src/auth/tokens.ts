import { createHash, randomBytes } from "node:crypto";
import jwt from "jsonwebtoken";

/** A random URL-safe token for links and refresh cookies (256 bits). */
export function randomToken(): string {
  return randomBytes(32).toString("base64url");
}

/** SHA-256 of a token, hex: what the database stores instead of the token. */
export function tokenHash(token: string): string {
  return createHash("sha256").update(token).digest("hex");
}

export interface AccessClaims {
  sub: string;
  sid: string;
  mid: string;
}

const ISSUER = "hushmark";
const AUDIENCE = "hushmark-api";

/** Signs a short-lived access token (HS256). */
export function signAccessToken(claims: AccessClaims, secret: string, ttlSeconds: number): string {
  return jwt.sign(claims, secret, { algorithm: "HS256", expiresIn: ttlSeconds, issuer: ISSUER, audience: AUDIENCE });
}

/** Verifies an access token with the algorithm pinned to HS256; null when invalid or expired. */
export function verifyAccessToken(token: string, secret: string): AccessClaims | null {
  try {
    const payload = jwt.verify(token, secret, { algorithms: ["HS256"], issuer: ISSUER, audience: AUDIENCE });
    if (typeof payload !== "object" || payload === null) return null;
    const { sub, sid, mid } = payload as Record<string, unknown>;
    if (typeof sub !== "string" || typeof sid !== "string" || typeof mid !== "string") return null;
    return { sub, sid, mid };
  } catch {
    return null;
  }
}
