import { describe, expect, it } from "vitest";
import { groundLevel, planWith, rect } from "../../test/plan-fixtures.js";
import { migrationsApplied, migratePlan, type PlanMigration } from "./migrate.js";
import { parsePlan } from "./parse.js";
import { PLAN_FORMAT, PLAN_SCHEMA_VERSION } from "./schema.js";
import { canonicalJson, serializePlan } from "./serialize.js";

const room = { type: "room" as const, id: "A", levelId: "L0", name: "Studio", use: "studio" as const, outline: rect("A", 0, 0, 4, 5) };

describe("plan document", () => {
  it("round-trips through serializePlan and parsePlan unchanged", () => {
    const plan = planWith([groundLevel, room]);
    const text = serializePlan(plan);
    const back = parsePlan(text);
    expect(back.ok).toBe(true);
    if (back.ok) expect(serializePlan(back.plan)).toBe(text);
  });

  it("serializes deterministically whatever the key order", () => {
    const a = planWith([groundLevel, room]);
    const b = planWith([room, { name: "Ground", heightM: 2.5, elevationM: 0, id: "L0", type: "level" }]);
    expect(serializePlan(a)).toBe(serializePlan(b));
    expect(canonicalJson({ b: 1, a: { d: 2, c: -0 } }, 0)).toBe('{"a":{"c":0,"d":2},"b":1}');
  });

  it("rejects another format, a future version and bad JSON with a message", () => {
    const other = parsePlan({ format: "something-else", schemaVersion: 1 });
    expect(!other.ok && other.problems[0]!.message).toMatch(/not a Hushmark plan/);
    const future = parsePlan({ format: PLAN_FORMAT, schemaVersion: PLAN_SCHEMA_VERSION + 1 });
    expect(!future.ok && future.problems[0]!.message).toMatch(/newer Hushmark/);
    const broken = parsePlan("{ nope");
    expect(!broken.ok && broken.problems[0]!.code).toBe("document-invalid");
  });

  it("names the element whose field is wrong", () => {
    const plan = JSON.parse(serializePlan(planWith([groundLevel, room])));
    plan.elements.A.use = "ballroom";
    const r = parsePlan(plan);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.problems[0]!.elementId).toBe("A");
  });

  it("rejects an element stored under another id", () => {
    const plan = JSON.parse(serializePlan(planWith([groundLevel, room])));
    plan.elements.B = plan.elements.A;
    delete plan.elements.A;
    expect(parsePlan(plan).ok).toBe(false);
  });

  it("applies migrations in order up to the target and stamps the version", () => {
    const steps: PlanMigration[] = [
      { from: 0, label: "rename rooms to elements", up: (d) => ({ ...d, elements: d.rooms, rooms: undefined }) },
      { from: 1, label: "add a tag", up: (d) => ({ ...d, tag: "v2" }) },
    ];
    const v0 = { format: PLAN_FORMAT, schemaVersion: 0, rooms: { A: 1 } };
    const out = migrationsApplied(v0, steps, 2);
    expect(out).toMatchObject({ schemaVersion: 2, elements: { A: 1 }, tag: "v2" });
    expect(v0.schemaVersion).toBe(0); // the input is not mutated
    expect(() => migrationsApplied({ ...v0, schemaVersion: 1 }, steps.slice(0, 1), 2)).toThrow(/No migration from plan schema version 1/);
  });

  it("leaves a current-version plan as it is", () => {
    const plan = JSON.parse(serializePlan(planWith([groundLevel, room])));
    expect(migratePlan(plan)).toEqual(plan);
  });
});

import { emptyPlan } from "./empty-plan.js";
import { validatePlan } from "../validation/validate.js";
import { constructionCatalogue } from "../catalogue/catalogue.js";

describe("emptyPlan", () => {
  it("is a valid plan with one level and defaults from the catalogue", () => {
    const plan = emptyPlan({ id: "new-job", name: "New job", displayUnit: "imperial" });
    expect(validatePlan(plan, constructionCatalogue)).toEqual([]);
    expect(plan.elements["level-0"]).toMatchObject({ type: "level", heightM: 2.5 });
    expect(parsePlan(serializePlan(plan)).ok).toBe(true);
  });
});

import { elementsOfType } from "./elements.js";
import { roomEdges } from "../geometry/walls.js";

describe("derived lists and drafts", () => {
  it("re-reads a plan that is changed in place (an immer draft is), and caches a frozen one", () => {
    const plan = planWith([groundLevel, room]);
    expect(elementsOfType(plan, "room")).toHaveLength(1);
    plan.elements.B = { ...room, id: "B", outline: rect("B", 4, 0, 4, 5) };
    expect(elementsOfType(plan, "room").map((r) => r.id)).toEqual(["A", "B"]);
    const a = plan.elements.A!;
    if (a.type !== "room") throw new Error("fixture");
    const before = roomEdges(a)[0]!.lengthM;
    a.outline[1] = { ...a.outline[1]!, x: 6 };
    expect(roomEdges(a)[0]!.lengthM).not.toBe(before);
    Object.freeze(plan.elements);
    expect(elementsOfType(plan, "room")).toBe(elementsOfType(plan, "room"));
  });
});
