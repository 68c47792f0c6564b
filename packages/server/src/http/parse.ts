import type { z } from "zod";
import { badRequest } from "./errors.js";

/**
 * Parses request input with a shared schema; a ZodError becomes a 400 with field paths. Text with
 * a NUL character is refused here too: PostgreSQL cannot store U+0000 in text or jsonb, so it
 * would otherwise fail inside the write as a 500.
 */
export function parse<S extends z.ZodType>(schema: S, value: unknown): z.infer<S> {
  const parsed = schema.parse(value ?? {});
  const at = nulCharacterPath(parsed);
  if (at !== null) throw badRequest("Some fields need attention.", [{ path: at || "(body)", message: "Remove the invisible NUL character (\\u0000); it cannot be stored." }]);
  return parsed;
}

/** The dotted path of the first string (or key) holding U+0000, or null; iterative, so deep nesting cannot overflow the stack. */
export function nulCharacterPath(value: unknown): string | null {
  const stack: [unknown, string][] = [[value, ""]];
  while (stack.length) {
    const [v, path] = stack.pop()!;
    if (typeof v === "string") {
      if (v.includes("\u0000")) return path;
    } else if (v && typeof v === "object") {
      for (const [k, child] of Object.entries(v)) {
        const p = path ? `${path}.${k}` : k;
        if (k.includes("\u0000")) return p;
        stack.push([child, p]);
      }
    }
  }
  return null;
}
