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

  it("tints a room by its floor or ceiling's share and draws the weakest paths with their tags", () => {
    const room = plan.elements["control"];
    expect(room?.type).toBe("room");
    const path = { rank: 1, dba: 49.3, polyline: [{ x: 1, y: 1, levelId: "ground" }, { x: 6, y: 4, levelId: "ground" }] };
    const { svg } = planToSvg(plan, "ground", {
      title: "T", levelName: "Ground floor", date: "d",
      markup: { colours: { "void^control": "#7a1f3d" }, legend: DEFAULT_LEGEND, subtitle: "s", paths: [path, { ...path, rank: 2, dba: 36 }] },
    });
    expect(svg).toMatch(/<polygon points="[^"]+" fill="#7a1f3d" fill-opacity="0.4"\/>/);
    // Solid for the strongest path, dashed for the next, each with its tag.
    expect((svg.match(/stroke-dasharray="8 5"/g) ?? []).length).toBe(1);
    // The strongest is drawn last, so it stays on top where paths share a stretch.
    expect(svg.lastIndexOf('stroke-width="2.5" stroke-linejoin="round"/>')).toBeGreaterThan(svg.indexOf('stroke-dasharray="8 5"'));
    expect(svg).toContain(">1  49 dBA<");
    expect(svg).toContain(">2  36 dBA<");
    // The names keep a halo once lines run under them.
    expect(svg).toContain('paint-order="stroke"');
  });

  it("escapes text and picks a round scale-bar length", () => {
    const { svg } = planToSvg(plan, "ground", { title: "A <b> & C", levelName: "", date: "" });
    expect(svg).toContain("A &lt;b&gt; &amp; C");
    expect(scaleBarMetres(14)).toBe(2);
    expect(scaleBarMetres(60)).toBe(10);
  });
});
