/**
 * Steady-state power balance of the whole network, per band: for every space j whose level is
 * not fixed, A_j·e_j = Σ_i τS_ij·e_i + b_j (e = 10^(L/10)), i.e. e = C·e + s with C_ji = τS_ij/A_j.
 * Solved by symmetric Gauss–Seidel sweeps (all bands at once), nodes ordered breadth-first from
 * the excitation, each band stopping on its own rate-corrected relative change. Converges
 * whenever the power balance has a solution (C's spectral radius < 1, true when every A_j exceeds the transmitting
 * area leaving j).
 */
import type { CompiledNetwork } from "./compile.js";

export interface SolveOptions {
  /** Relative accuracy of every band energy (default 1e-10). */
  readonly tolerance?: number;
  readonly maxSweeps?: number;
  /** Starting energies (warm start), n·B. */
  readonly initial?: Float64Array;
}

export interface SolveStats {
  readonly sweeps: number;
  readonly converged: boolean;
  /** True when energies grew without bound (the balance has no steady state). */
  readonly diverged: boolean;
  /** Estimated largest remaining relative error. */
  readonly errorEstimate: number;
}

export interface EnergyProblem {
  readonly fixed: Uint8Array;
  readonly fixedEnergy: Float64Array;
  readonly injection: Float64Array;
}

/** Unknown spaces reachable from the excitation, breadth-first (the sweep order). */
export function sweepOrder(c: CompiledNetwork, p: EnergyProblem): Int32Array {
  const { n, B } = c;
  const seen = new Uint8Array(n);
  const queue = new Int32Array(n);
  let head = 0;
  let tail = 0;
  for (let j = 0; j < n; j++) {
    let excited = false;
    for (let b = 0; b < B && !excited; b++) {
      excited = (p.fixed[j] ? p.fixedEnergy[j * B + b]! : p.injection[j * B + b]!) > 0;
    }
    if (excited) {
      seen[j] = 1;
      queue[tail++] = j;
    }
  }
  const order: number[] = [];
  while (head < tail) {
    const j = queue[head++] as number;
    if (!p.fixed[j]) order.push(j);
    for (let k = c.adjStart[j]!; k < c.adjStart[j + 1]!; k++) {
      const i = c.adjNode[k] as number;
      if (!seen[i] && !p.fixed[i]) {
        seen[i] = 1;
        queue[tail++] = i;
      }
    }
  }
  return Int32Array.from(order);
}

function largestExcitation(c: CompiledNetwork, p: EnergyProblem): number {
  let max = 0;
  for (let j = 0; j < c.n; j++) {
    for (let b = 0; b < c.B; b++) {
      const v = p.fixed[j] ? p.fixedEnergy[j * c.B + b]! : p.injection[j * c.B + b]! / Math.max(c.absorption[j * c.B + b]!, 1e-300);
      if (v > max) max = v;
    }
  }
  return max;
}

/**
 * Spaces whose absorption area is smaller than the transmitting area leaving them in some band:
 * the absorption is taken to include what leaves through the boundaries, so such a space gives
 * away more than it absorbs and the balance may have no steady state.
 */
export function overTransmittingSpaces(c: CompiledNetwork): { space: number; band: number; ratio: number }[] {
  const out: { space: number; band: number; ratio: number }[] = [];
  const B = c.B;
  const sum = new Float64Array(B);
  for (let j = 0; j < c.n; j++) {
    if (c.outdoors[j]) continue;
    sum.fill(0);
    // Link by link, all bands at once: each link's row of τS is read in order.
    for (let k = c.adjStart[j]!; k < c.adjStart[j + 1]!; k++) {
      const lb = c.adjLink[k]! * B;
      for (let b = 0; b < B; b++) sum[b]! += c.weight[lb + b]!;
    }
    let worst = { band: -1, ratio: 1 };
    for (let b = 0; b < B; b++) {
      const ratio = sum[b]! / c.absorption[j * B + b]!;
      if (ratio > worst.ratio) worst = { band: b, ratio };
    }
    if (worst.band >= 0) out.push({ space: j, ...worst });
  }
  return out;
}

/**
 * One Gauss–Seidel sweep over `order` (forward or backward) for the bands lo…hi−1; writes each
 * band's largest relative change into `change` and answers the largest energy it wrote (for the
 * divergence check). Written with local typed arrays only: this loop is the solver's whole cost.
 */
