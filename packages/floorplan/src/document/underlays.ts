import { z } from "zod";
import { elementIdSchema } from "./ids.js";

const finite = z.number().finite();

/**
 * A drawing traced over (a photo of a plan, a rendered PDF page) placed on one level. Pixel (u, v)
 * of the image, v counted down from its top edge, lies at plan point
 * origin + R(rotationDeg) · (u · scaleMPerPx, −v · scaleMPerPx), R turning anticlockwise.
 */
export const underlaySchema = z.object({
  id: elementIdSchema,
  /** The uploaded image, as the project's underlay files name it. */
  fileId: z.string().min(1),
  levelId: elementIdSchema,
  name: z.string().default(""),
  /** Size of the uploaded image, px. */
  widthPx: z.number().int().positive(),
  heightPx: z.number().int().positive(),
  /** Plan point (m) of the image's top-left corner. */
  origin: z.object({ x: finite, y: finite }),
  /** Metres per image pixel, set by calibrating against a known distance. */
  scaleMPerPx: finite.positive(),
  /** Anticlockwise turn of the image on the plan, degrees. */
  rotationDeg: finite.default(0),
  opacity: finite.min(0).max(1).default(0.5),
  /** A locked underlay cannot be moved, turned or calibrated by accident. */
  locked: z.boolean().default(false),
  visible: z.boolean().default(true),
  /** Set once two points and a real distance have fixed the scale. */
  calibrated: z.boolean().default(false),
});
export type Underlay = z.infer<typeof underlaySchema>;
