import { z } from "zod";
import { displayNameSchema, emailSchema, passwordSchema, tokenSchema } from "./auth.js";
import { roleSchema } from "./roles.js";

export const inviteSchema = z.object({
  email: emailSchema,
  role: roleSchema,
  displayName: displayNameSchema.optional(),
});
export type InviteInput = z.infer<typeof inviteSchema>;

export const invitationSchema = z.object({
  id: z.uuid(),
  email: z.string(),
  role: roleSchema,
  invitedBy: z.string(),
  createdAt: z.string(),
  expiresAt: z.string(),
  acceptedAt: z.string().nullable(),
});
export type Invitation = z.infer<typeof invitationSchema>;

/** What the acceptance page shows before the invitee sets a password. */
export const invitationPreviewSchema = z.object({
  email: z.string(),
  role: roleSchema,
  organizationName: z.string(),
  existingUser: z.boolean(),
});
export type InvitationPreview = z.infer<typeof invitationPreviewSchema>;

/** `displayName` is needed only when the invitee has no Hushmark account yet (the server says so with a 400 on that field). */
export const acceptInvitationSchema = z.object({
  token: tokenSchema,
  displayName: displayNameSchema.optional(),
  password: z.string().min(1, "Enter a password.").max(128, "Use at most 128 characters."),
});
export type AcceptInvitationInput = z.infer<typeof acceptInvitationSchema>;

export const memberSchema = z.object({
  membershipId: z.uuid(),
  userId: z.uuid(),
  email: z.string(),
  displayName: z.string(),
  role: roleSchema,
  joinedAt: z.string(),
});
export type Member = z.infer<typeof memberSchema>;

export const peopleSchema = z.object({
  members: z.array(memberSchema),
  invitations: z.array(invitationSchema),
});
export type People = z.infer<typeof peopleSchema>;

export const changeRoleSchema = z.object({ role: roleSchema });
export type ChangeRoleInput = z.infer<typeof changeRoleSchema>;
