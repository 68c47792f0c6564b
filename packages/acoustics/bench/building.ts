/**
 * Synthetic buildings for the benchmark: rooms on a grid of storeys (about √n rooms per side of a
 * storey, about 6 links per room: four walls, floor and ceiling; some walls with doors and gaps,
 * some vent links, some flanking links), 21 one-third-octave bands, from a seed.
 */
import type { NetworkInput } from "../src/index.js";

const B = 21;

/** mulberry32: a small seeded generator, so every run builds the same buildings. */
export function seededRandom(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

const rising = (at50: number, slope: number) => Array.from({ length: B }, (_, b) => at50 + slope * b);

export interface Building {
  readonly network: NetworkInput;
  readonly source: string;
  readonly receiver: string;
  readonly linkIds: readonly string[];
}

/** A building of about `n` rooms. */
export function syntheticBuilding(n: number, seed = 1): Building {
  const rnd = seededRandom(seed);
  const storeys = Math.max(1, Math.round(Math.cbrt(n / 4)));
  const perStorey = Math.ceil(n / storeys);
  const side = Math.ceil(Math.sqrt(perStorey));
  const id = (i: number) => `r${i}`;
  const spaces = Array.from({ length: n }, (_, i) => ({ id: id(i), kind: "room" as const, volume_m3: 30 + 40 * rnd(), absorption_m2: 8 + 25 * rnd() }));
  const links: NonNullable<NetworkInput["links"]> = [];
  const at = (s: number, x: number, y: number) => s * perStorey + y * side + x;
  const addWall = (a: number, b: number) => {
    const parts: Record<string, unknown>[] = [{ id: "wall", kind: "wall", area_m2: 8 + 6 * rnd(), tl_db: rising(25 + 20 * rnd(), 0.8 + 0.8 * rnd()) }];
    if (rnd() < 0.3) parts.push({ id: "door", kind: "door", area_m2: 1.8, tl_db: rising(12 + 10 * rnd(), 0.5) });
    if (rnd() < 0.2) parts.push({ id: "gap", kind: "gap", area_m2: 0.002 + 0.01 * rnd(), open: true });
    links.push({ id: `w${links.length}`, between: [id(a), id(b)], parts } as never);
  };
  for (let i = 0; i < n; i++) {
    const s = Math.floor(i / perStorey);
    const y = Math.floor((i % perStorey) / side);
    const x = (i % perStorey) % side;
    const east = at(s, x + 1, y);
    const south = at(s, x, y + 1);
    const up = at(s + 1, x, y);
    if (x + 1 < side && east < n) addWall(i, east);
    if (y + 1 < side && south < n) addWall(i, south);
    if (up < n) {
      links.push({ id: `f${links.length}`, type: "floor", between: [id(up), id(i)], area_m2: 15 + 10 * rnd(), tl_db: rising(40 + 10 * rnd(), 1), impact: { ln_db: rising(75, -0.3) } } as never);
    }
    if (rnd() < 0.1 && east < n && x + 1 < side) {
      links.push({ id: `v${links.length}`, type: "vent", between: [id(i), id(east)], open_area_m2: 0.02 + 0.05 * rnd(), attenuation_db: rising(2 + 5 * rnd(), 0.6) } as never);
    }
    const east2 = at(s, x + 2, y);
    if (rnd() < 0.15 && x + 2 < side && east2 < n) {
      const el = { tl_db: rising(35, 1), area_m2: 12, mass_kg_m2: 150 };
      links.push({ id: `k${links.length}`, type: "flanking", between: [id(i), id(east2)], junction: "cross", element_i: el, element_j: el, mass_perpendicular_kg_m2: 250, coupling_length_m: 3, separating_area_m2: 10 } as never);
    }
  }
  const source = id(0);
  const receiver = id(Math.min(n - 1, side + 1));
  return {
    network: { spaces, links, sources: [{ id: "src", space: source, levels_db: new Array(B).fill(85) }] },
    source: "src",
    receiver,
    linkIds: links.map((l) => l.id),
  };
}

/**
 * The building with `count` extra links of comparable strength between the source's space and the
 * receiver (walls with doors, vents, flanking paths), so that many upgrade options matter at once:
 * the hard case for the upgrade search.
 */
export function withParallelPaths(b: Building, count: number, seed = 3): Building {
  const rnd = seededRandom(seed);
  const net = b.network;
  const from = net.sources?.[0];
  const a = from && "space" in from ? from.space : "r0";
  const links = [...(net.links ?? [])];
  for (let i = 0; i < count; i++) {
    const id = `p${i}`;
    const kind = i % 3;
    if (kind === 0) {
      links.push({ id, between: [a, b.receiver], parts: [{ id: "wall", kind: "wall", area_m2: 3, tl_db: rising(32 + 6 * rnd(), 1) }, { id: "gap", kind: "gap", area_m2: 0.0005 + 0.001 * rnd(), open: true }] } as never);
    } else if (kind === 1) {
      links.push({ id, type: "vent", between: [a, b.receiver], open_area_m2: 0.01, attenuation_db: rising(14 + 6 * rnd(), 0.3) } as never);
    } else {
      const el = { tl_db: rising(30 + 6 * rnd(), 1), area_m2: 10, mass_kg_m2: 120 };
      links.push({ id, type: "flanking", between: [a, b.receiver], junction: "t", element_i: el, element_j: el, mass_perpendicular_kg_m2: 150, coupling_length_m: 3, separating_area_m2: 10, kij_db: 2 } as never);
    }
  }
  return { ...b, network: { ...net, links }, linkIds: links.map((l) => l.id) };
}
