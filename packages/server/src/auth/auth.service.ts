import type { DataSource } from "typeorm";
import { IsNull, MoreThan } from "typeorm";
import type { PasswordChangeInput, PasswordResetInput, SignInInput, SignUpInput } from "@hushmark/schemas";
import { recordAudit } from "../audit/audit.js";
import type { AppConfig } from "../config.js";
import { Membership, Organization, PasswordReset, User } from "../entities/index.js";
import { HttpError, conflict, notSignedIn } from "../http/errors.js";
import { linkMail } from "../mail/mailer.js";
import type { Outbox } from "../outbox/outbox.js";
import { hashPassword, verifyAgainstDummy, verifyPassword } from "./passwords.js";
import { randomToken, tokenHash } from "./tokens.js";

const RESET_TTL_MS = 60 * 60 * 1000;
const WRONG_CREDENTIALS = "That e-mail and password do not match an account. Check both, or reset your password.";

/** Sign-up, sign-in, password change and reset. Sessions are issued by the router. */
export function createAuthService(dataSource: DataSource, config: AppConfig, outbox: Outbox) {
  const users = dataSource.getRepository(User);
  const memberships = dataSource.getRepository(Membership);

  /** Creates a firm and its owner; answers the owner's user and membership. */
  async function signUp(input: SignUpInput): Promise<{ user: User; membership: Membership }> {
    const passwordHash = await hashPassword(input.password, config.argon2);
    return dataSource.transaction(async (manager) => {
      const existing = await manager.getRepository(User).findOne({ where: { email: input.email } });
      if (existing) throw conflict("email_taken", "An account with this e-mail already exists. Sign in, or reset your password.");
      const organization = await manager.getRepository(Organization).save({ name: input.firmName });
      const user = await manager.getRepository(User).save({ email: input.email, displayName: input.displayName, passwordHash });
      const membership = await manager.getRepository(Membership).save({ userId: user.id, organizationId: organization.id, role: "owner" });
      await recordAudit(manager, { organizationId: organization.id, actorUserId: user.id, action: "firm.created", entityType: "organization", entityId: organization.id });
      return { user, membership };
    });
  }

  /** Checks e-mail and password; the same answer and about the same time whether or not the e-mail exists. */
  async function signIn(input: SignInInput): Promise<{ user: User; membership: Membership }> {
    const user = await users.findOne({ where: { email: input.email } });
    const ok = user ? await verifyPassword(user.passwordHash, input.password) : await verifyAgainstDummy(input.password, config.argon2);
    if (!user || !ok) throw notSignedIn(WRONG_CREDENTIALS);
    const membership = await memberships.findOne({ where: { userId: user.id }, order: { createdAt: "ASC" } });
    if (!membership) throw new HttpError(403, "no_firm", "Your account is no longer part of any firm. Ask the firm's owner to invite you again.");
    return { user, membership };
  }

  /** Mails a reset link when the e-mail has an account; silent otherwise. */
  async function requestReset(email: string): Promise<void> {
    const user = await users.findOne({ where: { email } });
    if (!user) return;
    const token = randomToken();
    // The reset and its mail commit together: a reset is never left without its link on the way.
    await dataSource.transaction(async (m) => {
      const reset = await m.getRepository(PasswordReset).save({ userId: user.id, tokenHash: tokenHash(token), expiresAt: new Date(Date.now() + RESET_TTL_MS), usedAt: null });
      await outbox.queue(m, {
        organizationId: null,
        kind: "password-reset",
        key: `password-reset:${reset.id}`,
        ...linkMail(
          user.email,
          "Reset your Hushmark password",
          [`Hello ${user.displayName},`, "Someone (we hope you) asked to reset the password of your Hushmark account. The link works once, for one hour."],
          { label: "Choose a new password", url: `${config.publicUrl}/reset-password/${token}` },
          "If you did not ask for this, ignore this message: your password stays as it is.",
        ),
      });
    });
    outbox.kick();
  }

  /** Sets a new password from a reset link; answers the user id so the router can end their sessions. */
  async function resetPassword(input: PasswordResetInput): Promise<string> {
    const passwordHash = await hashPassword(input.password, config.argon2);
    return dataSource.transaction(async (manager) => {
      const resets = manager.getRepository(PasswordReset);
      const reset = await resets.findOne({
        where: { tokenHash: tokenHash(input.token), usedAt: IsNull(), expiresAt: MoreThan(new Date()) },
        lock: { mode: "pessimistic_write" },
      });
      if (!reset) throw new HttpError(400, "invalid_token", "This reset link has expired or was already used. Ask for a new one.");
      await resets.update({ id: reset.id }, { usedAt: new Date() });
      await manager.getRepository(User).update({ id: reset.userId }, { passwordHash });
      await recordAudit(manager, { organizationId: null, actorUserId: reset.userId, action: "password.reset", entityType: "user", entityId: reset.userId });
      return reset.userId;
    });
  }

  /** Changes a signed-in user's password after checking the current one. */
  async function changePassword(userId: string, input: PasswordChangeInput): Promise<void> {
    const user = await users.findOneByOrFail({ id: userId });
    if (!(await verifyPassword(user.passwordHash, input.currentPassword))) {
      throw new HttpError(400, "invalid_input", "Some fields need attention.", [{ path: "currentPassword", message: "That is not your current password." }]);
    }
    await users.update({ id: userId }, { passwordHash: await hashPassword(input.newPassword, config.argon2) });
    await recordAudit(dataSource, { organizationId: null, actorUserId: userId, action: "password.changed", entityType: "user", entityId: userId });
  }

  /** The membership of `userId` in `organizationId`, for the firm switcher. */
  async function membershipIn(userId: string, organizationId: string): Promise<Membership> {
    const membership = await memberships.findOne({ where: { userId, organizationId } });
    if (!membership) throw new HttpError(404, "not_found", "You are not a member of that firm.");
    return membership;
  }

  return { signUp, signIn, requestReset, resetPassword, changePassword, membershipIn };
}

export type AuthService = ReturnType<typeof createAuthService>;
