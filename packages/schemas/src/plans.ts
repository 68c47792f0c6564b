import { z } from "zod";

/** A plan as the API answers it: the document and its version for optimistic concurrency. */
export const planResponseSchema = z.object({
  projectId: z.uuid(),
  version: z.number().int().nonnegative(),
  document: z.record(z.string(), z.unknown()),
  updatedAt: z.string(),
  updatedBy: z.string().nullable(),
});
export type PlanResponse = z.infer<typeof planResponseSchema>;

/** Saving a plan: the version the client started from, and the new document. */
export const planSaveSchema = z.object({
  baseVersion: z.number().int("The base version must be a whole number.").nonnegative(),
  document: z.record(z.string(), z.unknown()),
  message: z.string().max(200).optional(),
});
export type PlanSaveInput = z.infer<typeof planSaveSchema>;

export const planRevisionSchema = z.object({
  version: z.number().int(),
  savedAt: z.string(),
  savedBy: z.string().nullable(),
  message: z.string().nullable(),
});
export const planRevisionListSchema = z.object({ revisions: z.array(planRevisionSchema) });
