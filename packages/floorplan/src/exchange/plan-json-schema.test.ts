import { describe, expect, it } from "vitest";
import written from "../../../../docs/plan-document.schema.json" with { type: "json" };
import { demoPlans } from "../demo/demo-plans.js";
import { emptyPlan } from "../document/empty-plan.js";
import { generateSyntheticBuilding } from "../synthetic/generate.js";
import { planJsonSchema } from "./plan-json-schema.js";

type Schema = Record<string, unknown>;

/**
 * The JSON Schema keywords the generated schema uses (type, const, enum, pattern, minLength,
 * minimum, maximum, exclusiveMinimum, properties, required, additionalProperties, propertyNames,
 * items, oneOf), enough to check documents against the published file; returns the failures.
 */
function schemaFailures(schema: Schema, value: unknown, path = "$"): string[] {
  const out: string[] = [];
  const t = schema.type as string | undefined;
  const isObj = typeof value === "object" && value !== null && !Array.isArray(value);
  if (t === "object" && !isObj) return [`${path}: not an object`];
  if (t === "array" && !Array.isArray(value)) return [`${path}: not an array`];
  if (t === "string" && typeof value !== "string") return [`${path}: not a string`];
  if ((t === "number" || t === "integer") && typeof value !== "number") return [`${path}: not a number`];
  if (t === "integer" && !Number.isInteger(value)) return [`${path}: not an integer`];
  if (t === "boolean" && typeof value !== "boolean") return [`${path}: not a boolean`];
  if ("const" in schema && value !== schema.const) out.push(`${path}: not ${JSON.stringify(schema.const)}`);
  if (Array.isArray(schema.enum) && !schema.enum.includes(value)) out.push(`${path}: ${JSON.stringify(value)} not in enum`);
  if (typeof value === "string") {
    if (typeof schema.pattern === "string" && !new RegExp(schema.pattern).test(value)) out.push(`${path}: does not match ${schema.pattern}`);
    if (typeof schema.minLength === "number" && value.length < schema.minLength) out.push(`${path}: too short`);
  }
  if (typeof value === "number") {
    if (typeof schema.minimum === "number" && value < schema.minimum) out.push(`${path}: below minimum`);
    if (typeof schema.maximum === "number" && value > schema.maximum) out.push(`${path}: above maximum`);
    if (typeof schema.exclusiveMinimum === "number" && value <= schema.exclusiveMinimum) out.push(`${path}: not above exclusive minimum`);
  }
  if (Array.isArray(schema.oneOf)) {
    const passing = (schema.oneOf as Schema[]).filter((s) => schemaFailures(s, value, path).length === 0).length;
    if (passing !== 1) out.push(`${path}: matches ${passing} of oneOf`);
  }
  if (Array.isArray(value) && schema.items) value.forEach((v, i) => out.push(...schemaFailures(schema.items as Schema, v, `${path}[${i}]`)));
  if (isObj) {
    const obj = value as Record<string, unknown>;
    const props = (schema.properties ?? {}) as Record<string, Schema>;
    for (const r of (schema.required ?? []) as string[]) if (!(r in obj)) out.push(`${path}: missing ${r}`);
    for (const [k, v] of Object.entries(obj)) {
      if (props[k]) out.push(...schemaFailures(props[k], v, `${path}.${k}`));
      else if (schema.additionalProperties === false) out.push(`${path}: unexpected ${k}`);
      else if (typeof schema.additionalProperties === "object") out.push(...schemaFailures(schema.additionalProperties as Schema, v, `${path}.${k}`));
      if (schema.propertyNames) out.push(...schemaFailures(schema.propertyNames as Schema, k, `${path} key ${k}`));
    }
  }
  return out;
}

describe("published plan JSON Schema", () => {
  it("docs/plan-document.schema.json is what the zod schema generates (regenerate: npx tsx scripts/write-json-schema.ts)", () => {
    expect(written).toEqual(planJsonSchema());
  });

  it("requires the document's head fields", () => {
    expect((written as Schema).required).toEqual(["format", "schemaVersion", "id", "name", "defaults", "elements"]);
  });

  it("accepts the demo plans, a new plan and a synthetic building", () => {
    const plans = [...demoPlans().map((d) => d.plan), emptyPlan({ id: "new", name: "New" }), generateSyntheticBuilding({ rooms: 30, levels: 2, seed: 7 })];
    for (const plan of plans) expect(schemaFailures(written as Schema, JSON.parse(JSON.stringify(plan))), plan.id).toEqual([]);
  });

  it("rejects documents the plan parser rejects", () => {
    const plan = JSON.parse(JSON.stringify(demoPlans()[0]!.plan)) as Record<string, unknown> & { elements: Record<string, Record<string, unknown>> };
    const { format: _format, ...noFormat } = plan;
    expect(schemaFailures(written as Schema, noFormat)).toContain("$: missing format");
    const room = Object.values(plan.elements).find((e) => e.type === "room")!;
    const badUse = { ...plan, elements: { ...plan.elements, [room.id as string]: { ...room, use: "ballroom" } } };
    expect(schemaFailures(written as Schema, badUse).length).toBeGreaterThan(0);
    const badId = { ...plan, elements: { ...plan.elements, [room.id as string]: { ...room, id: "bad id" } } };
    expect(schemaFailures(written as Schema, badId).length).toBeGreaterThan(0);
    const badWidth = { ...plan, elements: { ...plan.elements, d: { type: "door", id: "d", wallRef: "x:y", offsetM: 0, widthM: -1, heightM: 2, constructionId: "c" } } };
    expect(schemaFailures(written as Schema, badWidth).length).toBeGreaterThan(0);
  });
});
