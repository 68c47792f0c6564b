import { describe, expect, it } from "vitest";
import { fernhollowStudioPlan } from "@hushmark/floorplan";
import { planToSvg, scaleBarMetres, DEFAULT_LEGEND } from "./plan-svg";

describe("plan export", () => {
  const plan = fernhollowStudioPlan();

  it("draws the level with its rooms, doors, title block and scale bar", () => {
    const { svg, width, height } = planToSvg(plan, "ground", { title: "Fernhollow Audio", levelName: "Ground floor", date: "1 Dec 2026" });
    expect(svg.startsWith("<svg")).toBe(true);
    expect(width).toBeGreaterThan(640);
    expect(height).toBeGreaterThan(300);
    expect(svg).toContain("Control room");
    expect(svg).toContain("Recording room");
    expect(svg).not.toContain("Dance school");
    expect(svg).toContain("Fernhollow Audio");
    expect(svg).toContain('data-part="scale-bar"');
    // Doors are drawn with a swing arc.
    expect((svg.match(/ A[\d.]+,[\d.]+ 0 0 [01] /g) ?? []).length).toBe(2);
    expect(svg).not.toContain('data-part="legend"');
  });

  it("adds the legend, the analysis colours and a north arrow when asked", () => {
    const { svg } = planToSvg(plan, "ground", {
      title: "T", levelName: "Ground floor", date: "d", north: true,
      markup: { colours: { "door-studio": "#7a1f3d" }, legend: DEFAULT_LEGEND, subtitle: "Café → Control room" },
    });
    expect(svg).toContain('data-part="legend"');
    expect(svg).toContain('data-part="north"');
    expect(svg).toContain('fill="#7a1f3d"');
    expect(svg).toContain("Café → Control room");
  });

  it("escapes text and picks a round scale-bar length", () => {
    const { svg } = planToSvg(plan, "ground", { title: "A <b> & C", levelName: "", date: "" });
    expect(svg).toContain("A &lt;b&gt; &amp; C");
    expect(scaleBarMetres(14)).toBe(2);
    expect(scaleBarMetres(60)).toBe(10);
  });
});
