import { describe, expect, it } from "vitest";
import { compileNetwork } from "./compile.js";
import { linkTransmittingArea, linkTransmittingAreaAt } from "./transmission.js";
import { parseNetwork } from "./parse.js";
import type { FlankingLink, Network } from "./schema.js";

const rising = (from: number) => Array.from({ length: 21 }, (_, b) => from + b);
const flank = (extra: Partial<FlankingLink>): FlankingLink => ({
  id: "f", type: "flanking", path: "Ff", between: ["a", "b"], junction: "t",
  element_i: { tl_db: rising(30), area_m2: 12, mass_kg_m2: 25 }, element_j: { tl_db: rising(35), area_m2: 9, mass_kg_m2: 250 },
  mass_perpendicular_kg_m2: 120, coupling_length_m: 2.6, separating_area_m2: 10, ...extra,
});

describe("linkTransmittingArea", () => {
  it("gives a flanking link the same τS in every band as the band-by-band formula", () => {
    for (const extra of [{}, { junction: "cross" as const }, { kij_db: 7 }, { kij_db: rising(2) }, { delta_r_db: 3 }, { path: "Df" as const }]) {
      const link = flank(extra);
      const all = linkTransmittingArea(link, 21);
      all.forEach((v, b) => expect(v).toBe(linkTransmittingAreaAt(link, b)));
      // A flanking path transmits less than its separating area and more than nothing.
      all.forEach((v) => expect(v > 0 && v < link.separating_area_m2).toBe(true));
    }
  });
});

describe("compileNetwork with known transmitting areas", () => {
  it("uses them when given, and computes the rest", () => {
    const parsed = parseNetwork({
      spaces: [{ id: "a", kind: "room", absorption_m2: 10 }, { id: "b", kind: "room", absorption_m2: 10 }],
      links: [flank({}), { id: "w", between: ["a", "b"], parts: [{ area_m2: 10, tl_db: rising(30) }] }],
    });
    if (!parsed.ok) throw new Error(JSON.stringify(parsed.issues));
    const net: Network = parsed.value;
    const plain = compileNetwork(net);
    const given = new Float64Array(21).fill(0.5);
    const hinted = compileNetwork(net, { transmittingArea: (l) => (l.id === "w" ? given : undefined) });
    expect(Array.from(hinted.weight.subarray(21, 42))).toEqual(Array.from(given));
    expect(Array.from(hinted.weight.subarray(0, 21))).toEqual(Array.from(plain.weight.subarray(0, 21)));
  });
});
