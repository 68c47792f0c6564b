import { randomUUID } from "node:crypto";
import { PLAN_FORMAT, PLAN_SCHEMA_VERSION, parsePlan, serializePlan } from "@hushmark/floorplan";
import type { EmptyPlanFactory } from "../projects/projects.service.js";
import type { PlanDocumentCheck } from "./plans.service.js";

const MAX_PLAN_BYTES = 8_000_000;

/** The document a new project's plan starts with: one level, the trade's usual default constructions. */
export const emptyPlanDocument: EmptyPlanFactory = (title) => {
  const result = parsePlan({
    format: PLAN_FORMAT,
    schemaVersion: PLAN_SCHEMA_VERSION,
    id: `plan-${randomUUID().slice(0, 8)}`,
    name: title,
    displayUnit: "metric",
    defaults: {
      interiorWallConstructionId: "stud-wood-1x1-gypsum-insulated",
      exteriorWallConstructionId: "masonry-brick-100",
      wallThicknessM: 0.12,
      floorConstructionId: "floor-concrete-200",
      ceilingConstructionId: "ceiling-suspended-tile",
    },
    elements: { "level-1": { type: "level", id: "level-1", name: "Ground floor", elevationM: 0, heightM: 2.6 } },
  });
  if (!result.ok) throw new Error(`the empty plan does not parse: ${result.problems.map((p) => p.message).join("; ")}`);
  return JSON.parse(serializePlan(result.plan)) as Record<string, unknown>;
};

/**
 * A saved document must be a plan document (format, version, element shapes). Problems that
 * only stop an analysis — overlapping rooms, a door wider than its wall — do not stop a save:
 * the surveyor may be half-way through drawing.
 */
export const planDocumentCheck: PlanDocumentCheck = (document) => {
  if (JSON.stringify(document).length > MAX_PLAN_BYTES) return [{ path: "document", message: "The plan is larger than 8 MB; split it into several projects." }];
  const parsed = parsePlan(document);
  if (parsed.ok) return [];
  return parsed.problems.map((p) => ({ path: `document${p.message.includes(":") ? `.${p.message.split(":")[0]}` : ""}`, message: p.message }));
};
