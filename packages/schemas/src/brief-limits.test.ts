import { describe, expect, it } from "vitest";
import { mergeSearchLimits, searchLimitsOfBrief } from "./brief-limits.js";
import { briefSchema } from "./intake.js";

describe("limits from the brief", () => {
  it("takes the budget and only the flags the client accepts", () => {
    const brief = briefSchema.parse({ budget: { amount: 4200, currency: "EUR" }, accepts: { daylight: false, ventilation: true, doorLook: true } });
    expect(searchLimitsOfBrief(brief)).toEqual({ budget: 4200, allowedFlags: ["reduces-ventilation", "changes-appearance"] });
  });

  it("sets no budget when none is agreed, and allows no flags by default", () => {
    expect(searchLimitsOfBrief(briefSchema.parse({}))).toEqual({ allowedFlags: [] });
  });

  it("lets the planner's own limits win", () => {
    const merged = mergeSearchLimits({ budget: 900, labourHours: 12, allowedFlags: undefined }, { budget: 4200, allowedFlags: ["structural-work"] });
    expect(merged).toEqual({ budget: 900, labourHours: 12, allowedFlags: ["structural-work"] });
  });
});
