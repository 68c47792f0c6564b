import { PLAN_FORMAT, PLAN_SCHEMA_VERSION, planSchema, type Plan } from "@hushmark/floorplan";

/** A blank plan with one ground level and the usual light-frame and masonry defaults. */
export function newPlan(id: string, name: string, displayUnit: "metric" | "imperial" = "metric"): Plan {
  return planSchema.parse({
    format: PLAN_FORMAT,
    schemaVersion: PLAN_SCHEMA_VERSION,
    id,
    name,
    displayUnit,
    defaults: {
      interiorWallConstructionId: "stud-wood-1x1-gypsum",
      exteriorWallConstructionId: "masonry-brick-100",
      wallThicknessM: 0.12,
      floorConstructionId: "floor-concrete-200",
      ceilingConstructionId: "ceiling-gypsum-12-5",
    },
    elements: { ground: { type: "level", id: "ground", name: "Ground floor", elevationM: 0, heightM: 2.6 } },
  });
}
