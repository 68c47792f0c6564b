import type { z } from "zod";
import { badRequest } from "./errors.js";

/**
 * Parses request input with a shared schema; a ZodError becomes a 400 with field paths. Text
 * PostgreSQL cannot store is refused here too — a NUL character (U+0000) in text or jsonb, a lone
 * UTF-16 surrogate in jsonb — as it would otherwise fail inside the write as a 500.
 */
export function parse<S extends z.ZodType>(schema: S, value: unknown): z.infer<S> {
  const parsed = schema.parse(value ?? {});
  const bad = unstorableTextPath(parsed);
  if (bad) throw badRequest("Some fields need attention.", [{ path: bad.path || "(body)", message: bad.message }]);
  return parsed;
}

const LONE_SURROGATE = /[\ud800-\udbff](?![\udc00-\udfff])|(?<![\ud800-\udbff])[\udc00-\udfff]/;

/** What is wrong with a string PostgreSQL cannot store, or null when it can. */
function unstorable(s: string): string | null {
  if (s.includes("\u0000")) return "Remove the invisible NUL character (\\u0000); it cannot be stored.";
  if (LONE_SURROGATE.test(s)) return "Remove the broken character (half of an emoji or other symbol); it cannot be stored.";
  return null;
}

/** The first string (or key) PostgreSQL cannot store, with its dotted path and why; iterative, so deep nesting cannot overflow the stack. */
export function unstorableTextPath(value: unknown): { path: string; message: string } | null {
  const stack: [unknown, string][] = [[value, ""]];
  while (stack.length) {
    const [v, path] = stack.pop()!;
    if (typeof v === "string") {
      const message = unstorable(v);
      if (message) return { path, message };
    } else if (v && typeof v === "object") {
      for (const [k, child] of Object.entries(v)) {
        const p = path ? `${path}.${k}` : k;
        const message = unstorable(k);
        if (message) return { path: p, message };
        stack.push([child, p]);
      }
    }
  }
  return null;
}
