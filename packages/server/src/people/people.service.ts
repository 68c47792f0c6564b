import type { DataSource } from "typeorm";
import { IsNull, MoreThan } from "typeorm";
import { passwordSchema } from "@hushmark/schemas";
import type { AcceptInvitationInput, Invitation as InvitationDto, InvitationPreview, InviteInput, Member, People, Role } from "@hushmark/schemas";
import type { Actor } from "../auth/actor.js";
import { hashPassword, verifyPassword } from "../auth/passwords.js";
import { randomToken, tokenHash } from "../auth/tokens.js";
import { recordAudit } from "../audit/audit.js";
import type { AppConfig } from "../config.js";
import { Invitation, Membership, Organization, User } from "../entities/index.js";
import { HttpError, conflict, notFound } from "../http/errors.js";
import { linkMail } from "../mail/mailer.js";
import type { Outbox } from "../outbox/outbox.js";

const INVITATION_TTL_MS = 7 * 24 * 3600 * 1000;

const ROLE_WORDS: Record<Role, string> = {
  owner: "an owner (everything in the firm)",
  surveyor: "a surveyor (projects, plans and measurements)",
  planner: "a planner (diagnosis, options and proposals)",
  client: "a client (your project, read-only, with comments and approval)",
};

function invitationDto(row: Invitation, invitedBy: string): InvitationDto {
  return {
    id: row.id,
    email: row.email,
    role: row.role,
    invitedBy,
    createdAt: row.createdAt.toISOString(),
    expiresAt: row.expiresAt.toISOString(),
    acceptedAt: row.acceptedAt ? row.acceptedAt.toISOString() : null,
  };
}

