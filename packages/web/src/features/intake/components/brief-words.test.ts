import { describe, expect, it } from "vitest";
import { levelInWords, targetExplanation } from "./brief-words";

describe("plain-language targets", () => {
  it("explains each kind of target with its number", () => {
    expect(targetExplanation({ kind: "level", levelDba: 30 })).toMatch(/^30 dBA in the receiving room is a quiet bedroom/);
    expect(targetExplanation({ kind: "nc", nc: 20 })).toMatch(/NC-20 curve/);
    expect(targetExplanation({ kind: "reduction", reductionDb: 10 })).toMatch(/^10 dB less than today/);
    expect(targetExplanation({ kind: "noticeable" })).toMatch(/at least 5 dB/);
    expect(targetExplanation(null)).toMatch(/Choose how quiet/);
  });

  it("picks the anchor for the level, quieter numbers first", () => {
    expect(levelInWords(18)).toMatch(/recording studio/);
    expect(levelInWords(38)).toMatch(/library/);
    expect(levelInWords(120)).toMatch(/talking over it is hard/);
  });

  it("does not print NaN while a number is being typed", () => {
    expect(targetExplanation({ kind: "level", levelDba: Number.NaN })).not.toMatch(/NaN/);
  });
});
