/**
 * Exact receiver levels after changing some links (or impact terms), without re-solving the whole
 * network: the change Δe solves M'·Δe = r0, whose right-hand side lives only at the changed links'
 * ends. It is found by residual pushing from those ends (a warm start from the base solution),
 * pushing only where the adjoint z = M⁻¹·u_receiver says the residual still matters. When every
 * change lowers transmission, M'⁻¹ ≤ M⁻¹ elementwise, so Σ z·|residual| is a rigorous bound on
 * the remaining error at the receiver; the push stops when that bound is below the tolerance.
 * Changes that raise transmission in some band fall back to a warm-started full solve.
 */
import type { CompiledNetwork } from "./compile.js";
import type { Excitation } from "./excitation.js";
import { solveEnergies } from "./gauss-seidel.js";

export interface LinkWeightChange {
  readonly link: number;
  /** New τS per band, m². */
  readonly weight: Float64Array;
}

export interface InjectionChange {
  readonly node: number;
  /** Change of the source term per band (negative to remove an impact source). */
  readonly delta: Float64Array;
}

export interface Perturbation {
  readonly links: readonly LinkWeightChange[];
  readonly injections?: readonly InjectionChange[];
}

export interface BaseSolution {
  readonly c: CompiledNetwork;
  readonly ex: Excitation;
  /** Base energies n·B. */
  readonly e: Float64Array;
  /** Adjoint z = M⁻¹·u_receiver per space and band (0 at fixed spaces). */
  readonly z: Float64Array;
  readonly receiver: number;
}

export interface EvaluatorStats {
  pushes: number;
  fullSolves: number;
}

/** True when no band of any change raises transmission. */
export function isMonotoneDecrease(c: CompiledNetwork, p: Perturbation): boolean {
  for (const ch of p.links) {
    for (let b = 0; b < c.B; b++) if (ch.weight[b]! > c.weight[ch.link * c.B + b]!) return false;
  }
  return (p.injections ?? []).every((inj) => inj.delta.every((d) => d <= 0));
}

/** Receiver energies under perturbations of one base solution; reuses its scratch memory. */
export class PerturbationEvaluator {
  readonly stats: EvaluatorStats = { pushes: 0, fullSolves: 0 };
  private readonly res: Float64Array;
  private readonly touched: Int32Array;
  private readonly isTouched: Uint8Array;
  private readonly queue: Int32Array;
  private readonly inQueue: Uint8Array;
  private touchedCount = 0;

  constructor(
    readonly base: BaseSolution,
    readonly tolerance = 1e-9,
  ) {
    const { n, B } = base.c;
    this.res = new Float64Array(n * B);
    this.touched = new Int32Array(n);
    this.isTouched = new Uint8Array(n);
    this.queue = new Int32Array(n + 1);
    this.inQueue = new Uint8Array(n);
  }

  /** Receiver energy per band after the perturbation. */
  receiverEnergy(p: Perturbation): Float64Array {
    const { c } = this.base;
    const monotone = isMonotoneDecrease(c, p);
    const saved = p.links.map((ch) => c.weight.slice(ch.link * c.B, ch.link * c.B + c.B));
    const r0 = monotone && this.initialResidual(p);
    p.links.forEach((ch) => c.weight.set(ch.weight, ch.link * c.B));
    try {
      if (!monotone) return this.fullSolve(p);
      return r0 ? this.push() : this.receiverBase();
    } finally {
      p.links.forEach((ch, k) => c.weight.set(saved[k] as Float64Array, ch.link * c.B));
      this.clear();
    }
  }

  private receiverBase(): Float64Array {
    const { c, e, receiver } = this.base;
    return e.slice(receiver * c.B, receiver * c.B + c.B);
  }

  private touch(j: number): void {
    if (!this.isTouched[j]) {
      this.isTouched[j] = 1;
      this.touched[this.touchedCount++] = j;
    }
  }

  private clear(): void {
    const B = this.base.c.B;
    for (let t = 0; t < this.touchedCount; t++) {
      const j = this.touched[t] as number;
      this.isTouched[j] = 0;
      this.inQueue[j] = 0;
      this.res.fill(0, j * B, j * B + B);
    }
    this.touchedCount = 0;
  }

  /** r0 = (b' − b) − (M' − M)·e at the changed links' unknown ends; false when it is zero. */
  private initialResidual(p: Perturbation): boolean {
    const { c, ex, e } = this.base;
    const B = c.B;
    let any = false;
    const add = (j: number, b: number, v: number) => {
      if (ex.fixed[j] || v === 0) return;
      this.touch(j);
      this.res[j * B + b]! += v;
      any = true;
    };
    for (const ch of p.links) {
      const a = c.linkA[ch.link] as number;
      const bNode = c.linkB[ch.link] as number;
      for (let b = 0; b < B; b++) {
        const dw = ch.weight[b]! - c.weight[ch.link * B + b]!;
        add(bNode, b, dw * e[a * B + b]!);
        add(a, b, dw * e[bNode * B + b]!);
      }
    }
    for (const inj of p.injections ?? []) for (let b = 0; b < B; b++) add(inj.node, b, inj.delta[b]!);
    return any;
  }

