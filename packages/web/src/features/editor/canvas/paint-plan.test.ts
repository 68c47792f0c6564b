import { describe, expect, it } from "vitest";
import { fernhollowStudioPlan } from "@hushmark/floorplan";
import { UNDERLAY_FILL_ALPHA, paintPlan } from "./paint-plan";
import { ink, roomFill } from "./colours";

/** A 2D context recording the colour and opacity of every fill and stroke. */
function recordingContext(): { ctx: CanvasRenderingContext2D; fills: { style: string; alpha: number }[]; strokes: { style: string; alpha: number }[] } {
  const fills: { style: string; alpha: number }[] = [];
  const strokes: { style: string; alpha: number }[] = [];
  const saved: number[] = [];
  const state: Record<string, unknown> = { globalAlpha: 1, fillStyle: "#000", strokeStyle: "#000" };
  state.fill = () => fills.push({ style: String(state.fillStyle), alpha: Number(state.globalAlpha) });
  state.stroke = () => strokes.push({ style: String(state.strokeStyle), alpha: Number(state.globalAlpha) });
  state.save = () => saved.push(Number(state.globalAlpha));
  state.restore = () => { state.globalAlpha = saved.pop() ?? 1; };
  const ctx = new Proxy(state, { get: (o, key: string) => (key in o ? o[key] : () => undefined) });
  return { ctx: ctx as unknown as CanvasRenderingContext2D, fills, strokes };
}

const studioFill = roomFill("studio");

describe("room fills over a traced drawing", () => {
  it("are opaque on a level without an underlay", () => {
    const { ctx, fills } = recordingContext();
    paintPlan(ctx, { plan: fernhollowStudioPlan(), levelId: "ground", scale: 40 });
    const rooms = fills.filter((f) => f.style === studioFill);
    expect(rooms.length).toBeGreaterThan(0);
    expect(rooms.every((f) => f.alpha === 1)).toBe(true);
  });

  it("are faint over a visible underlay, while walls stay solid ink", () => {
    const { ctx, fills, strokes } = recordingContext();
    paintPlan(ctx, { plan: fernhollowStudioPlan(), levelId: "ground", scale: 40, overUnderlay: true });
    const rooms = fills.filter((f) => f.style === studioFill);
    expect(rooms.length).toBeGreaterThan(0);
    expect(rooms.every((f) => f.alpha === UNDERLAY_FILL_ALPHA)).toBe(true);
    expect(UNDERLAY_FILL_ALPHA).toBeLessThan(0.5);
    // The walls, drawn after the fills, are back at full strength.
    const walls = strokes.filter((st) => st.style === ink);
    expect(walls.length).toBeGreaterThan(0);
    expect(walls.every((st) => st.alpha === 1)).toBe(true);
  });
});
