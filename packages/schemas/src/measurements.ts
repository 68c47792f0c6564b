import { z } from "zod";
import { projectIdParamSchema } from "./projects.js";

/** 21 one-third-octave bands, 50–5000 Hz. */
export const MEASUREMENT_BANDS_HZ = [50, 63, 80, 100, 125, 160, 200, 250, 315, 400, 500, 630, 800, 1000, 1250, 1600, 2000, 2500, 3150, 4000, 5000] as const;

export const measurementKindSchema = z.enum(["background", "source_side", "receiver_side", "before_work", "after_work"], "Pick what the measurement is of.");
export type MeasurementKind = z.infer<typeof measurementKindSchema>;
export const measurementSourceSchema = z.enum(["csv", "recording", "live", "manual"]);
export const measurementStatusSchema = z.enum(["ready", "processing", "failed"]);

const level = z.number("A band level is a number of dB.").min(-50, "A band level below −50 dB is not a measurement.").max(200, "A band level above 200 dB is not a measurement.");
export const bandLevelsSchema = z
  .array(level.nullable())
  .length(21, "Give 21 one-third-octave levels, 50 Hz to 5000 Hz (null where a band was not measured).");

export const planPointSchema = z.object({ x: z.number().finite(), y: z.number().finite() });

const meta = {
  label: z.string().trim().min(1, "Give the measurement a name.").max(120, "A name is at most 120 characters."),
  kind: measurementKindSchema,
  takenAt: z.iso.datetime({ offset: true, message: "Give the time as an ISO date and time, such as 2026-05-01T21:30:00Z." }),
  roomId: z.string().trim().max(100).nullable().default(null),
  point: planPointSchema.nullable().default(null),
  device: z.string().trim().max(120, "A device name is at most 120 characters.").default(""),
  calibrationDb: z.number("The calibration offset is a number of dB.").min(-60, "A calibration offset is between −60 and +200 dB.").max(200, "A calibration offset is between −60 and +200 dB.").default(0),
};

/** A measurement entered as a spectrum (from a confirmed CSV preview, the live analyzer, or by hand). */
export const measurementInputSchema = z.object({
  ...meta,
  source: z.enum(["csv", "live", "manual"]).default("manual"),
  leqDb: bandLevelsSchema,
  lmaxDb: bandLevelsSchema.nullable().default(null),
});
export type MeasurementInput = z.input<typeof measurementInputSchema>;

export const measurementUpdateSchema = z.object(meta).partial();
export type MeasurementUpdate = z.infer<typeof measurementUpdateSchema>;

/** Form fields sent with a recording upload (multipart, so numbers arrive as text). */
export const recordingFieldsSchema = z.object({
  label: meta.label,
  kind: meta.kind,
  takenAt: meta.takenAt,
  device: meta.device,
  calibrationDb: z.coerce.number("The calibration offset is a number of dB.").min(-60, "A calibration offset is between −60 and +200 dB.").max(200, "A calibration offset is between −60 and +200 dB.").default(0),
  roomId: z.string().trim().max(100).optional().transform((v) => v || null),
  pointX: z.coerce.number("The pin's x is a number of metres.").finite().optional(),
  pointY: z.coerce.number("The pin's y is a number of metres.").finite().optional(),
  marginDb: z.coerce.number().min(1, "The event margin is at least 1 dB.").max(40, "The event margin is at most 40 dB.").default(10),
  minDurationS: z.coerce.number().min(1, "An event lasts at least 1 s.").max(3600, "An event lasts at most an hour.").default(2),
});

export const measurementEventSchema = z.object({
  startS: z.number(),
  durationS: z.number(),
  peakDb: z.number(),
  leqDb: z.number(),
  dominantBandHz: z.number().nullable(),
});

export const measurementSummarySchema = z.object({
  laeqDb: z.number().nullable(),
  lafmaxDb: z.number().nullable(),
  la10Db: z.number().nullable(),
  la90Db: z.number().nullable(),
  durationS: z.number().nullable(),
  sampleRateHz: z.number().nullable(),
  channels: z.number().nullable(),
});

