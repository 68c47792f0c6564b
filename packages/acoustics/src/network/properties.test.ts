import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { parseNetwork } from "./parse.js";
import { solveNetwork } from "./solve.js";
import type { Network } from "./schema.js";

const B = 21;

interface RawLink {
  a: number;
  b: number;
  area: number;
  tl: number;
  slope: number;
  open: number;
}

/** Random small networks: room 0 is the source, the last room the receiver. */
const networkArb = (minTl: number) =>
  fc
    .integer({ min: 2, max: 6 })
    .chain((n) =>
      fc.record({
        n: fc.constant(n),
        absorption: fc.array(fc.double({ min: 4, max: 40, noNaN: true }), { minLength: n, maxLength: n }),
        links: fc.array(
          fc.record({
            a: fc.integer({ min: 0, max: n - 1 }),
            b: fc.integer({ min: 0, max: n - 1 }),
            area: fc.double({ min: 1, max: 20, noNaN: true }),
            tl: fc.double({ min: minTl, max: 60, noNaN: true }),
            slope: fc.double({ min: 0, max: 1.5, noNaN: true }),
            open: fc.double({ min: 0, max: minTl >= 30 ? 0 : 0.02, noNaN: true }),
          }),
          { minLength: 1, maxLength: 10 },
        ),
      }),
    );

function toRaw(g: { n: number; absorption: number[]; links: RawLink[] }) {
  const links = g.links
    .filter((l) => l.a !== l.b)
    .map((l, i) => ({
      id: `l${i}`,
      between: [`r${l.a}`, `r${l.b}`],
      parts: [
        { id: "wall", area_m2: l.area, tl_db: Array.from({ length: B }, (_, b) => l.tl + l.slope * b) },
        ...(l.open > 0 ? [{ id: "gap", area_m2: l.open, open: true as const }] : []),
      ],
    }));
  // The absorption area includes what leaves through the links (the format's rule), so add the
  // link areas to each room's own absorption.
  const outflow = g.absorption.map(() => 0);
  for (const l of g.links.filter((k) => k.a !== k.b)) for (const j of [l.a, l.b]) outflow[j]! += l.area + l.open;
  return {
    spaces: g.absorption.map((a, i) => ({ id: `r${i}`, kind: "room", volume_m3: 40, absorption_m2: a + outflow[i]! })),
    links,
    sources: [{ space: "r0", levels_db: new Array(B).fill(90) }],
  };
}

function parsed(raw: unknown): Network {
  const p = parseNetwork(raw);
  if (!p.ok) throw new Error(JSON.stringify(p.issues));
  return p.value;
}

const receiverOf = (raw: ReturnType<typeof toRaw>) => `r${raw.spaces.length - 1}`;

describe("network properties (fast-check)", () => {
  it("more insulation never raises the received level", () => {
    fc.assert(
      fc.property(networkArb(0), fc.nat(), fc.double({ min: 0, max: 30, noNaN: true }), fc.nat(), (g, pick, add, band) => {
        const raw = toRaw(g);
        if (raw.links.length === 0) return;
        const receiver = receiverOf(raw);
        const before = solveNetwork(parsed(raw), { receiver, k: 1, gains: 0 }).levelsDb;
        const l = raw.links[pick % raw.links.length]!;
        const wall = l.parts[0]!;
        // Add `add` dB to every band from `band` up (a lining that helps the upper bands).
        wall.tl_db = wall.tl_db!.map((v, b) => (b >= band % B ? v + add : v));
        const after = solveNetwork(parsed(raw), { receiver, k: 1, gains: 0 }).levelsDb;
        after.forEach((v, b) => expect(v).toBeLessThanOrEqual(before[b]! + 1e-7));
      }),
      { numRuns: 150 },
    );
  });

  it("does not depend on the order of spaces and links", () => {
    fc.assert(
      fc.property(networkArb(0), fc.integer(), (g, seed) => {
        const raw = toRaw(g);
        const receiver = receiverOf(raw);
        const rotate = <T>(xs: T[]) => (xs.length === 0 ? xs : [...xs.slice(Math.abs(seed) % xs.length), ...xs.slice(0, Math.abs(seed) % xs.length)].reverse());
        const shuffled = { ...raw, spaces: rotate(raw.spaces), links: rotate(raw.links) };
        const a = solveNetwork(parsed(raw), { receiver });
        const b = solveNetwork(parsed(shuffled), { receiver });
        a.levelsDb.forEach((v, i) => (Number.isFinite(v) ? expect(b.levelsDb[i]).toBeCloseTo(v, 7) : expect(b.levelsDb[i]).toBe(v)));
        const shares = (r: typeof a) => new Map(r.links.map((l) => [l.id, l.share]));
        const sa = shares(a);
        for (const [id, s] of shares(b)) expect(s).toBeCloseTo(sa.get(id)!, 7);
        const pathKey = (r: typeof a) => r.paths.map((p) => `${p.links.join(",")}:${p.dba.toFixed(6)}`).sort();
        if (a.paths.length < 10) expect(pathKey(b)).toEqual(pathKey(a));
      }),
      { numRuns: 100 },
    );
  });

  it("listed paths never sum above the exact total when couplings are weak", () => {
    fc.assert(
      fc.property(networkArb(30), (g) => {
        const raw = toRaw(g);
        const receiver = receiverOf(raw);
        const r = solveNetwork(parsed(raw), { receiver, k: 50 });
        for (let b = 0; b < B; b++) {
          const total = Math.pow(10, r.levelsDb[b]! / 10);
          const sum = r.paths.reduce((s, p) => s + Math.pow(10, p.levelsDb[b]! / 10), 0);
          expect(sum).toBeLessThanOrEqual(total * (1 + 1e-9));
        }
        expect(r.paths.reduce((s, p) => s + p.share, 0)).toBeLessThanOrEqual(1 + 1e-9);
      }),
      { numRuns: 150 },
    );
  });
});
