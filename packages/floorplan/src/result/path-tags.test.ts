import { describe, expect, it } from "vitest";
import { overlaps } from "./label-grid.js";
import { placePathTags, pointAlongPolyline } from "./path-tags.js";

describe("path tags", () => {
  it("finds points along a polyline by length", () => {
    const line = [{ x: 0, y: 0 }, { x: 10, y: 0 }, { x: 10, y: 30 }];
    expect(pointAlongPolyline(line, 0)).toEqual({ x: 0, y: 0 });
    expect(pointAlongPolyline(line, 0.25)).toEqual({ x: 10, y: 0 });
    expect(pointAlongPolyline(line, 0.5)).toEqual({ x: 10, y: 10 });
    expect(pointAlongPolyline(line, 1)).toEqual({ x: 10, y: 30 });
  });

  it("keeps tags off room names and off each other, and keeps the middle when nothing else is free", () => {
    const across = [{ x: 0, y: 100 }, { x: 400, y: 100 }];
    // A room name sits where the first tag would go at the middle of the line.
    const name = { x: 190, y: 60, w: 120, h: 40 };
    const tags = placePathTags([
      { rank: 1, points: across, w: 70, h: 22 },
      { rank: 2, points: across, w: 70, h: 22 },
    ], [name]);
    const one = tags.get(1)!, two = tags.get(2)!;
    expect(overlaps(one, name)).toBe(false);
    expect(overlaps(two, name)).toBe(false);
    expect(overlaps(one, two)).toBe(false);
    // Both still beside their line: above it, within its length.
    for (const b of [one, two]) {
      expect(b.y + b.h).toBeLessThanOrEqual(100);
      expect(b.x).toBeGreaterThanOrEqual(0);
      expect(b.x + b.w).toBeLessThanOrEqual(400);
    }

    const blocked = placePathTags([{ rank: 1, points: across, w: 70, h: 22 }], [{ x: -100, y: -100, w: 700, h: 300 }]);
    expect(blocked.get(1)).toEqual({ x: 206, y: 74, w: 70, h: 22 });
  });
});
