import { describe, expect, it } from "vitest";
import { constructionCatalogue } from "../catalogue/catalogue.js";
import { groundLevel, planWith, rect } from "../../test/plan-fixtures.js";
import { validatePlan } from "./validate.js";
import { PROBLEM_CODES } from "./codes.js";
import { buildNetwork } from "../builder/build-network.js";

const room = (id: string, x = 0, extra: Record<string, unknown> = {}) => ({
  type: "room" as const, id, levelId: "L0", name: id, use: "office" as const, outline: rect(id, x, 0, 4, 5), finish: { kind: "rt60" as const, rt60S: 0.5 }, ...extra,
});
const vent = (id: string, spaceId: string) => ({ type: "vent" as const, id, spaceId, mount: "wall" as const, position: { x: 1, y: 1 }, openAreaM2: 0.02 });

/** One plan per remaining problem kind: the code, the element it names and words from the message. */
const cases: Array<{ code: string; elementId: string; words: RegExp; els: Parameters<typeof planWith>[0]; extra?: Parameters<typeof planWith>[1] }> = [
  { code: "unknown-level", elementId: "A", words: /level that is not in the plan/, els: [groundLevel, room("A", 0, { levelId: "L9" })] },
  { code: "room-duplicate-corner", elementId: "A", words: /two corners with the id Aa/, els: [groundLevel, { ...room("A"), outline: [...rect("A", 0, 0, 4, 5), { id: "Aa", x: -1, y: 2 }] }] },
  { code: "opening-taller-than-wall", elementId: "W", words: /reaches 3\.10 m above the floor but its wall is only 2\.50 m high/, els: [groundLevel, room("A"), { type: "window", id: "W", wallRef: "A:Aa", offsetM: 1, widthM: 1, heightM: 2.2, sillM: 0.9, constructionId: "glazing-single-6" }] },
  { code: "vent-in-unknown-space", elementId: "G", words: /opens into “Z”/, els: [groundLevel, room("A"), vent("G", "Z"), vent("H", "A"), { type: "duct", id: "K", fromVentId: "G", toVentId: "H", lengthM: 2, lining: "bare" }] },
  { code: "void-zero-area", elementId: "V", words: /no floor area/, els: [groundLevel, room("A"), { type: "void", id: "V", name: "V", kind: "ceiling-void", levelId: "L0", outline: [{ id: "a", x: 0, y: 0 }, { id: "b", x: 1, y: 0 }], depthM: 0.5 }] },
  { code: "void-covers-nothing", elementId: "V", words: /does not lie over or under any room/, els: [groundLevel, room("A"), { type: "void", id: "V", name: "V", kind: "attic", levelId: "L0", outline: rect("V", 20, 0, 3, 3), depthM: 1 }] },
  { code: "unknown-neighbour", elementId: "A:Ab|0", words: /neighbour “ghost”/, els: [groundLevel, room("A")], extra: { wallSettings: { "A:Ab|0": { faces: { kind: "neighbour", neighbourId: "ghost" } } } } },
  { code: "construction-wrong-kind", elementId: "D", words: /catalogued as a window, not a door/, els: [groundLevel, room("A"), { type: "door", id: "D", wallRef: "A:Aa", offsetM: 1, widthM: 0.9, heightM: 2, constructionId: "glazing-single-6" }] },
  { code: "penetration-no-area", elementId: "P", words: /has no open area/, els: [groundLevel, room("A"), { type: "penetration", id: "P", wallRef: "A:Aa", offsetM: 1, widthM: 0.05, what: "pipe", openAreaM2: 0 }] },
];

describe("validation messages for every problem kind", () => {
  for (const c of cases) {
    it(`${c.code}: names ${c.elementId} and says what is wrong`, () => {
      const found = validatePlan(planWith(c.els, c.extra ?? {}), constructionCatalogue).filter((p) => p.code === c.code);
      expect(found).toHaveLength(1);
      expect(found[0]!.elementId).toBe(c.elementId);
      expect(found[0]!.message).toMatch(c.words);
      expect(found[0]!.suggestion.length).toBeGreaterThan(10);
      expect(found[0]!.severity).toBe(PROBLEM_CODES[c.code as keyof typeof PROBLEM_CODES]);
    });
  }

  it("absorption-raised: a measured absorption smaller than what leaves is raised and reported", () => {
    // A 0.5 m² absorption cannot hold a 2 m² open hole in the wall to the outside.
    const leaky = room("A", 0, { finish: { kind: "absorption", absorptionM2: 0.5 } });
    const hole = { type: "penetration" as const, id: "P", wallRef: "A:Aa", offsetM: 1, widthM: 2, what: "other" as const, openAreaM2: 2 };
    const r = buildNetwork(planWith([groundLevel, leaky, hole]), constructionCatalogue);
    if (!r.ok) throw new Error(r.problems[0]!.message);
    expect(r.assumptions.map((p) => p.code)).toContain("absorption-raised");
    const a = r.network.spaces.find((s) => s.id === "A")!.absorption_m2 as number[];
    for (const v of a) expect(v).toBeGreaterThanOrEqual(2 * 1.05 - 1e-9);
  });
});
