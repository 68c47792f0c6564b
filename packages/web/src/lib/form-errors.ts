import type { FieldValues, Path, UseFormSetError } from "react-hook-form";
import { isApiError } from "./api-client";

/**
 * Puts a 400's field problems onto the form's own fields. Answers the message that no field
 * could take (a refusal without field paths, or paths this form does not have), or null.
 */
export function applyServerErrors<T extends FieldValues>(
  error: unknown,
  setError: UseFormSetError<T>,
  fieldNames: readonly Path<T>[],
): string | null {
  if (!isApiError(error)) return "Something went wrong. Try again.";
  let placed = 0;
  for (const issue of error.fieldIssues) {
    const name = fieldNames.find((field) => field === issue.path || issue.path.startsWith(`${field}.`));
    if (name) {
      setError(name, { type: "server", message: issue.message }, { shouldFocus: placed === 0 });
      placed += 1;
    }
  }
  if (placed > 0 && placed === error.fieldIssues.length) return null;
  return error.message;
}
