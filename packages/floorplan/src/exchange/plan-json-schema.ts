import { z } from "zod";
import { PLAN_FORMAT, PLAN_SCHEMA_VERSION, planSchema } from "../document/schema.js";

/** Where the published schema lives, relative to the repository root. */
export const PLAN_JSON_SCHEMA_PATH = "docs/plan-document.schema.json";

/**
 * The plan document's JSON Schema (draft 2020-12), generated from `planSchema` for documents as
 * written (fields with defaults may be left out); the check that each element's key equals its id
 * is not expressible and is described in the root's description (no unit).
 */
export function planJsonSchema(): Record<string, unknown> {
  const generated = z.toJSONSchema(planSchema, { io: "input", unrepresentable: "any" }) as Record<string, unknown>;
  return {
    $schema: generated.$schema,
    $id: "https://hushmark.invalid/schemas/plan-document.schema.json",
    title: `Hushmark plan document (${PLAN_FORMAT}, schema version ${PLAN_SCHEMA_VERSION})`,
    description:
      "A survey plan: levels, rooms with outlines, walls, openings, vents, ducts, voids, neighbours, pins and notes, " +
      "keyed by element id in `elements` (each key equals its element's `id`; the id `outdoors` is reserved). Lengths in metres, areas in m², plan " +
      "coordinates x east and y north. Generated from the zod schema in packages/floorplan; see docs/plan-model.md.",
    ...Object.fromEntries(Object.entries(generated).filter(([k]) => k !== "$schema")),
  };
}

/** The schema as the text written to docs/: two-space JSON with a final newline (no unit). */
export function planJsonSchemaText(): string {
  return `${JSON.stringify(planJsonSchema(), null, 2)}\n`;
}
