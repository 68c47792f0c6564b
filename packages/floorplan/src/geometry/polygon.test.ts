import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { polygonAreaM2, polygonCentroid, polygonPerimeterM, polygonSelfIntersections, pointInPolygon, roomVolumeM3 } from "./polygon.js";

const p = (x: number, y: number) => ({ x, y });

describe("planar polygon measures", () => {
  it("gives a 4 m × 5 m room 20.00 m² and 18 m perimeter", () => {
    const room = [p(0, 0), p(4, 0), p(4, 5), p(0, 5)];
    expect(polygonAreaM2(room).toFixed(2)).toBe("20.00");
    expect(polygonPerimeterM(room)).toBeCloseTo(18, 12);
    expect(roomVolumeM3(polygonAreaM2(room), 2.5)).toBeCloseTo(50, 12);
  });

  it("measures an L-shaped room as 6×4 minus the 3×2 notch = 18 m², perimeter 20 m", () => {
    const l = [p(0, 0), p(6, 0), p(6, 2), p(3, 2), p(3, 4), p(0, 4)];
    expect(polygonAreaM2(l)).toBeCloseTo(18, 12);
    expect(polygonPerimeterM(l)).toBeCloseTo(20, 12);
    expect(polygonAreaM2([...l].reverse())).toBeCloseTo(18, 12);
  });

  it("is planar, not geodesic: a room far from the origin keeps its area", () => {
    const room = [p(1000, 500), p(1004, 500), p(1004, 505), p(1000, 505)];
    expect(polygonAreaM2(room)).toBeCloseTo(20, 9);
  });

  it("does not depend on translation (property)", () => {
    fc.assert(
      fc.property(fc.double({ min: -1e4, max: 1e4, noNaN: true }), fc.double({ min: -1e4, max: 1e4, noNaN: true }), (dx, dy) => {
        const l = [p(0, 0), p(6, 0), p(6, 2), p(3, 2), p(3, 4), p(0, 4)].map((q) => p(q.x + dx, q.y + dy));
        expect(polygonAreaM2(l)).toBeCloseTo(18, 6);
      }),
    );
  });

  it("finds the crossing edges of a bow-tie and none in a simple room", () => {
    expect(polygonSelfIntersections([p(0, 0), p(4, 4), p(4, 0), p(0, 4)])).toEqual([[0, 2]]);
    expect(polygonSelfIntersections([p(0, 0), p(6, 0), p(6, 2), p(3, 2), p(3, 4), p(0, 4)])).toEqual([]);
  });

  it("flags an outline that folds back on itself", () => {
    expect(polygonSelfIntersections([p(0, 0), p(4, 0), p(2, 0), p(2, 3)]).length).toBeGreaterThan(0);
  });

  it("locates points and the centroid", () => {
    const l = [p(0, 0), p(6, 0), p(6, 2), p(3, 2), p(3, 4), p(0, 4)];
    expect(pointInPolygon(p(1, 3), l)).toBe(true);
    expect(pointInPolygon(p(5, 3), l)).toBe(false);
    const c = polygonCentroid([p(0, 0), p(4, 0), p(4, 2), p(0, 2)]);
    expect(c.x).toBeCloseTo(2, 12);
    expect(c.y).toBeCloseTo(1, 12);
  });
});
