import { describe, expect, it } from "vitest";
import { parseNetwork } from "./parse.js";
import { solveNetwork } from "./solve.js";
import { minimalNetwork, flat, room, wall } from "../../test/networks.js";

describe("network schema", () => {
  it("accepts the minimal form with defaults", () => {
    const p = parseNetwork(minimalNetwork());
    expect(p.ok).toBe(true);
    if (!p.ok) return;
    expect(p.value.bands).toBe("third-octave");
    expect(p.value.version).toBe(1);
    expect(p.value.links[0]!.type).toBe("partition");
    expect(p.value.sources[0]!.type).toBe("airborne");
  });

  it("reports cross-field problems with JSON paths", () => {
    const raw = minimalNetwork() as any;
    raw.links[0].between[1] = "nowhere";
    raw.links[0].parts[0].tl_db = [1, 2, 3];
    raw.spaces[1].rt60_s = 0.5;
    raw.spaces.push({ id: "cafe", kind: "room", volume_m3: 10, absorption_m2: 3 });
    raw.sources.push({ type: "impact", floor: "party-wall" });
    const p = parseNetwork(raw);
    expect(p.ok).toBe(false);
    if (p.ok) return;
    const byPath = new Map(p.issues.map((i) => [i.path, i.message]));
    expect(byPath.get("$.links[0].between[1]")).toMatch(/unknown space "nowhere"/);
    expect(byPath.get("$.links[0].parts[0].tl_db")).toMatch(/has 3 values; the network has 21 bands/);
    expect(byPath.get("$.spaces[1]")).toMatch(/exactly one of absorption_m2 and rt60_s/);
    expect(byPath.get("$.spaces[4].id")).toMatch(/duplicate space id "cafe"/);
    expect(byPath.get("$.sources[1].floor")).toMatch(/not a floor link/);
  });

  it("reports shape problems inside unions by the closest branch", () => {
    const raw = minimalNetwork() as any;
    raw.links[0].parts[0].tl_db = "loud";
    raw.links.push({ id: "duct", type: "vent", between: ["cafe", "void"], attenuation_db: flat(3) });
    const p = parseNetwork(raw);
    if (p.ok) throw new Error("expected failure");
    const paths = p.issues.map((i) => i.path);
    expect(paths).toContain("$.links[0].parts[0].tl_db");
    expect(paths).toContain("$.links[1].open_area_m2");
  });

  it("refuses a balance with no steady state, naming the spaces", () => {
    const raw = { spaces: [room("a", 5), room("b", 2), room("c", 2)], links: [wall("ab", "a", "b", 10, flat(0)), wall("bc", "b", "c", 10, flat(0))], sources: [{ space: "a", levels_db: flat(80) }] };
    const p = parseNetwork(raw);
    if (!p.ok) throw new Error("expected a valid shape");
    expect(() => solveNetwork(p.value, { receiver: "c" })).toThrow(/give away more sound than they absorb: .*"b" \(50 Hz/);
  });
});
