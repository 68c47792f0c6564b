/**
 * The k strongest simple paths from the sources to the receiver, ranked by their A-weighted
 * energy at the receiver. A path's band energy is the first-order (no-reverberation) product
 * along it: e_start · Π τS_ℓ/A_next. Best-first search over partial paths with an admissible
 * bound: from space v the energy that can still reach the receiver is at most
 * A_v·z_v (z the adjoint, the sum over every walk from v), so complete paths leave the queue in
 * exact order of strength. The search stops after `maxExpansions` partial paths (then
 * `truncated`).
 */
import type { CompiledNetwork } from "./compile.js";
import type { Excitation } from "./excitation.js";

export interface RankedPath {
  /** Space indices from the start to the receiver. */
  readonly nodes: readonly number[];
  /** Link indices along the path (one fewer than nodes). */
  readonly links: readonly number[];
  /** Start label (source id or floor) and kind. */
  readonly start: { readonly label: string; readonly kind: "airborne" | "impact"; readonly floorLink: number };
  /** Energy per band at the receiver carried by this path alone. */
  readonly energy: Float64Array;
  /** A-weighted energy Σ a_b·e_b. */
  readonly aEnergy: number;
}

interface State {
  readonly node: number;
  readonly link: number;
  readonly parent: State | null;
  readonly startIndex: number;
  readonly p: Float64Array;
  readonly priority: number;
  readonly complete: boolean;
}

/** Max-heap of states by priority. */
class StateHeap {
  private readonly items: State[] = [];
  get size(): number {
    return this.items.length;
  }
  push(s: State): void {
    const a = this.items;
    a.push(s);
    let i = a.length - 1;
    while (i > 0) {
      const up = (i - 1) >> 1;
      if (a[up]!.priority >= s.priority) break;
      a[i] = a[up]!;
      i = up;
    }
    a[i] = s;
  }
  pop(): State | undefined {
    const a = this.items;
    const top = a[0];
    const last = a.pop();
    if (a.length === 0 || last === undefined) return top;
    let i = 0;
    for (;;) {
      const l = 2 * i + 1;
      if (l >= a.length) break;
      const r = l + 1;
      const c = r < a.length && a[r]!.priority > a[l]!.priority ? r : l;
      if (a[c]!.priority <= last.priority) break;
      a[i] = a[c]!;
      i = c;
    }
    a[i] = last;
    return top;
  }
}

function onPath(s: State | null, node: number): boolean {
  for (let t = s; t !== null; t = t.parent) if (t.node === node) return true;
  return false;
}

function toPath(s: State, ex: Excitation, aWeights: Float64Array): RankedPath {
  const nodes: number[] = [];
  const links: number[] = [];
  for (let t: State | null = s; t !== null; t = t.parent) {
    nodes.push(t.node);
    if (t.link >= 0) links.push(t.link);
  }
  const st = ex.starts[s.startIndex]!;
  let aEnergy = 0;
  s.p.forEach((v, b) => (aEnergy += v * aWeights[b]!));
  return {
    nodes: nodes.reverse(),
    links: links.reverse(),
    start: { label: st.label, kind: st.kind, floorLink: st.floorLink },
    energy: s.p,
    aEnergy,
  };
}

export interface PathSearchOptions {
  readonly k: number;
  readonly maxExpansions?: number;
}

/** The k strongest simple paths; `truncated` when the expansion budget ran out first. */
export function strongestPaths(
  c: CompiledNetwork,
  ex: Excitation,
  z: Float64Array,
  receiver: number,
  aWeights: Float64Array,
  options: PathSearchOptions,
): { paths: RankedPath[]; truncated: boolean; expansions: number } {
  const B = c.B;
  const bound = (node: number, p: Float64Array): number => {
    let s = 0;
    for (let b = 0; b < B; b++) s += aWeights[b]! * p[b]! * (node === receiver ? 1 : c.absorption[node * B + b]! * z[node * B + b]!);
    return s;
  };
  const heap = new StateHeap();
  ex.starts.forEach((st, startIndex) => {
    const complete = st.node === receiver;
    // A fixed source space has no adjoint value (z = 0 there): always expand it first.
    const priority = complete ? bound(st.node, st.energy) : ex.fixed[st.node] ? Infinity : bound(st.node, st.energy);
    heap.push({ node: st.node, link: -1, parent: null, startIndex, p: st.energy, priority, complete });
  });
  const paths: RankedPath[] = [];
  const maxExpansions = options.maxExpansions ?? 20000;
  let expansions = 0;
  while (heap.size > 0 && paths.length < options.k) {
    const s = heap.pop() as State;
    if (s.complete) {
      paths.push(toPath(s, ex, aWeights));
      continue;
    }
    if (s.priority <= 0) break;
    if (++expansions > maxExpansions) return { paths, truncated: true, expansions };
    for (let k = c.adjStart[s.node]!; k < c.adjStart[s.node + 1]!; k++) {
      const next = c.adjNode[k] as number;
      if (ex.fixed[next] || onPath(s, next)) continue;
      const lb = c.adjLink[k]! * B;
      const p = new Float64Array(B);
      for (let b = 0; b < B; b++) p[b] = (s.p[b]! * c.weight[lb + b]!) / c.absorption[next * B + b]!;
      const complete = next === receiver;
      heap.push({ node: next, link: c.adjLink[k]!, parent: s, startIndex: s.startIndex, p, priority: bound(next, p), complete });
    }
  }
  return { paths, truncated: false, expansions };
}
