import { randomUUID } from "node:crypto";
import type { Request, RequestHandler, Response } from "express";
import { IsNull, type DataSource } from "typeorm";
import type { Me, Role } from "@hushmark/schemas";
import type { AppConfig } from "../config.js";
import { Session } from "../entities/index.js";
import { notSignedIn } from "../http/errors.js";
import type { Actor } from "./actor.js";
import { ACCESS_COOKIE, REFRESH_COOKIE, clearSessionCookies, setSessionCookies } from "./cookies.js";
import { randomToken, signAccessToken, tokenHash, verifyAccessToken } from "./tokens.js";

interface ActorRow {
  sid: string;
  uid: string;
  email: string;
  display_name: string;
  mid: string;
  role: Role;
  organization_id: string;
  organization_name: string;
}

const ACTOR_SQL = `
  SELECT s.id AS sid, u.id AS uid, u.email, u.display_name, m.id AS mid, m.role, m.organization_id, o.name AS organization_name
  FROM sessions s
  JOIN users u ON u.id = s.user_id
  JOIN memberships m ON m.id = s.membership_id AND m.user_id = u.id
  JOIN organizations o ON o.id = m.organization_id
  WHERE s.id = $1 AND s.user_id = $2 AND s.revoked_at IS NULL`;

/** Sessions: issuing, rotating and revoking refresh tokens, and loading the actor of a request. */
export function createSessions(dataSource: DataSource, config: AppConfig) {
  const sessions = dataSource.getRepository(Session);

  async function loadActor(sessionId: string, userId: string): Promise<Actor | null> {
    const rows: ActorRow[] = await dataSource.query(ACTOR_SQL, [sessionId, userId]);
    const row = rows[0];
    if (!row) return null;
    return {
      sessionId: row.sid,
      userId: row.uid,
      email: row.email,
      displayName: row.display_name,
      membershipId: row.mid,
      role: row.role,
      organizationId: row.organization_id,
      organizationName: row.organization_name,
    };
  }

  /** Creates a session row (a new family unless given) and sets both cookies. */
  async function issue(res: Response, userId: string, membershipId: string, familyId: string = randomUUID()): Promise<Session> {
    const refresh = randomToken();
    const row = await sessions.save(
      sessions.create({
        userId,
        membershipId,
        familyId,
        tokenHash: tokenHash(refresh),
        expiresAt: new Date(Date.now() + config.refreshTtlSeconds * 1000),
        usedAt: null,
        revokedAt: null,
      }),
    );
    const access = signAccessToken({ sub: userId, sid: row.id, mid: membershipId }, config.jwtSecret, config.accessTtlSeconds);
    setSessionCookies(res, config, access, refresh);
    return row;
  }

  /**
   * Rotates a refresh token: the old row is marked used and a new row of the same family issued.
   * A token presented after it was used revokes the whole family (it was stolen or replayed).
   */
  async function rotate(req: Request, res: Response): Promise<Actor> {
    const token = req.cookies?.[REFRESH_COOKIE];
    if (typeof token !== "string" || token.length < 20) throw notSignedIn();
    const result = await dataSource.transaction(async (manager) => {
      const repo = manager.getRepository(Session);
      const row = await repo.findOne({ where: { tokenHash: tokenHash(token) }, lock: { mode: "pessimistic_write" } });
      if (!row || row.revokedAt) return null;
      if (row.usedAt) {
        await repo.update({ familyId: row.familyId, revokedAt: IsNull() }, { revokedAt: new Date() });
        return "reused" as const;
      }
      if (row.expiresAt.getTime() < Date.now()) return null;
      row.usedAt = new Date();
      await repo.save(row);
      return row;
    });
    if (result === "reused" || result === null) {
      clearSessionCookies(res, config);
      throw notSignedIn(result === "reused" ? "This session was ended for safety. Please sign in again." : "Your session has ended. Please sign in again.");
    }
    const next = await issue(res, result.userId, result.membershipId, result.familyId);
    const actor = await loadActor(next.id, result.userId);
    if (!actor) {
      clearSessionCookies(res, config);
      throw notSignedIn("Your access to this firm has ended. Please sign in again.");
    }
    return actor;
  }

  /** Ends every session of a user (sign-out, password change, reset). */
  async function revokeAll(userId: string): Promise<void> {
    await sessions.update({ userId, revokedAt: IsNull() }, { revokedAt: new Date() });
  }

  /** Points a session at another of the user's memberships (the firm switcher). */
  async function switchMembership(sessionId: string, membershipId: string): Promise<void> {
    await sessions.update({ id: sessionId }, { membershipId });
  }

  /** Middleware: loads `req.actor` from the access cookie, or answers 401. */
  const authenticate: RequestHandler = async (req, _res, next) => {
    const token = req.cookies?.[ACCESS_COOKIE];
    const claims = typeof token === "string" ? verifyAccessToken(token, config.jwtSecret) : null;
    if (!claims) return next(notSignedIn());
    const actor = await loadActor(claims.sid, claims.sub);
    if (!actor) return next(notSignedIn("Your session has ended. Please sign in again."));
    req.actor = actor;
    next();
  };

  /** The signed-in user with every firm they belong to. */
  async function me(actor: Actor): Promise<Me> {
    const rows: { id: string; organization_id: string; name: string; role: Role }[] = await dataSource.query(
      `SELECT m.id, m.organization_id, o.name, m.role FROM memberships m JOIN organizations o ON o.id = m.organization_id
       WHERE m.user_id = $1 ORDER BY o.name, m.id`,
      [actor.userId],
    );
    return {
      user: { id: actor.userId, email: actor.email, displayName: actor.displayName },
      membership: { organizationId: actor.organizationId, organizationName: actor.organizationName, role: actor.role },
      memberships: rows.map((r) => ({ organizationId: r.organization_id, organizationName: r.name, role: r.role })),
    };
  }

  return { issue, rotate, revokeAll, switchMembership, authenticate, loadActor, me };
}

export type Sessions = ReturnType<typeof createSessions>;
