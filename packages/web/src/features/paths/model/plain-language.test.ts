import { describe, expect, it } from "vitest";
import { levelInWords, shortfallInWords } from "./plain-language";

describe("plain-language levels", () => {
  it("grows from silent to intrusive as the level rises", () => {
    expect(levelInWords(10)).toBe("practically silent");
    expect(levelInWords(33)).toMatch(/library/);
    expect(levelInWords(38)).toMatch(/conversation next door/);
    expect(levelInWords(75)).toMatch(/intrusive/);
    const phrases = [10, 18, 22, 27, 33, 38, 43, 48, 55, 70].map(levelInWords);
    expect(new Set(phrases).size).toBe(phrases.length);
  });

  it("words shortfalls by how noticeable they are", () => {
    expect(shortfallInWords(0)).toBe("within the target");
    expect(shortfallInWords(2)).toMatch(/hard to notice/);
    expect(shortfallInWords(7)).toMatch(/clearly louder/);
    expect(shortfallInWords(12)).toMatch(/twice as loud/);
  });
});
