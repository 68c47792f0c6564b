import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { polygonOverlapM2, turfOverlapM2 } from "./overlap.js";
import { convexClipAreaM2, polygonIsConvex } from "./clip.js";

const p = (x: number, y: number) => ({ x, y });
const rect = (x: number, y: number, w: number, h: number) => [p(x, y), p(x + w, y), p(x + w, y + h), p(x, y + h)];
const lShape = (x: number, y: number) => [p(x, y), p(x + 6, y), p(x + 6, y + 2), p(x + 3, y + 2), p(x + 3, y + 4), p(x, y + 4)];

describe("overlap of plan polygons", () => {
  it("finds 2 m × 4 m where a 4 × 5 room sits offset by (2, 1) over another", () => {
    expect(polygonOverlapM2(rect(0, 0, 4, 5), rect(2, 1, 4, 5))).toBeCloseTo(8, 9);
    expect(turfOverlapM2(rect(0, 0, 4, 5), rect(2, 1, 4, 5))).toBeCloseTo(8, 6);
  });

  it("gives zero for rooms that only touch along a wall", () => {
    expect(polygonOverlapM2(rect(0, 0, 4, 5), rect(4, 0, 4, 5))).toBe(0);
  });

  it("clips a concave L-shape exactly: a 2 × 2 square over its notch corner overlaps 3 m²", () => {
    // The square x 2..4, y 1..3 covers the L except the notch part x 3..4, y 2..3.
    expect(polygonIsConvex(lShape(0, 0))).toBe(false);
    expect(convexClipAreaM2(lShape(0, 0), rect(2, 1, 2, 2))).toBeCloseTo(3, 9);
    expect(polygonOverlapM2(lShape(0, 0), lShape(1, 1))).toBeCloseTo(turfOverlapM2(lShape(0, 0), lShape(1, 1)), 6);
  });

  it("agrees with turf's intersection for random rectangles over an L-shape (property)", () => {
    fc.assert(
      fc.property(
        fc.double({ min: -3, max: 7, noNaN: true }), fc.double({ min: -3, max: 5, noNaN: true }),
        fc.double({ min: 0.5, max: 6, noNaN: true }), fc.double({ min: 0.5, max: 6, noNaN: true }),
        (x, y, w, h) => {
          const r = rect(x, y, w, h);
          expect(polygonOverlapM2(lShape(0, 0), r)).toBeCloseTo(turfOverlapM2(lShape(0, 0), r), 5);
        },
      ),
      { numRuns: 200 },
    );
  });
});
