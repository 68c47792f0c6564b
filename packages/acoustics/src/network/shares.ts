/**
 * Each link's share of the energy reaching the receiver, and the exact gain if it were perfect.
 *
 * Share (per band) = the elasticity of the receiver energy to the link's transmitting area:
 * w·∂e_r/∂w / e_r = w·(z_i·e_j + z_j·e_i)/e_r with z the adjoint (z = 0 at fixed spaces). It is
 * the fraction of receiver energy carried through the link, each walk counted once per crossing,
 * so a link every path crosses has share ≈ 1 and parallel links' shares add up to about 1. An
 * impact floor also carries its impact source's part, z_below·b_impact/e_r.
 */
import type { CompiledNetwork } from "./compile.js";
import type { Excitation } from "./excitation.js";
import type { PerturbationEvaluator, Perturbation } from "./perturb.js";

export interface LinkShare {
  readonly link: number;
  /** Share per band (0…≈1). */
  readonly byBand: Float64Array;
  /** A-weighted share: Σ a_b·share_b·e_r,b / Σ a_b·e_r,b. */
  readonly aWeighted: number;
}

/** Impact source terms per floor link index. */
function impactTerms(c: CompiledNetwork, ex: Excitation): Map<number, { node: number; term: Float64Array }> {
  const out = new Map<number, { node: number; term: Float64Array }>();
  for (const st of ex.starts) {
    if (st.kind !== "impact") continue;
    const term = Float64Array.from(st.energy, (v, b) => v * c.absorption[st.node * c.B + b]!);
    const prev = out.get(st.floorLink);
    if (prev) prev.term.forEach((v, b) => (prev.term[b] = v + term[b]!));
    else out.set(st.floorLink, { node: st.node, term });
  }
  return out;
}

/** Every link's share of the receiver energy, sorted by A-weighted share (largest first). */
export function linkShares(
  c: CompiledNetwork,
  ex: Excitation,
  e: Float64Array,
  z: Float64Array,
  receiver: number,
  aWeights: Float64Array,
): LinkShare[] {
  const B = c.B;
  const er = e.subarray(receiver * B, receiver * B + B);
  let aTotal = 0;
  for (let b = 0; b < B; b++) aTotal += aWeights[b]! * er[b]!;
  const impacts = impactTerms(c, ex);
  const shares: LinkShare[] = [];
  for (let l = 0; l < c.m; l++) {
    const i = c.linkA[l] as number;
    const j = c.linkB[l] as number;
    const byBand = new Float64Array(B);
    let aShare = 0;
    const imp = impacts.get(l);
    for (let b = 0; b < B; b++) {
      const w = c.weight[l * B + b]!;
      let d = w * (z[i * B + b]! * e[j * B + b]! + z[j * B + b]! * e[i * B + b]!);
      if (imp) d += z[imp.node * B + b]! * imp.term[b]!;
      byBand[b] = er[b]! > 0 ? d / er[b]! : 0;
      aShare += aWeights[b]! * d;
    }
    shares.push({ link: l, byBand, aWeighted: aTotal > 0 ? aShare / aTotal : 0 });
  }
  return shares.sort((a, b) => b.aWeighted - a.aWeighted);
}

/** The perturbation that makes a link perfect: τS = 0, and any impact source on it removed. */
export function perfectLinkPerturbation(c: CompiledNetwork, ex: Excitation, link: number): Perturbation {
  const imp = impactTerms(c, ex).get(link);
  return {
    links: [{ link, weight: new Float64Array(c.B) }],
    injections: imp ? [{ node: imp.node, delta: Float64Array.from(imp.term, (v) => -v) }] : [],
  };
}

/** Receiver energy per band if the link let nothing through (exact, warm-started from the base). */
export function receiverEnergyIfPerfect(evaluator: PerturbationEvaluator, link: number): Float64Array {
  const { c, ex } = evaluator.base;
  return evaluator.receiverEnergy(perfectLinkPerturbation(c, ex, link));
}