  private hot(j: number, theta: Float64Array): boolean {
    const { c, z } = this.base;
    const B = c.B;
    for (let b = 0; b < B; b++) if (z[j * B + b]! * Math.abs(this.res[j * B + b]!) > theta[b]!) return true;
    return false;
  }

  /**
   * Relaxes node j over the window of bands where its residual still matters (z·|r| above that
   * band's threshold) and hands it on to the neighbours in that window only; bands outside keep
   * their small residual, which the error bound counts (relaxing a band inside the window that
   * did not need it is exact too). Each band is its own system, so the late pushes that only the
   * slow low bands still need do not pay for all of them; a push every band needs costs as before.
   */
  private pushNode(j: number, xr: Float64Array, d: Float64Array, theta: Float64Array): void {
    const { c, ex, receiver, z } = this.base;
    const B = c.B;
    const res = this.res;
    const jb = j * B;
    let lo = B;
    let hi = 0;
    for (let b = 0; b < B; b++) {
      if (z[jb + b]! * Math.abs(res[jb + b]!) > theta[b]!) {
        if (b < lo) lo = b;
        hi = b + 1;
      }
    }
    for (let b = lo; b < hi; b++) {
      d[b] = res[jb + b]! / c.absorption[jb + b]!;
      res[jb + b] = 0;
    }
    if (j === receiver) for (let b = lo; b < hi; b++) xr[b]! += d[b]!;
    const w = c.weight;
    for (let k = c.adjStart[j]!; k < c.adjStart[j + 1]!; k++) {
      const i = c.adjNode[k] as number;
      if (ex.fixed[i]) continue;
      const lb = c.adjLink[k]! * B;
      const ib = i * B;
      for (let b = lo; b < hi; b++) res[ib + b]! += w[lb + b]! * d[b]!;
      this.touch(i);
    }
    this.stats.pushes++;
  }

  private errorBound(out: Float64Array): void {
    const { c, z } = this.base;
    const B = c.B;
    out.fill(0);
    for (let t = 0; t < this.touchedCount; t++) {
      const j = this.touched[t] as number;
      for (let b = 0; b < B; b++) out[b]! += z[j * B + b]! * Math.abs(this.res[j * B + b]!);
    }
  }

  private push(): Float64Array {
    const { c, e, receiver } = this.base;
    const B = c.B;
    const er = e.subarray(receiver * B, receiver * B + B);
    const xr = new Float64Array(B);
    const d = new Float64Array(B);
    const bound = new Float64Array(B);
    const theta = Float64Array.from(er, (v) => (v > 0 ? (v * this.tolerance) / 4 : Infinity));
    const maxPushes = 200 * c.n + 1000;
    let pushes = 0;
    for (;;) {
      let head = 0;
      let tail = 0;
      for (let t = 0; t < this.touchedCount; t++) {
        const j = this.touched[t] as number;
        if (this.hot(j, theta)) (this.queue[tail++] = j), (this.inQueue[j] = 1);
      }
      while (head !== tail) {
        const j = this.queue[head] as number;
        head = head === c.n ? 0 : head + 1;
        this.inQueue[j] = 0;
        if (!this.hot(j, theta)) continue;
        this.pushNode(j, xr, d, theta);
        if (++pushes > maxPushes) throw new Error("perturbation push did not converge");
        for (let k = c.adjStart[j]!; k < c.adjStart[j + 1]!; k++) {
          const i = c.adjNode[k] as number;
          if (!this.inQueue[i] && this.isTouched[i] && this.hot(i, theta)) {
            this.inQueue[i] = 1;
            this.queue[tail] = i;
            tail = tail === c.n ? 0 : tail + 1;
          }
        }
      }
      this.errorBound(bound);
      let done = true;
      for (let b = 0; b < B; b++) {
        if (!(er[b]! > 0)) continue;
        const lower = Math.max(er[b]! + xr[b]! - bound[b]!, er[b]! * 1e-13);
        if (bound[b]! > this.tolerance * lower) {
          done = false;
          theta[b] = Math.min(theta[b]!, bound[b]! / (8 * Math.max(1, this.touchedCount)));
        }
      }
      if (done) break;
    }
    return Float64Array.from(er, (v, b) => Math.max(0, v + xr[b]!));
  }

  private fullSolve(p: Perturbation): Float64Array {
    const { c, ex, e, receiver } = this.base;
    this.stats.fullSolves++;
    const injection = Float64Array.from(ex.injection);
    for (const inj of p.injections ?? []) for (let b = 0; b < c.B; b++) injection[inj.node * c.B + b]! += inj.delta[b]!;
    const { energy } = solveEnergies(c, { fixed: ex.fixed, fixedEnergy: ex.fixedEnergy, injection }, { initial: e });
    return energy.slice(receiver * c.B, receiver * c.B + c.B);
  }
}
