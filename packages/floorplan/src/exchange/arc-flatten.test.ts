import { describe, expect, it } from "vitest";
import { arcPoints, arcSegmentCount, bulgePoints, bulgeSegmentAreaM2 } from "./arc-flatten.js";

describe("arc flattening", () => {
  it("keeps every chord within the tolerance of the arc, with no more chords than needed", () => {
    for (const r of [0.05, 0.5, 2, 15, 120]) {
      for (const sweep of [0.3, Math.PI / 2, Math.PI, 2 * Math.PI]) {
        for (const tol of [0.0005, 0.005, 0.02]) {
          const pts = arcPoints({ x: 1, y: -2 }, r, 0.4, sweep, tol);
          let worst = 0;
          for (let i = 1; i < pts.length; i++) {
            const m = { x: (pts[i - 1]!.x + pts[i]!.x) / 2, y: (pts[i - 1]!.y + pts[i]!.y) / 2 };
            worst = Math.max(worst, r - Math.hypot(m.x - 1, m.y + 2));
          }
          expect(worst, `r ${r} sweep ${sweep} tol ${tol}`).toBeLessThanOrEqual(tol + 1e-12);
          // One chord fewer would break the tolerance (unless a single chord already meets it).
          const n = pts.length - 1;
          if (n > 1) expect(r * (1 - Math.cos(sweep / (n - 1) / 2))).toBeGreaterThan(tol);
        }
      }
    }
  });

  it("never asks for endless chords for a zero or negative tolerance", () => {
    expect(arcSegmentCount(1, Math.PI, 0)).toBeGreaterThan(100);
    expect(Number.isFinite(arcSegmentCount(1, Math.PI, -1))).toBe(true);
    expect(arcPoints({ x: 0, y: 0 }, 1, 0, Math.PI, -1).length).toBeGreaterThan(2);
  });

  it("bulges the DXF way: +1 is a counter-clockwise half circle, ends exact", () => {
    const pts = bulgePoints({ x: 0, y: 0 }, { x: 2, y: 0 }, 1, 0.001);
    expect(pts[pts.length - 1]).toEqual({ x: 2, y: 0 });
    // Counter-clockwise from (0, 0) to (2, 0) about (1, 0) passes below the chord.
    expect(Math.min(...pts.map((p) => p.y))).toBeCloseTo(-1, 5);
    const neg = bulgePoints({ x: 0, y: 0 }, { x: 2, y: 0 }, -1, 0.001);
    expect(Math.max(...neg.map((p) => p.y))).toBeCloseTo(1, 5);
    // Half a unit circle: π/2 m².
    expect(bulgeSegmentAreaM2(2, 1)).toBeCloseTo(Math.PI / 2, 12);
  });
});
