import { PLAN_FORMAT, PLAN_SCHEMA_VERSION, planSchema, type Element, type Plan, type PlanInput } from "../src/document/schema.js";

/** Rectangle outline with vertex ids `${prefix}a..d`, counter-clockwise from (x, y). */
export function rect(prefix: string, x: number, y: number, w: number, h: number) {
  return [
    { id: `${prefix}a`, x, y },
    { id: `${prefix}b`, x: x + w, y },
    { id: `${prefix}c`, x: x + w, y: y + h },
    { id: `${prefix}d`, x, y: y + h },
  ];
}

/** A parsed plan holding the given elements and the usual defaults. */
export function planWith(elements: Element[] | PlanInput["elements"][string][], extra: Partial<PlanInput> = {}): Plan {
  const record: PlanInput["elements"] = {};
  for (const el of elements) record[el.id] = el;
  return planSchema.parse({
    format: PLAN_FORMAT,
    schemaVersion: PLAN_SCHEMA_VERSION,
    id: "test-plan",
    name: "Test plan",
    defaults: {
      interiorWallConstructionId: "stud-wood-1x1-gypsum",
      exteriorWallConstructionId: "masonry-brick-100",
      floorConstructionId: "floor-wood-joist-gypsum-ceiling",
      ceilingConstructionId: "ceiling-gypsum-12-5",
    },
    elements: record,
    ...extra,
  });
}

export const groundLevel = { type: "level" as const, id: "L0", name: "Ground", elevationM: 0, heightM: 2.5 };
export const firstLevel = { type: "level" as const, id: "L1", name: "First", elevationM: 3, heightM: 2.5 };
