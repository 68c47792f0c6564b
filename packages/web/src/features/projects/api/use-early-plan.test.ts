import { describe, expect, it } from "vitest";
import { planProjectFor } from "./use-early-plan";

describe("planProjectFor", () => {
  it("finds the project of the sections that draw the plan", () => {
    expect(planProjectFor("/projects/p-1/sketch")).toBe("p-1");
    expect(planProjectFor("/projects/p-2/paths")).toBe("p-2");
  });

  it("leaves other pages alone", () => {
    expect(planProjectFor("/projects/p-1/brief")).toBeNull();
    expect(planProjectFor("/projects")).toBeNull();
    expect(planProjectFor("/price-book")).toBeNull();
  });
});
