import { z } from "zod";
import { roleSchema } from "./roles.js";
import { isWeakPassword } from "./weak-passwords.js";

/** Minimum password length (no composition rules, per NIST SP 800-63B / OWASP ASVS 2.1). */
export const PASSWORD_MIN_LENGTH = 12;
export const PASSWORD_MAX_LENGTH = 128;

export const emailSchema = z
  .string()
  .trim()
  .toLowerCase()
  .max(254, "An e-mail address is at most 254 characters.")
  .pipe(z.email("Enter an e-mail address like name@example.com."));

export const passwordSchema = z
  .string()
  .min(PASSWORD_MIN_LENGTH, `Use at least ${PASSWORD_MIN_LENGTH} characters.`)
  .max(PASSWORD_MAX_LENGTH, `Use at most ${PASSWORD_MAX_LENGTH} characters.`)
  .refine((p) => !isWeakPassword(p), "That password is too common or too easy to guess. A few unrelated words make a strong one.");

export const displayNameSchema = z
  .string()
  .trim()
  .min(1, "Enter a name.")
  .max(120, "A name is at most 120 characters.");

export const signUpSchema = z.object({
  firmName: z.string().trim().min(2, "Enter the firm's name.").max(120, "A firm name is at most 120 characters."),
  displayName: displayNameSchema,
  email: emailSchema,
  password: passwordSchema,
});
export type SignUpInput = z.infer<typeof signUpSchema>;

export const signInSchema = z.object({
  email: emailSchema,
  password: z.string().min(1, "Enter your password.").max(PASSWORD_MAX_LENGTH),
});
export type SignInInput = z.infer<typeof signInSchema>;

export const passwordResetRequestSchema = z.object({ email: emailSchema });
export type PasswordResetRequestInput = z.infer<typeof passwordResetRequestSchema>;

export const tokenSchema = z.string().trim().min(20, "This link is incomplete.").max(200, "This link is not valid.");

export const passwordResetSchema = z.object({ token: tokenSchema, password: passwordSchema });
export type PasswordResetInput = z.infer<typeof passwordResetSchema>;

export const passwordChangeSchema = z.object({
  currentPassword: z.string().min(1, "Enter your current password.").max(PASSWORD_MAX_LENGTH),
  newPassword: passwordSchema,
});
export type PasswordChangeInput = z.infer<typeof passwordChangeSchema>;

export const membershipSummarySchema = z.object({
  organizationId: z.uuid(),
  organizationName: z.string(),
  role: roleSchema,
});
export type MembershipSummary = z.infer<typeof membershipSummarySchema>;

/** The signed-in user, as `GET /api/v1/auth/me` answers. */
export const meSchema = z.object({
  user: z.object({ id: z.uuid(), email: z.string(), displayName: z.string() }),
  membership: membershipSummarySchema,
  memberships: z.array(membershipSummarySchema),
});
export type Me = z.infer<typeof meSchema>;

export const switchFirmSchema = z.object({ organizationId: z.uuid("Pick a firm.") });
