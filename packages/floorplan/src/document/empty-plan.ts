import { PLAN_FORMAT, PLAN_SCHEMA_VERSION, planSchema, type Plan } from "./schema.js";

/** A new plan with the usual defaults and one ground-floor level 2.5 m high, ready to draw on (no unit). */
export function emptyPlan(head: { id: string; name: string; displayUnit?: "metric" | "imperial" }): Plan {
  return planSchema.parse({
    format: PLAN_FORMAT,
    schemaVersion: PLAN_SCHEMA_VERSION,
    id: head.id,
    name: head.name,
    displayUnit: head.displayUnit ?? "metric",
    defaults: {
      interiorWallConstructionId: "stud-wood-1x1-gypsum",
      exteriorWallConstructionId: "masonry-brick-100",
      floorConstructionId: "floor-wood-joist-gypsum-ceiling",
      ceilingConstructionId: "ceiling-gypsum-12-5",
    },
    elements: { "level-0": { type: "level", id: "level-0", name: "Ground floor", elevationM: 0, heightM: 2.5 } },
  });
}
