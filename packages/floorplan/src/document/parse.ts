import type { Problem } from "../validation/problem.js";
import { migratePlan, PlanMigrationError } from "./migrate.js";
import { planSchema, type Plan } from "./schema.js";

export type PlanParseResult = { ok: true; plan: Plan } | { ok: false; problems: Problem[] };

/** Migrates and parses a raw plan (object or JSON text) into a typed plan, or lists why it cannot (no unit). */
export function parsePlan(raw: unknown): PlanParseResult {
  let doc: unknown = raw;
  if (typeof raw === "string") {
    try {
      doc = JSON.parse(raw);
    } catch (err) {
      return { ok: false, problems: [documentProblem("", `The file is not valid JSON: ${(err as Error).message}`)] };
    }
  }
  let migrated: Record<string, unknown>;
  try {
    migrated = migratePlan(doc);
  } catch (err) {
    if (err instanceof PlanMigrationError) return { ok: false, problems: [documentProblem("", err.message)] };
    throw err;
  }
  const parsed = planSchema.safeParse(migrated);
  if (parsed.success) return { ok: true, plan: parsed.data };
  return {
    ok: false,
    problems: parsed.error.issues.map((issue) => {
      const path = issue.path.map(String);
      const elementId = path[0] === "elements" && path[1] !== undefined ? path[1] : "";
      return documentProblem(elementId, `${path.join(".") || "document"}: ${issue.message}`);
    }),
  };
}

function documentProblem(elementId: string, message: string): Problem {
  return {
    code: "document-invalid",
    severity: "error",
    elementId,
    message,
    suggestion: "Re-save the plan from the editor, or correct the field named in the message.",
  };
}
