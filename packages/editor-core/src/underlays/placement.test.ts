import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { calibrateUnderlay, calibrateUnderlayTyped, normalDeg, rotateUnderlayAbout, squaringTurnDeg, underlayCorners, underlayPixelToPlan, underlayPlanToPixel, type UnderlayPlacement } from "./placement.js";

const placed: UnderlayPlacement = { origin: { x: 2, y: 9 }, scaleMPerPx: 0.02, rotationDeg: 30 };

describe("underlay placement", () => {
  it("puts the top-left pixel at the origin and runs the image's x axis along the rotation", () => {
    expect(underlayPixelToPlan(placed, 0, 0)).toEqual({ x: 2, y: 9 });
    const p = underlayPixelToPlan(placed, 100, 0); // 100 px × 0.02 m = 2 m along 30°
    expect(p.x).toBeCloseTo(2 + 2 * Math.cos(Math.PI / 6), 9);
    expect(p.y).toBeCloseTo(9 + 2 * Math.sin(Math.PI / 6), 9);
  });

  it("draws an unturned image downwards from its origin, since image rows count down and plan y counts up", () => {
    const corners = underlayCorners({ origin: { x: 0, y: 6 }, scaleMPerPx: 0.01, rotationDeg: 0, widthPx: 800, heightPx: 600 });
    expect(corners.map((c) => [Number(c.x.toFixed(9)), Number(c.y.toFixed(9))])).toEqual([[0, 6], [8, 6], [8, 0], [0, 0]]);
  });

  it("plan → pixel undoes pixel → plan for any placement", () => {
    fc.assert(fc.property(
      fc.double({ min: -50, max: 50, noNaN: true }), fc.double({ min: -50, max: 50, noNaN: true }), fc.double({ min: 1e-4, max: 1, noNaN: true }),
      fc.double({ min: -180, max: 180, noNaN: true }), fc.double({ min: 0, max: 5000, noNaN: true }), fc.double({ min: 0, max: 5000, noNaN: true }),
      (ox, oy, scaleMPerPx, rotationDeg, u, v) => {
        const p = { origin: { x: ox, y: oy }, scaleMPerPx, rotationDeg };
        const back = underlayPlanToPixel(p, underlayPixelToPlan(p, u, v));
        expect(back.u).toBeCloseTo(u, 5);
        expect(back.v).toBeCloseTo(v, 5);
      },
    ));
  });
});

describe("calibrating an underlay", () => {
  it("gives the picked pixels the typed distance and keeps the first point in place", () => {
    const a = underlayPixelToPlan(placed, 100, 200), b = underlayPixelToPlan(placed, 500, 500); // 500 px apart (3-4-5)
    const result = calibrateUnderlay(placed, a, b, 4);
    expect(result.ok).toBe(true);
    if (!result.ok) return;
    expect(result.placement.scaleMPerPx).toBeCloseTo(4 / 500, 12);
    expect(result.placement.rotationDeg).toBe(30);
    const a2 = underlayPixelToPlan(result.placement, 100, 200), b2 = underlayPixelToPlan(result.placement, 500, 500);
    expect(a2.x).toBeCloseTo(a.x, 9);
    expect(a2.y).toBeCloseTo(a.y, 9);
    expect(Math.hypot(b2.x - a2.x, b2.y - a2.y)).toBeCloseTo(4, 9);
  });

  it("reads the distance in feet and inches", () => {
    const a = underlayPixelToPlan(placed, 0, 0), b = underlayPixelToPlan(placed, 1000, 0);
    const result = calibrateUnderlayTyped(placed, a, b, `10' 6"`, "imperial");
    expect(result.ok && result.placement.scaleMPerPx * 1000).toBeCloseTo(10.5 * 0.3048, 9); // 1 ft = 0.3048 m exactly (international foot)
  });

  it("refuses points on top of each other, a zero distance and text that is not a length", () => {
    const a = underlayPixelToPlan(placed, 10, 10);
    expect(calibrateUnderlay(placed, a, a, 3)).toMatchObject({ ok: false, message: expect.stringMatching(/too close/) });
    const b = underlayPixelToPlan(placed, 400, 10);
    expect(calibrateUnderlay(placed, a, b, 0)).toMatchObject({ ok: false });
    expect(calibrateUnderlayTyped(placed, a, b, "about four", "metric")).toMatchObject({ ok: false, message: expect.stringMatching(/420 cm/) });
  });
});

describe("squaring an underlay", () => {
  it("finds the smallest turn that lays a picked line along the grid", () => {
    expect(squaringTurnDeg({ x: 0, y: 0 }, { x: 10, y: 1 })).toBeCloseTo(-5.710593, 5); // atan(0.1) = 5.7106°
    expect(squaringTurnDeg({ x: 0, y: 0 }, { x: -10, y: -1 })).toBeCloseTo(-5.710593, 5);
    expect(squaringTurnDeg({ x: 0, y: 0 }, { x: 1, y: 10 })).toBeCloseTo(5.710593, 5);
    expect(squaringTurnDeg({ x: 0, y: 0 }, { x: 0, y: 3 })).toBe(0);
  });

  it("turns about the pivot, which stays put, and keeps the angle within a half turn", () => {
    const pivot = underlayPixelToPlan(placed, 300, 100);
    const turned = rotateUnderlayAbout(placed, pivot, 170);
    expect(turned.rotationDeg).toBe(-160);
    const again = underlayPixelToPlan(turned, 300, 100);
    expect(again.x).toBeCloseTo(pivot.x, 9);
    expect(again.y).toBeCloseTo(pivot.y, 9);
    expect(normalDeg(540)).toBe(180);
    expect(normalDeg(-180)).toBe(180);
  });
});
