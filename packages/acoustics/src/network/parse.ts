/**
 * Parsing a network JSON value with readable issues: each names the JSON path ($.links[0].parts[1])
 * and what is wrong.
 */
import type { z } from "zod";
import { networkSchema, type Network } from "./schema.js";

export interface InputIssue {
  /** JSON path of the offending value, like `$.links[0].parts[1].tl_db`. */
  readonly path: string;
  readonly message: string;
}

export type ParseResult<T> = { ok: true; value: T } | { ok: false; issues: InputIssue[] };

/** A zod issue path as a JSON path string (`$`, `$.a[0].b`). */
export function jsonPath(path: readonly PropertyKey[]): string {
  return path.reduce<string>((acc, key) => {
    if (typeof key === "number") return `${acc}[${key}]`;
    const name = String(key);
    return /^[A-Za-z_][A-Za-z0-9_]*$/.test(name) ? `${acc}.${name}` : `${acc}[${JSON.stringify(name)}]`;
  }, "$");
}

type Issue = z.core.$ZodIssue;

function valueAt(root: unknown, path: readonly PropertyKey[]): unknown {
  let v = root;
  for (const key of path) {
    if (v === null || typeof v !== "object") return undefined;
    v = (v as Record<PropertyKey, unknown>)[key];
  }
  return v;
}

/**
 * How far a union branch is from matching: a value of the wrong type altogether counts most, then
 * fields the input lacks, then wrong values.
 */
function branchDistance(issues: readonly Issue[], input: unknown): number {
  const cost = (i: Issue) => (i.path.length === 0 && i.code === "invalid_type" ? 100 : valueAt(input, i.path) === undefined ? 10 : 1);
  return issues.reduce((sum, i) => sum + cost(i), 0);
}

function flattenIssue(issue: Issue, base: readonly PropertyKey[], root: unknown): InputIssue[] {
  const path = [...base, ...issue.path];
  if (issue.code === "invalid_union" && issue.errors.length > 0) {
    const here = valueAt(root, path);
    const ranked = [...issue.errors].sort((a, b) => branchDistance(a, here) - branchDistance(b, here));
    return (ranked[0] ?? []).flatMap((inner) => flattenIssue(inner, path, root));
  }
  return [{ path: jsonPath(path), message: issue.message }];
}

/** zod issues as path + message pairs; a union reports the issues of its closest branch. */
export function inputIssues(error: z.ZodError, input: unknown): InputIssue[] {
  return error.issues.flatMap((issue) => flattenIssue(issue, [], input));
}

/** Parse and check a network JSON value (already JSON.parse'd). */
export function parseNetwork(value: unknown): ParseResult<Network> {
  const result = networkSchema.safeParse(value);
  return result.success ? { ok: true, value: result.data } : { ok: false, issues: inputIssues(result.error, value) };
}
