import type { z } from "zod";

/** Parses request input with a shared schema; a ZodError becomes a 400 with field paths. */
export function parse<S extends z.ZodType>(schema: S, value: unknown): z.infer<S> {
  return schema.parse(value ?? {});
}
