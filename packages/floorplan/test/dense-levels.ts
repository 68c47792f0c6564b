/**
 * A reference for the solver on built networks: the power balance A_j·e_j = Σ τS_ij·e_i + b_j
 * assembled straight from the network (τS by the engine's per-link formula, which has its own
 * tests) and solved by dense Gaussian elimination with partial pivoting, band by band. It shares
 * no code with the engine's iterative solver. Airborne sources only.
 */
import { linkTransmittingArea, spaceAbsorptionAt, type Network } from "@hushmark/acoustics";

function denseSolve(A: number[][], rhs: number[]): number[] {
  const n = rhs.length;
  const M = A.map((row, i) => [...row, rhs[i]!]);
  for (let col = 0; col < n; col++) {
    let piv = col;
    for (let r = col + 1; r < n; r++) if (Math.abs(M[r]![col]!) > Math.abs(M[piv]![col]!)) piv = r;
    [M[col], M[piv]] = [M[piv]!, M[col]!];
    const pivot = M[col]!;
    for (let r = col + 1; r < n; r++) {
      const row = M[r]!;
      const f = row[col]! / pivot[col]!;
      if (f === 0) continue;
      for (let k = col; k <= n; k++) row[k]! -= f * pivot[k]!;
    }
  }
  const x = new Array<number>(n).fill(0);
  for (let r = n - 1; r >= 0; r--) {
    let s = M[r]![n]!;
    for (let k = r + 1; k < n; k++) s -= M[r]![k]! * x[k]!;
    x[r] = s / M[r]![r]!;
  }
  return x;
}

/** Band levels (dB) of every space of a third-octave network with airborne sources. */
export function denseLevels(net: Network): Map<string, number[]> {
  const B = 21;
  const fixed = new Map<string, readonly number[]>();
  for (const s of net.sources) if (s.type === "airborne") fixed.set(s.space, s.levels_db);
  const unknown = net.spaces.filter((s) => !fixed.has(s.id) && s.kind !== "outdoors");
  const idx = new Map(unknown.map((s, i) => [s.id, i]));
  const out = new Map<string, number[]>(net.spaces.map((s) => [s.id, fixed.has(s.id) ? [...fixed.get(s.id)!] : new Array<number>(B).fill(-Infinity)]));
  const tauS = net.links.map((l) => linkTransmittingArea(l, B));
  for (let b = 0; b < B; b++) {
    const A = unknown.map(() => new Array<number>(unknown.length).fill(0));
    const rhs = new Array<number>(unknown.length).fill(0);
    unknown.forEach((s, i) => (A[i]![i] = spaceAbsorptionAt(s, b)));
    net.links.forEach((link, l) => {
      const w = tauS[l]![b]!;
      const [p, q] = link.between;
      for (const [from, to] of [[p, q], [q, p]] as const) {
        const ti = idx.get(to);
        if (ti === undefined) continue;
        const fi = idx.get(from);
        if (fi !== undefined) A[ti]![fi]! -= w;
        else if (fixed.has(from)) rhs[ti]! += w * 10 ** (fixed.get(from)![b]! / 10);
      }
    });
    const x = denseSolve(A, rhs);
    unknown.forEach((s, i) => (out.get(s.id)![b] = 10 * Math.log10(x[i]!)));
  }
  return out;
}
