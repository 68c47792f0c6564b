import { z } from "zod";
import { projectIdParamSchema } from "./projects.js";

/** Drawings to trace over: what the upload sends beside the file, and what the server answers. */
export const underlayFieldsSchema = z.object({
  name: z.string().trim().max(200, "A name is at most 200 characters.").default(""),
  /** How the image came about: uploaded as it is, or a PDF page rendered in the browser. */
  source: z.enum(["image", "pdf-page"], "Say whether the file is an image or a rendered PDF page.").default("image"),
  page: z.coerce.number("Give the PDF page as a number.").int("Give the PDF page as a whole number.").positive("PDF pages count from 1.").max(10_000).optional(),
});
export type UnderlayFields = z.infer<typeof underlayFieldsSchema>;

export const underlayParamSchema = projectIdParamSchema.extend({ underlayId: z.uuid("That underlay id is not valid.") });

export const underlayFileSchema = z.object({
  id: z.uuid(),
  projectId: z.uuid(),
  name: z.string(),
  source: z.enum(["image", "pdf-page"]),
  page: z.number().nullable(),
  contentType: z.string(),
  sizeBytes: z.number(),
  widthPx: z.number(),
  heightPx: z.number(),
  createdAt: z.string(),
});
export type UnderlayFile = z.infer<typeof underlayFileSchema>;
export const underlayFileListSchema = z.object({ underlays: z.array(underlayFileSchema) });