/** People of a firm: members, roles and e-mailed invitations. */
export function createPeopleService(dataSource: DataSource, config: AppConfig, outbox: Outbox) {
  const invitations = dataSource.getRepository(Invitation);
  const memberships = dataSource.getRepository(Membership);

  async function list(actor: Actor): Promise<People> {
    const members: { id: string; user_id: string; email: string; display_name: string; role: Role; created_at: Date }[] = await dataSource.query(
      `SELECT m.id, m.user_id, u.email, u.display_name, m.role, m.created_at FROM memberships m JOIN users u ON u.id = m.user_id
       WHERE m.organization_id = $1 ORDER BY u.display_name, m.id`,
      [actor.organizationId],
    );
    const pending: { id: string; email: string; role: Role; inviter: string | null; created_at: Date; expires_at: Date }[] = await dataSource.query(
      `SELECT i.id, i.email, i.role, u.display_name AS inviter, i.created_at, i.expires_at FROM invitations i
       LEFT JOIN users u ON u.id = i.invited_by
       WHERE i.organization_id = $1 AND i.accepted_at IS NULL AND i.revoked_at IS NULL AND i.expires_at > now()
       ORDER BY i.created_at DESC`,
      [actor.organizationId],
    );
    return {
      members: members.map(
        (m): Member => ({ membershipId: m.id, userId: m.user_id, email: m.email, displayName: m.display_name, role: m.role, joinedAt: new Date(m.created_at).toISOString() }),
      ),
      invitations: pending.map((p) => ({
        id: p.id,
        email: p.email,
        role: p.role,
        invitedBy: p.inviter ?? "",
        createdAt: new Date(p.created_at).toISOString(),
        expiresAt: new Date(p.expires_at).toISOString(),
        acceptedAt: null,
      })),
    };
  }

  async function invite(actor: Actor, input: InviteInput): Promise<InvitationDto> {
    const already: unknown[] = await dataSource.query(
      "SELECT 1 FROM memberships m JOIN users u ON u.id = m.user_id WHERE m.organization_id = $1 AND u.email = $2",
      [actor.organizationId, input.email],
    );
    if (already.length) throw conflict("already_member", `${input.email} is already part of this firm.`);
    const token = randomToken();
    const row = await dataSource.transaction(async (manager) => {
      const repo = manager.getRepository(Invitation);
      // A new invitation replaces any pending one for the same address.
      await repo.update({ organizationId: actor.organizationId, email: input.email, acceptedAt: IsNull(), revokedAt: IsNull() }, { revokedAt: new Date() });
      const saved = await repo.save(
        repo.create({
          organizationId: actor.organizationId,
          email: input.email,
          role: input.role,
          displayName: input.displayName ?? null,
          tokenHash: tokenHash(token),
          invitedById: actor.userId,
          expiresAt: new Date(Date.now() + INVITATION_TTL_MS),
          acceptedAt: null,
          revokedAt: null,
        }),
      );
      await recordAudit(manager, { organizationId: actor.organizationId, actorUserId: actor.userId, action: "invitation.sent", entityType: "invitation", entityId: saved.id, data: { email: input.email, role: input.role } });
      await outbox.queue(manager, {
        organizationId: actor.organizationId,
        kind: "invitation",
        key: `invitation:${saved.id}`,
        ...linkMail(
          input.email,
          `${actor.displayName} invited you to ${actor.organizationName} on Hushmark`,
          [`Hello${input.displayName ? ` ${input.displayName}` : ""},`, `${actor.displayName} invited you to join ${actor.organizationName} on Hushmark as ${ROLE_WORDS[input.role]}.`, "The invitation is valid for seven days."],
          { label: "Accept the invitation", url: `${config.publicUrl}/invitations/${token}` },
          "If you did not expect this, you can ignore this message.",
        ),
      });
      return saved;
    });
    outbox.kick();
    return invitationDto(row, actor.displayName);
  }

  async function revokeInvitation(actor: Actor, id: string): Promise<void> {
    const result = await invitations.update({ id, organizationId: actor.organizationId, acceptedAt: IsNull(), revokedAt: IsNull() }, { revokedAt: new Date() });
    if (!result.affected) throw notFound("That invitation");
    await recordAudit(dataSource, { organizationId: actor.organizationId, actorUserId: actor.userId, action: "invitation.revoked", entityType: "invitation", entityId: id });
  }

  async function findLive(token: string): Promise<Invitation> {
    const row = await invitations.findOne({ where: { tokenHash: tokenHash(token), acceptedAt: IsNull(), revokedAt: IsNull(), expiresAt: MoreThan(new Date()) } });
    if (!row) throw new HttpError(404, "invitation_not_found", "This invitation has expired, was revoked or was already used. Ask the firm for a new one.");
    return row;
  }

  async function preview(token: string): Promise<InvitationPreview> {
    const row = await findLive(token);
    const organization = await dataSource.getRepository(Organization).findOneByOrFail({ id: row.organizationId });
    const existing = await dataSource.getRepository(User).exists({ where: { email: row.email } });
    return { email: row.email, role: row.role, organizationName: organization.name, existingUser: existing };
  }

  /** Accepts an invitation: creates the user (or checks an existing user's password) and the membership. */
  async function accept(input: AcceptInvitationInput): Promise<{ userId: string; membershipId: string }> {
    const invitation = await findLive(input.token);
    return dataSource.transaction(async (manager) => {
      const locked = await manager.getRepository(Invitation).findOne({ where: { id: invitation.id, acceptedAt: IsNull() }, lock: { mode: "pessimistic_write" } });
      if (!locked) throw new HttpError(404, "invitation_not_found", "This invitation was already used.");
      const userRepo = manager.getRepository(User);
      let user = await userRepo.findOne({ where: { email: invitation.email } });
      if (user) {
        if (!(await verifyPassword(user.passwordHash, input.password))) {
          throw new HttpError(400, "invalid_input", "Some fields need attention.", [{ path: "password", message: "You already have a Hushmark account: enter its password to join this firm." }]);
        }
      } else {
        const passwordCheck = passwordSchema.safeParse(input.password);
        const issues = [
          ...(input.displayName ? [] : [{ path: "displayName", message: "Enter your name." }]),
          ...(passwordCheck.success ? [] : [{ path: "password", message: passwordCheck.error.issues[0]!.message }]),
        ];
        if (issues.length) throw new HttpError(400, "invalid_input", "Some fields need attention.", issues);
        user = await userRepo.save({ email: invitation.email, displayName: input.displayName!, passwordHash: await hashPassword(input.password, config.argon2) });
      }
      const membership = await manager.getRepository(Membership).save({ userId: user.id, organizationId: invitation.organizationId, role: invitation.role });
      await manager.getRepository(Invitation).update({ id: invitation.id }, { acceptedAt: new Date() });
      await recordAudit(manager, { organizationId: invitation.organizationId, actorUserId: user.id, action: "invitation.accepted", entityType: "membership", entityId: membership.id, data: { role: invitation.role } });
      return { userId: user.id, membershipId: membership.id };
    });
  }

  async function ownerCount(organizationId: string): Promise<number> {
    return memberships.count({ where: { organizationId, role: "owner" } });
  }

  async function changeRole(actor: Actor, membershipId: string, role: Role): Promise<Member> {
    const membership = await memberships.findOne({ where: { id: membershipId, organizationId: actor.organizationId }, relations: { user: true } });
    if (!membership) throw notFound("That person");
    if (membership.role === "owner" && role !== "owner" && (await ownerCount(actor.organizationId)) <= 1) {
      throw conflict("last_owner", "A firm needs at least one owner. Make someone else an owner first.");
    }
    await memberships.update({ id: membership.id }, { role });
    await recordAudit(dataSource, { organizationId: actor.organizationId, actorUserId: actor.userId, action: "member.role_changed", entityType: "membership", entityId: membership.id, data: { from: membership.role, to: role } });
    return { membershipId: membership.id, userId: membership.userId, email: membership.user!.email, displayName: membership.user!.displayName, role, joinedAt: membership.createdAt.toISOString() };
  }

  async function remove(actor: Actor, membershipId: string): Promise<void> {
    const membership = await memberships.findOne({ where: { id: membershipId, organizationId: actor.organizationId } });
    if (!membership) throw notFound("That person");
    if (membership.role === "owner" && (await ownerCount(actor.organizationId)) <= 1) {
      throw conflict("last_owner", "A firm needs at least one owner. Make someone else an owner first.");
    }
    await memberships.delete({ id: membership.id });
    await recordAudit(dataSource, { organizationId: actor.organizationId, actorUserId: actor.userId, action: "member.removed", entityType: "membership", entityId: membership.id });
  }

  return { list, invite, revokeInvitation, preview, accept, changeRole, remove };
}

export type PeopleService = ReturnType<typeof createPeopleService>;
