import { z } from "zod";
import { cautionSchema, scenarioEvaluationSchema } from "./scenarios.js";

/** Draft → Sent → Changes asked / Approved → Deposit paid → In progress → Verified. */
export const proposalStatusSchema = z.enum(["draft", "sent", "changes_asked", "approved", "deposit_paid", "in_progress", "verified"]);
export type ProposalStatus = z.infer<typeof proposalStatusSchema>;

export const proposalCreateSchema = z.object({
  scenarioId: z.uuid("Pick the scenario the proposal is made from."),
  title: z.string().trim().min(2, "Give the proposal a title of at least 2 characters.").max(160).optional(),
  note: z.string().trim().max(2000, "A note is at most 2000 characters.").default(""),
});
export type ProposalCreate = z.input<typeof proposalCreateSchema>;

/** A change to a proposal; after it was sent this makes a new version. */
export const proposalUpdateSchema = z.object({
  scenarioId: z.uuid("Pick a scenario.").optional(),
  title: z.string().trim().min(2, "Give the proposal a title of at least 2 characters.").max(160).optional(),
  note: z.string().trim().max(2000, "A note is at most 2000 characters.").optional(),
  validUntil: z.iso.date("Give the validity date as YYYY-MM-DD.").optional(),
});

export const proposalParamSchema = z.object({ proposalId: z.uuid("That proposal id is not valid.") });
export const proposalVersionParamSchema = z.object({ proposalId: z.uuid("That proposal id is not valid."), version: z.coerce.number().int("A version is a whole number.").min(1, "Versions start at 1.") });

export const proposalLineSchema = z.object({
  description: z.string(),
  element: z.string(),
  kind: z.enum(["materials", "labour"]),
  quantity: z.number(),
  unit: z.string(),
  amount: z.number(),
});
export type ProposalLine = z.infer<typeof proposalLineSchema>;

export const proposalContentSchema = z.object({
  title: z.string(),
  note: z.string(),
  projectTitle: z.string(),
  siteAddress: z.string(),
  firmName: z.string(),
  currency: z.string(),
  lines: z.array(proposalLineSchema),
  subtotal: z.number(),
  taxRatePercent: z.number(),
  tax: z.number(),
  total: z.number(),
  depositPercent: z.number(),
  deposit: z.number(),
  terms: z.string(),
  validUntil: z.string(),
  predicted: z.object({ before: z.string(), after: z.string(), basis: z.string(), summary: z.string() }),
  evaluation: scenarioEvaluationSchema,
  cautions: z.array(cautionSchema),
  disclaimer: z.string(),
  planVersion: z.number().int(),
  /** Each plan element's share of the sound at the receiver (0–1) now and after the work, for the client's marked-up plan; absent on older versions. */
  planShares: z.object({ before: z.record(z.string(), z.number()), after: z.record(z.string(), z.number()) }).optional(),
});
export type ProposalContent = z.infer<typeof proposalContentSchema>;

export const proposalVersionSchema = z.object({
  version: z.number().int(),
  createdAt: z.string(),
  sentAt: z.string().nullable(),
  pdf: z.enum(["pending", "ready", "failed"]),
});

export const proposalCommentSchema = z.object({
  id: z.uuid(),
  version: z.number().int(),
  kind: z.enum(["comment", "changes_asked", "approved"]),
  body: z.string(),
  authorName: z.string(),
  authorRole: z.string(),
  createdAt: z.string(),
});

export const paymentSchema = z.object({
  id: z.uuid(),
  version: z.number().int(),
  amount: z.number(),
  currency: z.string(),
  status: z.enum(["pending", "paid", "failed"]),
  failureMessage: z.string().nullable(),
  createdAt: z.string(),
  paidAt: z.string().nullable(),
});

export const proposalSchema = z.object({
  id: z.uuid(),
  projectId: z.uuid(),
  scenarioId: z.uuid(),
  status: proposalStatusSchema,
  currentVersion: z.number().int(),
  content: proposalContentSchema,
  /** The plan document the shown version was made on (the marked-up plan draws it, not today's plan). */
  planDocument: z.record(z.string(), z.unknown()),
  versions: z.array(proposalVersionSchema),
  comments: z.array(proposalCommentSchema),
  payments: z.array(paymentSchema),
  approvedBy: z.string().nullable(),
  approvedAt: z.string().nullable(),
  updatedAt: z.string(),
});
export type Proposal = z.infer<typeof proposalSchema>;
export const proposalListSchema = z.object({
  proposals: z.array(z.object({ id: z.uuid(), projectId: z.uuid(), projectTitle: z.string(), title: z.string(), status: proposalStatusSchema, currentVersion: z.number().int(), total: z.number(), currency: z.string(), updatedAt: z.string() })),
});

export const proposalCommentInputSchema = z.object({ body: z.string().trim().min(1, "Write a comment first.").max(4000, "A comment is at most 4000 characters.") });
export const proposalDecisionSchema = z.object({
  /** The version the client read; a decision on an older version is refused. */
  version: z.number().int("Send the version you read.").min(1),
  comment: z.string().trim().max(4000, "A comment is at most 4000 characters.").default(""),
});
export const proposalChangesSchema = proposalDecisionSchema.extend({ comment: z.string().trim().min(1, "Say what should change.").max(4000, "A comment is at most 4000 characters.") });

export const depositStartSchema = z.object({ version: z.number().int("Send the version you approved.").min(1) });
export const depositStartResultSchema = z.object({ url: z.string(), paymentId: z.uuid() });
