import { describe, expect, it } from "vitest";
import { snapPoint } from "./snap.js";
import { twoRoomPlan } from "../../test/two-rooms.js";

const plan = twoRoomPlan();
const opts = { levelId: "ground", gridM: 0.5, toleranceM: 0.2 };

describe("snapPoint", () => {
  it("snaps to a nearby corner before anything else", () => {
    const s = snapPoint(plan, { x: 4.1, y: 2.9 }, opts);
    expect(s.kind).toBe("vertex");
    expect(s.point).toEqual({ x: 4, y: 3 });
  });

  it("snaps onto a wall line and reports the line", () => {
    const s = snapPoint(plan, { x: 2.13, y: 3.12 }, opts);
    expect(s.kind).toBe("edge");
    expect(s.point.y).toBeCloseTo(3);
    expect(s.point.x).toBeCloseTo(2.13);
    expect(s.guide).toBeDefined();
  });

  it("falls back to the grid away from walls", () => {
    const s = snapPoint(plan, { x: 10.3, y: 7.8 }, opts);
    expect(s).toMatchObject({ kind: "grid", point: { x: 10.5, y: 8 } });
  });

  it("locks the direction perpendicular to a wall when drawing from a point", () => {
    const s = snapPoint(plan, { x: 10.05, y: 6.6 }, { ...opts, from: { x: 10, y: 5 }, gridM: 0 });
    expect(["perpendicular", "parallel"]).toContain(s.kind);
    expect(s.point.x).toBeCloseTo(10);
  });

  it("locks parallel to a slanted wall", () => {
    const slanted = { ...plan, elements: { ...plan.elements, w: { type: "wall" as const, id: "w", levelId: "ground", start: { x: 20, y: 0 }, end: { x: 23, y: 3 }, constructionId: "c", thicknessM: 0.1 } } };
    const s = snapPoint(slanted, { x: 32.05, y: 12 }, { ...opts, gridM: 0, from: { x: 30, y: 10 } });
    expect(s.kind).toBe("parallel");
    expect(s.point.x - 30).toBeCloseTo(s.point.y - 10, 6);
  });

  it("is off when disabled", () => {
    const raw = { x: 4.1, y: 2.9 };
    expect(snapPoint(plan, raw, { ...opts, disabled: true })).toEqual({ point: raw, kind: "none" });
  });
});
