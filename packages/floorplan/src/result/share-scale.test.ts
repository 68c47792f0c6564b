import { describe, expect, it } from "vitest";
import { SHARE_COLOURS, SHARE_LEGEND, sharePercent, shareBin, shareColour } from "./share-scale.js";

describe("share scale", () => {
  it("puts shares into the legend's bins at their edges", () => {
    expect(shareBin(0)).toBe(0);
    expect(shareBin(0.019)).toBe(0);
    expect(shareBin(0.02)).toBe(1);
    expect(shareBin(0.1)).toBe(3);
    expect(shareBin(0.39)).toBe(4);
    expect(shareBin(0.4)).toBe(5);
    expect(shareBin(1.08)).toBe(5);
    expect(shareColour(0.5)).toBe(SHARE_COLOURS[5]);
  });

  it("has one legend row per colour, labelled by its range", () => {
    expect(SHARE_LEGEND.map((l) => l.colour)).toEqual([...SHARE_COLOURS]);
    expect(SHARE_LEGEND.map((l) => l.label)).toEqual(["under 2 %", "2–5 %", "5–10 %", "10–20 %", "20–40 %", "40 % or more"]);
  });

  it("writes shares as whole percentages, and a share counted over 1 as all of it", () => {
    expect(sharePercent(0.004)).toBe("under 1 %");
    expect(sharePercent(0.236)).toBe("24 %");
    expect(sharePercent(0.999)).toBe("100 %");
    expect(sharePercent(1.08)).toBe("100 %");
  });
});
