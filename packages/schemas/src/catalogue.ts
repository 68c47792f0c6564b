import { z } from "zod";

export const constructionCategorySchema = z.enum(["wall", "door", "window", "floor", "ceiling"]);

export const sourceNoteSchema = z.object({ kind: z.enum(["published", "shaped", "estimate", "typical"]), note: z.string() });

export const constructionRatingsSchema = z.object({
  stc: z.number(), rw: z.number(), c: z.number(), ctr: z.number(), oitc: z.number(), lnw: z.number().optional(), iic: z.number().optional(),
});

export const constructionDtoSchema = z.object({
  id: z.string(),
  name: z.string(),
  category: constructionCategorySchema,
  thicknessMm: z.number(),
  surfaceDensityKgM2: z.number(),
  tlDb: z.array(z.number()),
  impactLnDb: z.array(z.number()).optional(),
  source: sourceNoteSchema,
  ratings: constructionRatingsSchema,
  origin: z.enum(["built-in", "firm"]),
});
export type ConstructionDto = z.infer<typeof constructionDtoSchema>;

/** What a firm says about its own construction besides the lab data. */
export const constructionMetaSchema = z.object({
  id: z
    .string()
    .trim()
    .regex(/^[a-z0-9][a-z0-9-]{2,59}$/, "Use 3 to 60 lower-case letters, digits and dashes, starting with a letter or digit."),
  name: z.string().trim().min(3, "Give the construction a name.").max(120, "A name is at most 120 characters."),
  category: constructionCategorySchema,
  thicknessMm: z.number().min(0, "A thickness cannot be negative.").max(2000, "A thickness over 2 m is not a partition."),
  surfaceDensityKgM2: z.number().min(0, "A surface density cannot be negative.").max(3000, "Check the surface density (kg/m²)."),
  sourceNote: z.string().trim().min(3, "Say where the data come from (lab, report number, date).").max(500),
});

/** A firm construction from a lab CSV: `frequency_hz,tl_db` (and `ln_db` for floors), one-third-octave bands. */
export const constructionUploadSchema = constructionMetaSchema.extend({
  csv: z.string().min(1, "Paste or upload the lab data as CSV.").max(100_000, "The CSV is larger than 100 kB."),
});
export type ConstructionUpload = z.infer<typeof constructionUploadSchema>;

export const constructionPreviewSchema = z.object({ construction: constructionDtoSchema, notes: z.array(z.string()) });

export const catalogueResponseSchema = z.object({
  constructions: z.array(constructionDtoSchema),
  coverings: z.array(z.object({ id: z.string(), name: z.string(), thicknessMm: z.number(), deltaLDb: z.array(z.number()), deltaLwDb: z.number(), source: sourceNoteSchema })),
  silencers: z.array(z.object({ id: z.string(), name: z.string(), lengthM: z.number(), insertionLossDb: z.array(z.number()), source: sourceNoteSchema })),
  sources: z.array(z.object({ id: z.string(), name: z.string(), kind: z.string(), typicalSpace: z.string(), levelsDb: z.array(z.number()), source: sourceNoteSchema })),
  finishes: z.array(z.object({ id: z.string(), name: z.string() })),
});
export type CatalogueResponse = z.infer<typeof catalogueResponseSchema>;
