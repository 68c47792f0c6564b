import { PROBLEM_CODES, type ProblemCode } from "./codes.js";
import type { Problem } from "./problem.js";

/** A problem with the severity its code carries (no unit). */
export function problem(code: ProblemCode, elementId: string, message: string, suggestion: string): Problem {
  return { code, severity: PROBLEM_CODES[code], elementId, message, suggestion };
}

/** The element's display name in quotes, or its kind and id (no unit). */
export function called(el: { id: string; name?: string | undefined; type?: string }, kind: string): string {
  return el.name ? `${kind} “${el.name}”` : `${kind} ${el.id}`;
}
