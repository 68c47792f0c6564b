import { fernhollowStudioPlan } from "@hushmark/floorplan";
import { describe, expect, it } from "vitest";
import { parseBands } from "../../verify/verify-section";
import { defaultSetup, planSpaces } from "./setup-fields";

describe("the Options setup", () => {
  const plan = fernhollowStudioPlan() as unknown as Record<string, unknown>;

  it("listens in the room with a target and starts the noise in the café", () => {
    const setup = defaultSetup(plan, 3)!;
    expect(setup.receiverId).toBe("control");
    expect(setup.source).toMatchObject({ kind: "airborne", spaceId: "cafe" });
    expect(setup.target).toEqual({ kind: "nc", nc: 25 });
    expect(setup.planVersion).toBe(3);
  });

  it("offers every room, void and neighbour, and the outdoors", () => {
    const ids = planSpaces(plan).map((s) => s.id);
    expect(ids).toEqual(expect.arrayContaining(["control", "record", "cafe", "back", "plenum", "stair", "outdoors"]));
    expect(ids).not.toContain("door-studio");
  });
});

describe("typed band levels for Verify", () => {
  it("reads 21 numbers separated by commas, spaces or lines", () => {
    const text = Array.from({ length: 21 }, (_, i) => 40 - i).join(", ").replace(/, 30/, "\n30");
    expect(parseBands(text)).toHaveLength(21);
  });
  it("says what is wrong otherwise", () => {
    expect(parseBands("1 2 3")).toMatch(/you gave 3/);
    expect(parseBands(`${"40 ".repeat(20)}loud`)).toMatch(/numbers only/);
  });
});