export const measurementSchema = z.object({
  id: z.uuid(),
  projectId: z.uuid(),
  label: z.string(),
  kind: measurementKindSchema,
  source: measurementSourceSchema,
  status: measurementStatusSchema,
  progress: z.number(),
  error: z.string().nullable(),
  takenAt: z.string(),
  roomId: z.string().nullable(),
  point: planPointSchema.nullable(),
  device: z.string(),
  calibrationDb: z.number(),
  leqDb: z.array(z.number().nullable()),
  lmaxDb: z.array(z.number().nullable()).nullable(),
  l10Db: z.array(z.number().nullable()).nullable(),
  l90Db: z.array(z.number().nullable()).nullable(),
  summary: measurementSummarySchema.nullable(),
  events: z.array(measurementEventSchema).nullable(),
  hasRecording: z.boolean(),
  createdAt: z.string(),
});
export type Measurement = z.infer<typeof measurementSchema>;

export const measurementHistorySchema = z.object({
  stepS: z.number(),
  laeqDb: z.array(z.number()),
  lafmaxDb: z.array(z.number()),
  bandsDb: z.array(z.array(z.number().nullable())).nullable(),
});
export const measurementDetailSchema = measurementSchema.extend({ history: measurementHistorySchema.nullable() });
export type MeasurementDetail = z.infer<typeof measurementDetailSchema>;
export const measurementListSchema = z.object({ measurements: z.array(measurementSchema) });

export const measurementParamSchema = projectIdParamSchema.extend({ measurementId: z.uuid("That measurement id is not valid.") });
export const photoParamSchema = projectIdParamSchema.extend({ photoId: z.uuid("That photo id is not valid.") });

/** A spectrum file to preview before anything is saved. */
export const csvPreviewInputSchema = z.object({
  text: z.string("Send the file's text.").min(1, "The file is empty.").max(200_000, "A spectrum file is at most 200 000 characters."),
});
export const csvPreviewSchema = z.object({
  ok: z.boolean(),
  separator: z.string(),
  decimalComma: z.boolean(),
  columns: z.object({ frequency: z.string(), level: z.string(), max: z.string().nullable() }).nullable(),
  rows: z.array(z.object({ line: z.number(), bandHz: z.number(), levelDb: z.number(), maxDb: z.number().nullable() })),
  problems: z.array(z.object({ line: z.number(), reason: z.string(), text: z.string() })),
  leqDb: z.array(z.number().nullable()),
  lmaxDb: z.array(z.number().nullable()).nullable(),
  missingBandsHz: z.array(z.number()),
  notes: z.array(z.string()),
});
export type CsvPreview = z.infer<typeof csvPreviewSchema>;

/** Playing back part of a recording. */
export const audioExcerptQuerySchema = z.object({
  startS: z.coerce.number("Give the start in seconds.").min(0, "The start cannot be negative."),
  durationS: z.coerce.number("Give the length in seconds.").positive("The length must be more than 0 s.").max(120, "Play at most 120 s at a time."),
});

export const photoFieldsSchema = z
  .object({
    elementId: z.string().trim().max(100).optional().transform((v) => v || null),
    measurementId: z.union([z.uuid("That measurement id is not valid."), z.literal("")]).optional().transform((v) => v || null),
    caption: z.string().trim().max(300, "A caption is at most 300 characters.").default(""),
  })
  .refine((v) => v.elementId !== null || v.measurementId !== null, { message: "Attach the photo to a plan element or a measurement.", path: ["elementId"] });

export const photoSchema = z.object({
  id: z.uuid(),
  projectId: z.uuid(),
  elementId: z.string().nullable(),
  measurementId: z.uuid().nullable(),
  caption: z.string(),
  contentType: z.string(),
  sizeBytes: z.number(),
  width: z.number().nullable(),
  height: z.number().nullable(),
  createdAt: z.string(),
});
export type Photo = z.infer<typeof photoSchema>;
export const photoListSchema = z.object({ photos: z.array(photoSchema) });
export const photoImageQuerySchema = z.object({ size: z.enum(["thumb", "full"], "Ask for size thumb or full.").default("full") });
