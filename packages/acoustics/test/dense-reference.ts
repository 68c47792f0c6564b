/**
 * An independent reference for network tests: builds the power-balance matrix straight from the
 * raw network JSON (partition parts with tl_db or open, vents, floors, flanking with a given
 * kij_db) and solves it with dense Gaussian elimination with partial pivoting, band by band.
 * Shares no code with the engine's solver.
 */

type Raw = any;

export function denseSolve(A: number[][], rhs: number[]): number[] {
  const n = rhs.length;
  const M = A.map((row, i) => [...row, rhs[i]!]);
  for (let col = 0; col < n; col++) {
    let piv = col;
    for (let r = col + 1; r < n; r++) if (Math.abs(M[r]![col]!) > Math.abs(M[piv]![col]!)) piv = r;
    [M[col], M[piv]] = [M[piv]!, M[col]!];
    for (let r = col + 1; r < n; r++) {
      const f = M[r]![col]! / M[col]![col]!;
      for (let k = col; k <= n; k++) M[r]![k]! -= f * M[col]![k]!;
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

function tauS(link: Raw, b: number): number {
  const t = (tl: number) => Math.pow(10, -tl / 10);
  switch (link.type ?? "partition") {
    case "partition":
      return link.parts.reduce((s: number, p: Raw) => s + (p.open ? p.area_m2 : p.dne_db ? 10 * t(p.dne_db[b]) : p.area_m2 * t(p.tl_db[b])), 0);
    case "vent":
      return link.open_area_m2 * t(link.attenuation_db[b]);
    case "floor":
      return link.area_m2 * t(link.tl_db[b]);
    case "flanking": {
      const k = typeof link.kij_db === "number" ? link.kij_db : link.kij_db[b];
      const r = (link.element_i.tl_db[b] + link.element_j.tl_db[b]) / 2 + k + 10 * Math.log10(link.separating_area_m2 / link.coupling_length_m);
      return link.separating_area_m2 * t(r);
    }
  }
  throw new Error("unknown link type");
}

function absorption(space: Raw, b: number): number {
  const v = (x: number | number[]) => (typeof x === "number" ? x : x[b]!);
  return space.absorption_m2 !== undefined ? v(space.absorption_m2) : (0.16 * space.volume_m3) / v(space.rt60_s);
}

/** Band levels (dB) of every space for the network's airborne sources, by dense elimination. */
export function denseLevels(net: Raw, bands: number): Map<string, number[]> {
  const ids: string[] = net.spaces.map((s: Raw) => s.id);
  const fixedLevel = new Map<string, number[]>(net.sources.map((s: Raw) => [s.space, s.levels_db]));
  const unknown = ids.filter((id) => !fixedLevel.has(id) && net.spaces.find((s: Raw) => s.id === id).kind !== "outdoors");
  const out = new Map<string, number[]>(ids.map((id) => [id, new Array<number>(bands).fill(-Infinity)]));
  for (const [id, l] of fixedLevel) out.set(id, [...l]);
  for (let b = 0; b < bands; b++) {
    const idx = new Map(unknown.map((id, i) => [id, i]));
    const A = unknown.map(() => new Array<number>(unknown.length).fill(0));
    const rhs = new Array<number>(unknown.length).fill(0);
    unknown.forEach((id, i) => (A[i]![i] = absorption(net.spaces.find((s: Raw) => s.id === id), b)));
    for (const link of net.links) {
      const w = tauS(link, b);
      const [a, c] = link.between as [string, string];
      for (const [from, to] of [[a, c], [c, a]] as const) {
        const ti = idx.get(to);
        if (ti === undefined) continue;
        const fi = idx.get(from);
        if (fi !== undefined) A[ti]![fi]! -= w;
        else if (fixedLevel.has(from)) rhs[ti]! += w * Math.pow(10, fixedLevel.get(from)![b]! / 10);
      }
    }
    const x = denseSolve(A, rhs);
    unknown.forEach((id, i) => (out.get(id)![b] = 10 * Math.log10(x[i]!)));
  }
  return out;
}
