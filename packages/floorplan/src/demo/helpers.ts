import { PLAN_FORMAT, PLAN_SCHEMA_VERSION, planSchema, type Element, type Plan, type PlanInput, type Point } from "../document/schema.js";

type ElementInput = PlanInput["elements"][string];

/** Corners of a polygon with ids `${prefix}1…n`, from plan points in metres. */
export function outline(prefix: string, points: ReadonlyArray<readonly [number, number]>): Array<{ id: string; x: number; y: number }> {
  return points.map(([x, y], i) => ({ id: `${prefix}${i + 1}`, x, y }));
}

/** Rectangle corners counter-clockwise from (x, y), ids `${prefix}1…4` (m). */
export function rectangle(prefix: string, x: number, y: number, widthM: number, depthM: number): Array<{ id: string; x: number; y: number }> {
  return outline(prefix, [[x, y], [x + widthM, y], [x + widthM, y + depthM], [x, y + depthM]]);
}

/** A parsed plan document from its parts (no unit). */
export function planDocument(head: { id: string; name: string; displayUnit?: "metric" | "imperial"; defaults: PlanInput["defaults"]; wallSettings?: PlanInput["wallSettings"] }, elements: ElementInput[]): Plan {
  const record: Record<string, ElementInput> = {};
  for (const el of elements) {
    if (record[el.id]) throw new Error(`duplicate element id ${el.id}`);
    record[el.id] = el;
  }
  return planSchema.parse({ format: PLAN_FORMAT, schemaVersion: PLAN_SCHEMA_VERSION, ...head, elements: record });
}

export type { Element, Point };
