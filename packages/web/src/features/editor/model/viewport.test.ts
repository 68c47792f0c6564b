import { describe, expect, it } from "vitest";
import { fitBounds, toPlan, toScreen, zoomAt, MAX_SCALE } from "./viewport";

describe("viewport", () => {
  it("maps plan to screen and back with north up", () => {
    const v = { scale: 40, ox: 100, oy: 500 };
    expect(toScreen(v, 2, 3)).toEqual({ x: 180, y: 380 });
    expect(toPlan(v, 180, 380)).toEqual({ x: 2, y: 3 });
  });

  it("zooms about the pointer: the plan point under it stays put", () => {
    const v = { scale: 40, ox: 100, oy: 500 };
    const before = toPlan(v, 300, 200);
    const z = zoomAt(v, 1.7, 300, 200);
    const after = toPlan(z, 300, 200);
    expect(after.x).toBeCloseTo(before.x, 9);
    expect(after.y).toBeCloseTo(before.y, 9);
    expect(zoomAt(v, 1e6, 0, 0).scale).toBe(MAX_SCALE);
  });

  it("fits a plan inside the box with a margin, centred", () => {
    const v = fitBounds({ minX: 0, minY: 0, maxX: 20, maxY: 10 }, 1000, 600, 50);
    expect(v.scale).toBe(45);
    const centre = toScreen(v, 10, 5);
    expect(centre).toEqual({ x: 500, y: 300 });
    // On a phone-sized canvas the margin shrinks to a tenth of the short side.
    expect(fitBounds({ minX: 0, minY: 0, maxX: 20, maxY: 10 }, 360, 160, 48).scale).toBeCloseTo(12.8); // (160 − 2 × 16) / 10 m, against 6.4 with the full margin
    const empty = fitBounds(null, 800, 600);
    expect(toScreen(empty, 4, 3).x).toBeCloseTo(400);
  });
});
