import { describe, expect, it } from "vitest";
import { withBoundaryLosses } from "./absorption.js";

const flat = (v: number) => new Array(21).fill(v) as number[];

describe("withBoundaryLosses", () => {
  it("adds Σ τ·S of every link to each space's absorption, band by band, and leaves the outdoors alone", () => {
    const network = withBoundaryLosses({
      spaces: [
        { id: "a", kind: "room", volume_m3: 50, absorption_m2: 10 },
        { id: "b", kind: "room", volume_m3: 40, rt60_s: 0.64 },
        { id: "outdoors", kind: "outdoors" },
      ],
      links: [
        // τ·S = 10 m² × 10^(−20/10) = 0.1 m², plus an open 0.05 m² gap (τ = 1).
        { id: "ab", between: ["a", "b"], parts: [{ area_m2: 10, tl_db: flat(20) }, { area_m2: 0.05, open: true }] },
        // τ·S = 4 m² × 10^(−10/10) = 0.4 m².
        { id: "a-out", between: ["a", "outdoors"], parts: [{ area_m2: 4, tl_db: flat(10) }] },
      ],
      sources: [],
    });
    const a = network.spaces.find((s) => s.id === "a")!;
    const b = network.spaces.find((s) => s.id === "b")!;
    expect((a.absorption_m2 as number[])[0]).toBeCloseTo(10 + 0.1 + 0.05 + 0.4, 6);
    // Sabine: A = 0.16 × 40 / 0.64 = 10 m², then + 0.15 m² through the shared wall.
    expect((b.absorption_m2 as number[])[20]).toBeCloseTo(10 + 0.15, 6);
    expect(b.rt60_s).toBeUndefined();
    expect(network.spaces.find((s) => s.id === "outdoors")).toEqual({ id: "outdoors", kind: "outdoors" });
  });
});
