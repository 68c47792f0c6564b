import { z } from "zod";
import type { AnalysisTarget } from "./analyses.js";

/** Kinds of noise a brief can name. */
export const noiseKindSchema = z.enum(["speech", "music_bass", "television", "traffic", "machinery_hum", "impact"], "Pick the kind of noise.");
export const noiseDirectionSchema = z.enum(["keep_out", "keep_in"], "Say whether the noise must be kept out or kept in.");
export const timeOfDaySchema = z.enum(["morning", "daytime", "evening", "night"]);
export const weekdaySchema = z.enum(["mon", "tue", "wed", "thu", "fri", "sat", "sun"]);
export const seasonSchema = z.enum(["spring", "summer", "autumn", "winter"]);

export const briefNoiseSchema = z.object({
  id: z.string().min(1).max(40),
  kind: noiseKindSchema,
  where: z.string().trim().max(200, "Describe where it comes from in at most 200 characters.").default(""),
  direction: noiseDirectionSchema,
  times: z.array(timeOfDaySchema).max(4).default([]),
  days: z.array(weekdaySchema).max(7).default([]),
  seasons: z.array(seasonSchema).max(4).default([]),
  note: z.string().trim().max(500, "A note is at most 500 characters.").default(""),
});
export type BriefNoise = z.infer<typeof briefNoiseSchema>;

/** How quiet it must be: a level, an NC rating, a reduction, or simply noticeably quieter. */
export const briefTargetSchema = z.discriminatedUnion("kind", [
  z.object({ kind: z.literal("level"), levelDba: z.number("Enter the level in dBA.").min(10, "A target below 10 dBA cannot be measured in a room.").max(90, "A target above 90 dBA is not a quiet room.") }),
  z.object({ kind: z.literal("nc"), nc: z.number("Enter an NC rating.").int("An NC rating is a whole number.").min(15, "NC ratings start at 15.").max(70, "NC ratings stop at 70.") }),
  z.object({ kind: z.literal("reduction"), reductionDb: z.number("Enter the reduction in dB.").min(1, "A reduction of less than 1 dB cannot be heard.").max(60, "A reduction of more than 60 dB is beyond what a retrofit gives.") }),
  z.object({ kind: z.literal("noticeable") }),
], "Pick how the target is set.");
export type BriefTarget = z.infer<typeof briefTargetSchema>;

export const briefAcceptsSchema = z.object({
  /** Floor area per wall the client accepts losing to a thicker lining. */
  liningDepth: z.object({ value: z.number().min(0, "The depth cannot be negative.").max(100, "That is more than a metre."), unit: z.enum(["cm", "in"]) }).nullable().default(null),
  daylight: z.boolean().default(false),
  ventilation: z.boolean().default(false),
  doorLook: z.boolean().default(false),
  structuralWork: z.boolean().default(false),
  neighbourAccess: z.boolean().default(false),
  tenure: z.enum(["owner", "tenant", "unknown"]).default("unknown"),
});

/** The brief itself (what the surveyor records before any plan is drawn). */
export const briefSchema = z.object({
  noises: z.array(briefNoiseSchema).max(20, "A brief lists at most 20 noises.").default([]),
  receivingRoom: z.string().trim().max(120).default(""),
  target: briefTargetSchema.nullable().default(null),
  budget: z.object({ amount: z.number().min(0, "A budget cannot be negative.").nullable(), currency: z.string().trim().length(3, "Use a three-letter currency code such as EUR.") }).default({ amount: null, currency: "EUR" }),
  accepts: briefAcceptsSchema.default({ liningDepth: null, daylight: false, ventilation: false, doorLook: false, structuralWork: false, neighbourAccess: false, tenure: "unknown" }),
  notes: z.string().trim().max(4000, "Notes are at most 4000 characters.").default(""),
});
export type Brief = z.infer<typeof briefSchema>;
export type BriefInput = z.input<typeof briefSchema>;

/** The format version of the stored brief document (bump with an up-migration when it changes). */
export const BRIEF_FORMAT_VERSION = 1;

export const briefSaveSchema = z.object({
  baseVersion: z.number("Send the version you started from.").int("The base version must be a whole number.").nonnegative("The base version cannot be negative."),
  brief: briefSchema,
});
export type BriefSave = z.infer<typeof briefSaveSchema>;

export const briefResponseSchema = z.object({
  projectId: z.uuid(),
  version: z.number().int(),
  formatVersion: z.number().int(),
  brief: briefSchema,
  updatedAt: z.string().nullable(),
  updatedBy: z.string().nullable(),
});
export type BriefResponse = z.infer<typeof briefResponseSchema>;

/** "Noticeably quieter" is aimed at this reduction: clearly noticeable to most people (common practice). */
export const NOTICEABLE_REDUCTION_DB = 5;

/** The target an analysis of this project aims at, from its brief (undefined when none is agreed). */
export function analysisTargetOfBrief(brief: Pick<Brief, "target">): AnalysisTarget | undefined {
  const t = brief.target;
  if (!t) return undefined;
  switch (t.kind) {
    case "level":
      return { kind: "dba", dba: t.levelDba };
    case "nc":
      return { kind: "nc", nc: t.nc };
    case "reduction":
      return { kind: "reduction", reductionDb: t.reductionDb };
    case "noticeable":
      return { kind: "reduction", reductionDb: NOTICEABLE_REDUCTION_DB };
  }
}
