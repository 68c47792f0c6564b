import type { Point } from "../document/schema.js";

/** An open or closed run of points taken from one or more DXF entities (m). */
export interface TracedPath {
  layer: string;
  points: Point[];
  closed: boolean;
  /** Handles of the entities it came from, in file order. */
  handles: string[];
}

/**
 * Joins open paths end to end where their ends meet within `snapM` and returns the chains that
 * close into loops; a chain that stays open, or a junction where three or more ends meet, is
 * left over for the underlay (m).
 */
export function closedLoops(paths: readonly TracedPath[], snapM: number): { loops: TracedPath[]; leftover: TracedPath[] } {
  // Snap ends to shared nodes through a grid so the cost stays linear in the number of paths.
  const cell = Math.max(snapM, 1e-9);
  const grid = new Map<string, number[]>();
  const nodes: Point[] = [];
  const nodeOf = (p: Point): number => {
    const gx = Math.floor(p.x / cell), gy = Math.floor(p.y / cell);
    for (let dx = -1; dx <= 1; dx++) for (let dy = -1; dy <= 1; dy++) {
      for (const n of grid.get(`${gx + dx},${gy + dy}`) ?? []) {
        const q = nodes[n]!;
        if (Math.hypot(q.x - p.x, q.y - p.y) <= snapM) return n;
      }
    }
    nodes.push(p);
    const key = `${gx},${gy}`;
    const list = grid.get(key) ?? [];
    list.push(nodes.length - 1);
    grid.set(key, list);
    return nodes.length - 1;
  };
  const ends = paths.map((p) => [nodeOf(p.points[0]!), nodeOf(p.points[p.points.length - 1]!)] as const);
  const incident = new Map<number, number[]>();
  ends.forEach(([a, b], i) => {
    for (const n of [a, b]) incident.set(n, [...(incident.get(n) ?? []), i]);
  });
  const used = new Set<number>();
  const tried = new Set<number>();
  const loops: TracedPath[] = [];
  const leftover: TracedPath[] = [];
  for (let i = 0; i < paths.length; i++) {
    if (used.has(i) || tried.has(i)) continue;
    // Walk from path i's end, always through nodes where exactly two path ends meet.
    const chain: Array<{ index: number; reversed: boolean }> = [{ index: i, reversed: false }];
    const seen = new Set([i]);
    const startNode = ends[i]![0];
    let node = ends[i]![1];
    let closed = node === startNode && paths[i]!.points.length > 2;
    while (!closed) {
      const here = incident.get(node) ?? [];
      if (here.length !== 2) break;
      const nextIndex = here[0] === chain[chain.length - 1]!.index ? here[1]! : here[0]!;
      if (seen.has(nextIndex)) break;
      const [a, b] = ends[nextIndex]!;
      const reversed = b === node && a !== node;
      chain.push({ index: nextIndex, reversed });
      seen.add(nextIndex);
      node = reversed ? a : b;
      if (node === startNode) closed = (incident.get(startNode) ?? []).length === 2;
    }
    // Every path on a chain that does not close would walk the same way and fail too.
    if (!closed) {
      for (const c of chain) tried.add(c.index);
      continue;
    }
    for (const c of chain) used.add(c.index);
    const points: Point[] = [];
    for (const c of chain) {
      const pts = c.reversed ? [...paths[c.index]!.points].reverse() : paths[c.index]!.points;
      points.push(...(points.length ? pts.slice(1) : pts));
    }
    points.pop();
    loops.push({ layer: paths[i]!.layer, points, closed: true, handles: chain.map((c) => paths[c.index]!.handles).flat().sort() });
  }
  for (let i = 0; i < paths.length; i++) if (!used.has(i)) leftover.push(paths[i]!);
  return { loops, leftover };
}
