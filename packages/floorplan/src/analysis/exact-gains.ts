import { PerturbationEvaluator, type Network, type SolvedNetwork } from "@hushmark/acoustics";

type NetworkPart = Extract<Network["links"][number], { type: "partition" }>["parts"][number];

/** τ·S of one partition part at band b, m² (open: τ = 1; Dn,e: A0·10^(−Dn,e/10), A0 = 10 m²). */
function partTauS(part: NetworkPart, b: number): number {
  if ("open" in part && part.open) return part.area_m2;
  if ("dne_db" in part) return 10 * 10 ** (-part.dne_db[b]! / 10);
  if ("tl_db" in part) return part.area_m2 * 10 ** (-part.tl_db[b]! / 10);
  return 0;
}

/**
 * Exact gain-if-perfect in dB(A) of plan elements that are only some of a wall link's parts (a
 * door and its gaps, a penetration): the engine's perturbation evaluator re-solves the receiver
 * with those parts' τ·S taken out of the link, warm-started from the analysis's own base solve.
 */
export function exactPartGainsDb(solved: SolvedNetwork, elements: ReadonlyArray<{ elementId: string; linkId: string }>): Map<string, number> {
  const out = new Map<string, number>();
  if (elements.length === 0) return out;
  const { c } = solved;
  const evaluator = new PerturbationEvaluator(solved.base);
  const B = c.B;
  const r = solved.base.receiver;
  const aSum = (e: ArrayLike<number>) => {
    let s = 0;
    for (let b = 0; b < B; b++) s += solved.aWeights[b]! * e[b]!;
    return s;
  };
  const before = aSum(solved.base.e.subarray(r * B, r * B + B));
  for (const { elementId, linkId } of elements) {
    const l = c.linkIndex.get(linkId);
    const link = l === undefined ? undefined : c.network.links[l];
    if (l === undefined || !link || link.type !== "partition") continue;
    const parts = link.parts.filter((p) => p.ref === elementId);
    const weight = new Float64Array(B);
    for (let b = 0; b < B; b++) {
      const removed = parts.reduce((s, p) => s + partTauS(p, b), 0);
      weight[b] = Math.max(c.weight[l * B + b]! - removed, 0);
    }
    const after = aSum(evaluator.receiverEnergy({ links: [{ link: l, weight }] }));
    out.set(elementId, after > 0 ? 10 * Math.log10(before / after) : Infinity);
  }
  return out;
}
