import { z } from "zod";

const finite = z.number().finite();

export const analysisTargetSchema = z.discriminatedUnion("kind", [
  z.object({ kind: z.literal("nc"), nc: finite.min(10, "An NC target is at least 10.").max(70, "An NC target is at most 70.") }),
  z.object({ kind: z.literal("dba"), dba: finite.min(0).max(120, "A level target is at most 120 dBA.") }),
  z.object({ kind: z.literal("reduction"), reductionDb: finite.min(0).max(100, "A reduction is at most 100 dB.") }),
]);
export type AnalysisTarget = z.infer<typeof analysisTargetSchema>;

/** The source spectrum: one from the library of typical sources, or 21 custom band levels (50–5000 Hz). */
export const spectrumChoiceSchema = z.discriminatedUnion("kind", [
  z.object({ kind: z.literal("library"), id: z.string().min(1, "Pick a source spectrum.").max(80) }),
  z.object({
    kind: z.literal("custom"),
    levelsDb: z.array(finite.min(-20).max(160), "Give one level per band.").length(21, "Give 21 one-third-octave levels, 50 to 5000 Hz."),
  }),
]);
export type SpectrumChoice = z.infer<typeof spectrumChoiceSchema>;

export const analysisSourceSchema = z.discriminatedUnion("kind", [
  /** Airborne sound in a room, void, neighbour or `outdoors`. */
  z.object({ kind: z.literal("airborne"), spaceId: z.string().min(1, "Pick where the sound starts.").max(120), spectrum: spectrumChoiceSchema }),
  /** Footfall-like impact on a room's floor (the room below receives it). */
  z.object({ kind: z.literal("impact"), roomId: z.string().min(1, "Pick the room whose floor is walked on.").max(120) }),
]);
export type AnalysisSource = z.infer<typeof analysisSourceSchema>;

export const analysisRequestSchema = z.object({
  planVersion: z.number().int("The plan version is a whole number.").nonnegative(),
  source: analysisSourceSchema,
  receiverId: z.string().min(1, "Pick the room that should be quiet.").max(120),
  target: analysisTargetSchema.optional(),
  paths: z.number().int().min(1).max(20).default(5),
});
export type AnalysisRequest = z.input<typeof analysisRequestSchema>;

export const planProblemSchema = z.object({
  code: z.string(),
  severity: z.enum(["error", "warning"]),
  elementId: z.string().nullable().optional(),
  message: z.string(),
  suggestion: z.string().optional(),
});
export type PlanProblem = z.infer<typeof planProblemSchema>;

export const elementResultSchema = z.object({
  elementId: z.string(),
  kind: z.string(),
  name: z.string(),
  linkIds: z.array(z.string()),
  share: z.number(),
  shareByBand: z.array(z.number()),
  gainIfPerfectDb: z.number(),
  gainExact: z.boolean(),
});

export const pathResultSchema = z.object({
  rank: z.number().int(),
  kind: z.string(),
  label: z.string(),
  share: z.number(),
  dba: z.number(),
  steps: z.array(z.unknown()),
  polyline: z.array(z.object({ x: z.number(), y: z.number(), levelId: z.string().nullable() })),
});

export const analysisResultSchema = z.object({
  planVersion: z.number().int(),
  cached: z.boolean(),
  computeMs: z.number(),
  bandsHz: z.array(z.number()),
  source: z.object({ id: z.string(), name: z.string(), levelsDb: z.array(z.number()), dba: z.number() }),
  receiver: z.object({ id: z.string(), name: z.string(), levelsDb: z.array(z.number()), dba: z.number(), nc: z.number().nullable() }),
  target: z.object({ kind: z.string(), value: z.number(), met: z.boolean(), shortfallDb: z.number() }).nullable(),
  elements: z.array(elementResultSchema),
  paths: z.array(pathResultSchema),
  assumptions: z.array(planProblemSchema),
});
export type AnalysisResult = z.infer<typeof analysisResultSchema>;

/** An analysis target in the words the trade uses: "NC 25", "35 dBA", "10 dB quieter". */
export const targetText = (t: Pick<NonNullable<AnalysisResult["target"]>, "kind" | "value">): string => (t.kind === "nc" ? `NC ${t.value}` : t.kind === "dba" ? `${t.value} dBA` : `${t.value} dB quieter`);
