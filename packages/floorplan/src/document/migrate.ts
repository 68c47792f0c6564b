import { PLAN_FORMAT, PLAN_SCHEMA_VERSION } from "./schema.js";

/** One up-migration: turns a document of version `from` into version `from + 1`. */
export interface PlanMigration {
  from: number;
  label: string;
  up: (doc: Record<string, unknown>) => Record<string, unknown>;
}

/**
 * The real migrations, one per version bump. Version 1 is the first published shape, so the
 * list is empty; a future v2 appends `{ from: 1, label, up }` and bumps PLAN_SCHEMA_VERSION.
 */
export const planMigrations: readonly PlanMigration[] = [];

export class PlanMigrationError extends Error {
  override name = "PlanMigrationError";
}

function isRecord(value: unknown): value is Record<string, unknown> {
  return typeof value === "object" && value !== null && !Array.isArray(value);
}

/** Applies `migrations` in order until `target` is reached (no unit); throws PlanMigrationError when it cannot. */
export function migrationsApplied(
  raw: unknown,
  migrations: readonly PlanMigration[],
  target: number,
): Record<string, unknown> {
  if (!isRecord(raw)) throw new PlanMigrationError("A plan file must be a JSON object.");
  if (raw.format !== PLAN_FORMAT) {
    throw new PlanMigrationError(`This is not a Hushmark plan (its format is ${JSON.stringify(raw.format ?? null)}, expected "${PLAN_FORMAT}").`);
  }
  const version = raw.schemaVersion;
  if (typeof version !== "number" || !Number.isInteger(version) || version < 0) {
    throw new PlanMigrationError("The plan has no valid schemaVersion.");
  }
  if (version > target) {
    throw new PlanMigrationError(`The plan was saved by a newer Hushmark (schema version ${version}); this one reads up to ${target}.`);
  }
  // Copy so the caller's object is never mutated by a migration step.
  let doc = JSON.parse(JSON.stringify(raw)) as Record<string, unknown>;
  for (let v = version; v < target; v++) {
    const step = migrations.find((m) => m.from === v);
    if (!step) throw new PlanMigrationError(`No migration from plan schema version ${v}.`);
    doc = { ...step.up(doc), format: PLAN_FORMAT, schemaVersion: v + 1 };
  }
  return doc;
}

/** Brings a raw plan document up to the current schema version (no unit); throws PlanMigrationError. */
export function migratePlan(raw: unknown): Record<string, unknown> {
  return migrationsApplied(raw, planMigrations, PLAN_SCHEMA_VERSION);
}
