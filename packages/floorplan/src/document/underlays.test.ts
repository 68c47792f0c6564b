import { describe, expect, it } from "vitest";
import { emptyPlan } from "./empty-plan.js";
import { parsePlan } from "./parse.js";
import { serializePlan } from "./serialize.js";

const underlay = { id: "u1", fileId: "0b6f0d8e-1111-4c2b-9a55-9b2f7f0c1a01", levelId: "level-0", widthPx: 800, heightPx: 600, origin: { x: 0, y: 6 }, scaleMPerPx: 0.01 };

describe("underlays in the plan document", () => {
  it("are optional: a plan without them parses and serializes without the key", () => {
    const plan = emptyPlan({ id: "p", name: "P" });
    expect(plan.underlays).toBeUndefined();
    expect(serializePlan(plan)).not.toContain("underlays");
  });

  it("fill their defaults (not rotated, half see-through, unlocked, shown, not yet calibrated)", () => {
    const result = parsePlan({ ...emptyPlan({ id: "p", name: "P" }), underlays: [underlay] });
    expect(result.ok).toBe(true);
    if (!result.ok) return;
    expect(result.plan.underlays?.[0]).toMatchObject({ rotationDeg: 0, opacity: 0.5, locked: false, visible: true, calibrated: false, name: "" });
  });

  it("serialize the same text for the same placement, whatever the key order", () => {
    const a = parsePlan({ ...emptyPlan({ id: "p", name: "P" }), underlays: [underlay] });
    const reordered = Object.fromEntries(Object.entries(underlay).reverse());
    const b = parsePlan({ ...emptyPlan({ id: "p", name: "P" }), underlays: [reordered] });
    expect(a.ok && b.ok).toBe(true);
    if (a.ok && b.ok) expect(serializePlan(a.plan)).toBe(serializePlan(b.plan));
  });

  it("refuse a zero scale, an opacity above 1 and two underlays with one id", () => {
    const base = emptyPlan({ id: "p", name: "P" });
    for (const bad of [[{ ...underlay, scaleMPerPx: 0 }], [{ ...underlay, opacity: 1.5 }], [underlay, { ...underlay }]]) {
      const result = parsePlan({ ...base, underlays: bad });
      expect(result.ok).toBe(false);
      if (!result.ok) expect(result.problems[0]!.message).toMatch(/underlays/);
    }
  });
});
