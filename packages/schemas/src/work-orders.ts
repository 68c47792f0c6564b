import { z } from "zod";
import { cautionSchema } from "./scenarios.js";

export const taskStatusSchema = z.enum(["todo", "doing", "done"], "Status is todo, doing or done.");

export const workOrderTaskSchema = z.object({
  id: z.uuid(),
  position: z.number().int(),
  text: z.string(),
  status: taskStatusSchema,
  assigneeMembershipId: z.uuid().nullable(),
  assigneeName: z.string().nullable(),
  updatedAt: z.string(),
});

export const workOrderSchema = z.object({
  id: z.uuid(),
  projectId: z.uuid(),
  proposalId: z.uuid(),
  title: z.string(),
  elementId: z.string(),
  elementName: z.string(),
  materials: z.array(z.object({ name: z.string(), quantity: z.number(), unit: z.string() })),
  steps: z.array(z.string()),
  cautions: z.array(cautionSchema),
  tasks: z.array(workOrderTaskSchema),
});
export type WorkOrder = z.infer<typeof workOrderSchema>;
export const workOrderListSchema = z.object({ workOrders: z.array(workOrderSchema) });

export const taskParamSchema = z.object({ taskId: z.uuid("That checklist item id is not valid.") });
export const taskUpdateSchema = z
  .object({ status: taskStatusSchema.optional(), assigneeMembershipId: z.uuid("Pick a person from the firm.").nullable().optional(), assignToMe: z.literal(true).optional() })
  .refine((v) => v.status !== undefined || v.assigneeMembershipId !== undefined || v.assignToMe, "Change the status or the assignee.");

const bandLevels = z.array(z.number().finite().min(-20).max(160), "Give one level per band.").length(21, "Give 21 one-third-octave levels, 50 to 5000 Hz.");

/** After-work measurement against the before one (both at the receiver, same source running). */
export const verificationInputSchema = z.object({
  proposalId: z.uuid("Pick the proposal the work came from."),
  beforeLevelsDb: bandLevels,
  afterLevelsDb: bandLevels,
  note: z.string().trim().max(4000, "A note is at most 4000 characters.").default(""),
});

export const verificationSchema = z.object({
  id: z.uuid(),
  proposalId: z.uuid(),
  before: z.object({ dba: z.number(), nc: z.number() }),
  after: z.object({ dba: z.number(), nc: z.number() }),
  predicted: z.object({ beforeDba: z.number(), afterDba: z.number() }),
  /** One-third-octave levels 50–5000 Hz in the receiving room: measured before and after, and predicted after. */
  bands: z.object({ beforeDb: z.array(z.number()), afterDb: z.array(z.number()), predictedAfterDb: z.array(z.number()) }),
  measuredGainDb: z.number(),
  predictedGainDb: z.number(),
  target: z.object({ kind: z.string(), value: z.number(), met: z.boolean() }).nullable(),
  summary: z.string(),
  note: z.string(),
  createdAt: z.string(),
});
export type Verification = z.infer<typeof verificationSchema>;
export const verificationListSchema = z.object({ verifications: z.array(verificationSchema) });
export const verificationParamSchema = z.object({ verificationId: z.uuid("That verification id is not valid.") });
