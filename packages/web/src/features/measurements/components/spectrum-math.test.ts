import { describe, expect, it } from "vitest";
import { octaveSteps } from "./spectrum-math";

describe("octave steps of a third-octave spectrum", () => {
  it("sums each octave's three bands, and leaves an octave with a missing band out", () => {
    const levels: (number | null)[] = Array.from({ length: 21 }, () => 40);
    levels[4] = null; // 125 Hz, in the 125 Hz octave (100, 125, 160)
    const steps = octaveSteps(levels);
    expect(steps.map((s) => s.hz)).toEqual([63, 125, 250, 500, 1000, 2000, 4000]);
    // Three equal bands: 10·lg 3 = 4.77 dB above each (energy sum, by definition).
    expect(steps[0]!.db).toBeCloseTo(40 + 10 * Math.log10(3), 6);
    expect(steps[1]!.db).toBeNull();
    // The octave's edges (IEC 61260-1: f·2^(∓1/2)) hold its three third octaves.
    expect(steps[6]!.lowerHz).toBeCloseTo(2818, 0);
    expect(steps[6]!.upperHz).toBeCloseTo(5623, 0);
  });
});
