import { describe, expect, it } from "vitest";
import { formatLength, parseLength, parseLengthPair } from "./length.js";

describe("parseLength", () => {
  it.each([
    ["3.2", "metric", 3.2],
    ["3,2", "metric", 3.2],
    ["3.2 m", "imperial", 3.2],
    ["320cm", "metric", 3.2],
    ["3200 mm", "metric", 3.2],
    ["10'", "metric", 3.048],
    ["10' 6\"", "metric", 3.2004],
    ["10'6", "metric", 3.2004],
    ["10 ft 6 in", "metric", 3.2004],
    ["6\"", "metric", 0.1524],
    ["6 1/2\"", "metric", 0.1651],
    ["10", "imperial", 3.048],
    ["10-6", "imperial", 3.2004],
  ] as const)("reads %s (%s) as %f m", (text, unit, m) => {
    expect(parseLength(text, unit)).toBeCloseTo(m, 6);
  });

  it.each(["", "abc", "3..2", "1/0", "m"])("refuses %j", (text) => {
    expect(parseLength(text, "metric")).toBeNull();
  });

  it("reads a pair for a rectangle", () => {
    expect(parseLengthPair("4 x 3.5", "metric")).toEqual([4, 3.5]);
    expect(parseLengthPair("12' x 10'", "metric")?.map((v) => Math.round(v * 1e4) / 1e4)).toEqual([3.6576, 3.048]);
    expect(parseLengthPair("4", "metric")).toBeNull();
  });
});

describe("formatLength", () => {
  it("formats metres to the centimetre", () => {
    expect(formatLength(3.256, "metric")).toBe("3.26 m");
  });

  it("formats feet and inches to the nearest eighth, reduced", () => {
    expect(formatLength(3.2004, "imperial")).toBe("10' 6\"");
    expect(formatLength(0.1651, "imperial")).toBe("6 1/2\"");
    expect(formatLength(3.048 + 0.0254 * 0.25, "imperial")).toBe("10' 0 1/4\"");
  });

  it("round-trips through the parser in feet and inches", () => {
    for (const m of [0.5, 1.234, 2.7, 9.9]) {
      expect(parseLength(formatLength(m, "imperial"), "imperial")).toBeCloseTo(m, 2);
    }
  });
});
