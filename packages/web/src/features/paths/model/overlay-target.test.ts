import { describe, expect, it } from "vitest";
import { solveNetwork, parseNetwork } from "@hushmark/acoustics";
import { buildNetwork, constructionCatalogue, fernhollowStudioPlan, mapResultToPlan, sourceSpectrum } from "@hushmark/floorplan";
import { overlayTarget } from "./overlay-target";

// A fixture built the way the server builds an analysis: plan → network → engine solve → plan result.
function fixture() {
  const plan = fernhollowStudioPlan();
  const levels = sourceSpectrum("machinery-hum")!.levelsDb;
  const built = buildNetwork(plan, constructionCatalogue, { sources: [{ type: "airborne", spaceId: "back", levelsDb: [...levels] }] });
  if (!built.ok) throw new Error(built.problems.map((p) => p.message).join("; "));
  const parsed = parseNetwork(built.network);
  if (!parsed.ok) throw new Error("network did not parse");
  const solved = solveNetwork(parsed.value, { receiver: "record", k: 5 });
  return { plan, result: mapResultToPlan(plan, built, solved) };
}

describe("Paths overlay targets", () => {
  const { plan, result } = fixture();

  it("finds a drawing for every element carrying real sound, except flanking junctions", () => {
    const significant = result.elements.filter((e) => e.share >= 0.01 && e.kind !== "flanking");
    expect(significant.length).toBeGreaterThan(2);
    for (const e of significant) expect({ id: e.elementId, target: overlayTarget(plan, e.elementId) }).not.toMatchObject({ target: null });
  });

  it("colours the shared duct, the party wall, and the ceilings over the rooms", () => {
    const targets = new Map(result.elements.map((e) => [e.elementId, overlayTarget(plan, e.elementId)]));
    expect(targets.get("supply-duct")).toBe("duct");
    expect([...targets.values()]).toContain("wall");
    expect([...targets.values()]).toContain("floor");
  });

  it("knows nothing of ids the plan does not have", () => {
    expect(overlayTarget(plan, "no-such-thing")).toBeNull();
    expect(overlayTarget(plan, "x^y")).toBeNull();
  });
});
