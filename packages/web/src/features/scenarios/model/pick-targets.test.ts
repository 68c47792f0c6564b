import { describe, expect, it } from "vitest";
import { parseNetwork, solveNetwork } from "@hushmark/acoustics";
import { hitTest, selectionFor } from "@hushmark/editor-core";
import { buildNetwork, constructionCatalogue, elementsOfType, fernhollowStudioPlan, mapResultToPlan, polygonCentroid, sourceSpectrum, type Point } from "@hushmark/floorplan";
import { openingSpan, wallBands } from "../../editor/model/wall-geometry";
import { pickTargets } from "./pick-targets";

// The weak links as the Options screen gets them: plan → network → engine solve → plan result.
function fixture() {
  const plan = fernhollowStudioPlan();
  const levels = sourceSpectrum("speech-raised")!.levelsDb;
  const built = buildNetwork(plan, constructionCatalogue, { sources: [{ type: "airborne", spaceId: "cafe", levelsDb: [...levels] }] });
  if (!built.ok) throw new Error(built.problems.map((p) => p.message).join("; "));
  const parsed = parseNetwork(built.network);
  if (!parsed.ok) throw new Error("network did not parse");
  return { plan, elements: mapResultToPlan(plan, built, solveNetwork(parsed.value, { receiver: "record", k: 1 })).elements };
}

describe("picking an element to upgrade on the plan", () => {
  const { plan, elements } = fixture();
  // What the read-only canvas selects for a click at p (the Inspect tool's own rule).
  const click = (levelId: string, p: Point) => {
    const hit = hitTest(plan, levelId, p, 0.15);
    return hit ? selectionFor(plan, hit, p) : null;
  };

  it("a click on a door picks that door's weak link", () => {
    const door = elementsOfType(plan, "door").find((d) => elements.some((e) => e.elementId === d.id))!;
    const span = openingSpan(plan, door)!;
    const picked = click(span.levelId, { x: (span.start.x + span.end.x) / 2, y: (span.start.y + span.end.y) / 2 });
    expect(picked).toBe(door.id);
    expect(pickTargets(elements, plan, picked).map((e) => e.elementId)).toEqual([door.id]);
  });

  it("a click on a wall away from its openings picks the wall part there", () => {
    const band = wallBands(plan).find((b) => elements.some((e) => e.elementId === b.id && e.kind !== "flanking") && b.roomIds.length === 2)!;
    // A quarter along, where the demo plan's walls have no door or window.
    const candidates = [0.15, 0.25, 0.35, 0.65, 0.75, 0.85].map((t) => ({ x: band.start.x + (band.end.x - band.start.x) * t, y: band.start.y + (band.end.y - band.start.y) * t }));
    const picks = candidates.map((p) => click(band.levelId, p));
    expect(picks).toContain(band.id);
    expect(pickTargets(elements, plan, band.id)[0]?.elementId).toBe(band.id);
  });

  it("a click inside a room picks its floors and ceilings, and nothing that only flanks", () => {
    const room = elementsOfType(plan, "room").find((r) => r.id === "record")!;
    const c = polygonCentroid(room.outline);
    // Off the centre, where the demo's measurement pin sits.
    const picked = [0.6, 0.9, 1.2].map((d) => click(room.levelId, { x: c.x + d, y: c.y - d })).find((id) => id === "record") ?? null;
    expect(picked).toBe("record");
    const targets = pickTargets(elements, plan, picked);
    for (const t of targets) expect(t.elementId.split("^")).toContain("record");
    expect(targets.length).toBeGreaterThan(0);
    expect(targets.every((t) => t.kind !== "flanking")).toBe(true);
    expect(targets.length).toBe(elements.filter((e) => e.kind !== "flanking" && e.elementId.includes("^") && e.elementId.split("^").includes("record")).length);
  });

  it("picks nothing for an empty click or an id not on the plan", () => {
    expect(pickTargets(elements, plan, null)).toEqual([]);
    expect(pickTargets(elements, plan, "no-such-thing")).toEqual([]);
  });
});
