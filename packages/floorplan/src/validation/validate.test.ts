import { describe, expect, it } from "vitest";
import { constructionCatalogue } from "../catalogue/catalogue.js";
import { groundLevel, planWith, rect } from "../../test/plan-fixtures.js";
import { planIsAnalysable, validatePlan } from "./validate.js";
import { PROBLEM_CODES } from "./codes.js";

const room = (id: string, x: number, y: number, w: number, h: number, extra: Record<string, unknown> = {}) => ({
  type: "room" as const, id, levelId: "L0", name: id, use: "office" as const, outline: rect(id, x, y, w, h),
  finish: { kind: "rt60" as const, rt60S: 0.5 }, ...extra,
});
const door = (id: string, wallRef: string, offsetM: number, widthM: number, extra: Record<string, unknown> = {}) => ({
  type: "door" as const, id, name: id, wallRef, offsetM, widthM, heightM: 2.0, constructionId: "door-solid-core-sealed", ...extra,
});
const codes = (els: Parameters<typeof planWith>[0], extra = {}) => validatePlan(planWith(els, extra), constructionCatalogue);
const only = (els: Parameters<typeof planWith>[0], code: string) => codes(els).filter((p) => p.code === code);

describe("validatePlan", () => {
  it("passes a clean two-room plan with a door in the shared wall", () => {
    const problems = codes([groundLevel, room("A", 0, 0, 4, 5), room("B", 4, 0, 4, 5), door("D", "A:Ab", 1, 0.9)]);
    expect(problems).toEqual([]);
    expect(planIsAnalysable(problems)).toBe(true);
  });

  it("reports rooms overlapping on one level with the overlap area", () => {
    const [p] = only([groundLevel, room("A", 0, 0, 4, 5), room("B", 3, 0, 4, 5)], "rooms-overlap");
    expect(p?.severity).toBe("error");
    expect(p?.message).toContain("overlap by 5.0 m²");
    expect(p?.suggestion).toMatch(/shared wall/);
  });

  it("reports a door wider than its wall, in the plan's display unit", () => {
    const els = [groundLevel, room("A", 0, 0, 0.8, 5), door("D", "A:Aa", 0, 0.9)];
    const [p] = only(els, "opening-wider-than-wall");
    expect(p?.elementId).toBe("D");
    expect(p?.message).toBe("Door “D” is 0.90 m wide but its wall is only 0.80 m long.");
    const imperial = validatePlan(planWith(els, { displayUnit: "imperial" }), constructionCatalogue).find((x) => x.code === "opening-wider-than-wall");
    expect(imperial?.message).toBe(`Door “D” is 2' 11" wide but its wall is only 2' 7" long.`);
  });

  it("reports an opening running past the end of its wall, and one on a wall that is gone", () => {
    expect(only([groundLevel, room("A", 0, 0, 4, 5), door("D", "A:Aa", 3.5, 0.9)], "opening-outside-wall")).toHaveLength(1);
    expect(only([groundLevel, room("A", 0, 0, 4, 5), door("D", "A:Azz", 0, 0.9)], "opening-on-missing-wall")).toHaveLength(1);
  });

  it("reports a door spanning both a shared and an exterior stretch of one edge as outside its wall", () => {
    // B shares only y 0..2 of A's east edge; a door at 1.5..2.5 straddles the end of the shared wall.
    const els = [groundLevel, room("A", 0, 0, 4, 4), room("B", 4, 0, 4, 2), door("D", "A:Ab", 1.5, 1.0)];
    expect(only(els, "opening-outside-wall")).toHaveLength(1);
  });

  it("reports zero-area and self-intersecting rooms", () => {
    const flat = { ...room("Z", 0, 0, 4, 5), outline: [{ id: "a", x: 0, y: 0 }, { id: "b", x: 4, y: 0 }, { id: "c", x: 8, y: 0 }] };
    const bow = { ...room("X", 0, 0, 4, 5), outline: [{ id: "a", x: 0, y: 0 }, { id: "b", x: 4, y: 4 }, { id: "c", x: 4, y: 0 }, { id: "d", x: 0, y: 4 }] };
    const problems = codes([groundLevel, flat, bow]);
    expect(problems.find((p) => p.code === "room-zero-area")?.elementId).toBe("Z");
    const x = problems.find((p) => p.code === "room-self-intersecting");
    expect(x?.elementId).toBe("X");
    expect(x?.message).toContain("crosses itself");
  });

  it("reports a vent joined to nothing and a duct to a missing grille", () => {
    const vent = { type: "vent" as const, id: "G1", spaceId: "A", mount: "ceiling" as const, position: { x: 1, y: 1 }, openAreaM2: 0.04 };
    const lone = only([groundLevel, room("A", 0, 0, 4, 5), vent], "vent-unconnected");
    expect(lone[0]?.message).toMatch(/not joined to any duct/);
    const duct = { type: "duct" as const, id: "K", fromVentId: "G1", toVentId: "G9", lengthM: 4, lining: "bare" as const };
    const problems = codes([groundLevel, room("A", 0, 0, 4, 5), vent, duct]);
    expect(problems.filter((p) => p.code === "vent-unconnected")).toHaveLength(0);
    expect(problems.find((p) => p.code === "duct-missing-vent")?.message).toContain("G9");
  });

  it("reports an unknown construction by the element that uses it", () => {
    const [p] = only([groundLevel, room("A", 0, 0, 4, 5), door("D", "A:Aa", 1, 0.9, { constructionId: "door-made-up" })], "unknown-construction");
    expect(p?.elementId).toBe("D");
    expect(p?.message).toContain("door-made-up");
  });

  it("reports a level without height", () => {
    const [p] = only([{ ...groundLevel, heightM: undefined }, room("A", 0, 0, 4, 5)], "level-without-height");
    expect(p?.elementId).toBe("L0");
    expect(p?.severity).toBe("error");
  });

  it("keeps warnings (un-surveyed neighbour, assumed finish) analysable", () => {
    const bare = { ...room("A", 0, 0, 4, 5), finish: undefined };
    const neighbour = { type: "neighbour" as const, id: "N", name: "Next-door shop" };
    const problems = validatePlan(planWith([groundLevel, bare, neighbour], { wallSettings: { "A:Ab|0": { faces: { kind: "neighbour", neighbourId: "N" } } } }), constructionCatalogue);
    expect(problems.map((p) => p.code).sort()).toEqual(["finish-assumed", "neighbour-unsurveyed"]);
    expect(problems.every((p) => p.severity === "warning")).toBe(true);
    expect(planIsAnalysable(problems)).toBe(true);
  });

  it("warns about settings kept for a wall that was redrawn away", () => {
    const problems = validatePlan(planWith([groundLevel, room("A", 0, 0, 4, 5)], { wallSettings: { "A:Ab|B:Bd": { constructionId: "masonry-brick-100" } } }), constructionCatalogue);
    expect(problems.map((p) => p.code)).toEqual(["wall-setting-orphaned"]);
  });

  it("gives every emitted problem a severity matching its code table", () => {
    const problems = codes([groundLevel, room("A", 0, 0, 4, 5), room("B", 3, 0, 4, 5), door("D", "A:Aa", 3.5, 0.9, { constructionId: "nope" })]);
    expect(problems.length).toBeGreaterThan(2);
    for (const p of problems) expect(p.severity).toBe(PROBLEM_CODES[p.code as keyof typeof PROBLEM_CODES]);
    expect(problems[0]!.severity).toBe("error");
  });
});