function sweepOnce(
  c: CompiledNetwork,
  p: EnergyProblem,
  e: Float64Array,
  order: Int32Array,
  forward: boolean,
  acc: Float64Array,
  floor: number,
  lo: number,
  hi: number,
  change: Float64Array,
): number {
  const B = c.B;
  const w = c.weight;
  const absorption = c.absorption;
  const adjStart = c.adjStart;
  const adjNode = c.adjNode;
  const adjLink = c.adjLink;
  const injection = p.injection;
  const count = order.length;
  change.fill(0);
  let largest = 0;
  for (let t = 0; t < count; t++) {
    const j = order[forward ? t : count - 1 - t]!;
    const jb = j * B;
    for (let b = lo; b < hi; b++) acc[b] = injection[jb + b]!;
    const end = adjStart[j + 1]!;
    for (let k = adjStart[j]!; k < end; k++) {
      const ib = adjNode[k]! * B;
      const lb = adjLink[k]! * B;
      for (let b = lo; b < hi; b++) acc[b] = acc[b]! + w[lb + b]! * e[ib + b]!;
    }
    for (let b = lo; b < hi; b++) {
      const v = acc[b]! / absorption[jb + b]!;
      if (v > floor) {
        const d = Math.abs(v - e[jb + b]!) / v;
        if (d > change[b]!) change[b] = d;
      }
      // NaN counts as largest, so a broken balance is caught too.
      if (!(v <= largest)) largest = v;
      e[jb + b] = v;
    }
  }
  return largest;
}

/** Solve the power balance; energies per space and band (n·B), fixed spaces at their fixed values. */
export function solveEnergies(
  c: CompiledNetwork,
  p: EnergyProblem,
  options: SolveOptions = {},
): { energy: Float64Array; stats: SolveStats } {
  const tol = options.tolerance ?? 1e-10;
  const maxSweeps = options.maxSweeps ?? 5000;
  const { n, B } = c;
  const e = options.initial ? Float64Array.from(options.initial) : new Float64Array(n * B);
  for (let j = 0; j < n; j++) {
    if (p.fixed[j]) e.set(p.fixedEnergy.subarray(j * B, j * B + B), j * B);
  }
  const order = sweepOrder(c, p);
  // Energies this far below the strongest excitation (250 dB) do not affect any result.
  const largest = largestExcitation(c, p);
  const floor = largest * 1e-25;
  // 300 dB above the strongest excitation: no physical steady state gets there.
  const ceiling = largest * 1e30;
  const acc = new Float64Array(B);
  // Each band is a separate linear system: it stops being swept once it meets the tolerance, so
  // the fast high bands do not pay for the slow low ones. Only the window lo…hi−1 that still
  // holds unconverged bands is swept (bands inside it keep improving, which does no harm).
  const change = new Float64Array(B);
  const previous = new Float64Array(B).fill(Infinity);
  const estimate = new Float64Array(B).fill(Infinity);
  const done = new Uint8Array(B);
  let lo = 0;
  let hi = B;
  const worst = () => estimate.reduce((m, v) => Math.max(m, v), 0);
  for (let sweep = 1; sweep <= maxSweeps; sweep++) {
    // Bands outside the window no longer change, so the window's largest energy is the check.
    const largestNow = sweepOnce(c, p, e, order, sweep % 2 === 1, acc, floor, lo, hi, change);
    if (!(largestNow <= ceiling)) {
      return { energy: e, stats: { sweeps: sweep, converged: false, diverged: true, errorEstimate: Infinity } };
    }
    for (let b = lo; b < hi; b++) {
      if (done[b]) continue;
      const ch = change[b]!;
      const prev = previous[b]!;
      const rate = prev > 0 && Number.isFinite(prev) ? Math.min(ch / prev, 0.999) : 0.999;
      estimate[b] = ch === 0 ? 0 : (ch * rate) / (1 - rate);
      if (ch <= tol && estimate[b]! <= tol) done[b] = 1;
      previous[b] = ch;
    }
    while (lo < hi && done[lo]) lo++;
    while (hi > lo && done[hi - 1]) hi--;
    if (lo === hi) return { energy: e, stats: { sweeps: sweep, converged: true, diverged: false, errorEstimate: worst() } };
  }
  return { energy: e, stats: { sweeps: maxSweeps, converged: false, diverged: false, errorEstimate: worst() } };
}
