/**
 * solveNetwork: the exact steady-state levels of every space for a source and a receiver, the
 * strongest paths, every link's share and the exact gain if the links with the largest shares
 * were perfect.
 */
import { energyToDb } from "../bands/levels.js";
import { spectrum, type Spectrum } from "../bands/spectrum.js";
import { aWeightedLevelDb, aWeightsLinear } from "../bands/weighting.js";
import { bandSet, type BandSetId } from "../bands/bands.js";
import { ratingNc, type NcRating } from "../ratings/nc.js";
import { compileNetwork, type CompiledNetwork } from "./compile.js";
import { buildExcitation, NetworkSolveError, receiverIndex, selectSources, type Excitation } from "./excitation.js";
import { overTransmittingSpaces, solveEnergies, type SolveStats } from "./gauss-seidel.js";
import { PerturbationEvaluator, type BaseSolution } from "./perturb.js";
import { strongestPaths } from "./paths.js";
import { linkShares, receiverEnergyIfPerfect } from "./shares.js";
import { shortfall, type Shortfall, type Target } from "./targets.js";
import type { Network } from "./schema.js";

export interface SolveRequest {
  /** Source id, airborne source space or impact floor; all sources when omitted. */
  readonly source?: string;
  readonly receiver: string;
  /** Number of paths to rank (default 10). */
  readonly k?: number;
  /** Number of links (largest shares) whose gain-if-perfect is solved exactly (default 20). */
  readonly gains?: number;
  readonly target?: Target;
  readonly tolerance?: number;
}

export interface PathResult {
  readonly rank: number;
  /** Source label and kind; for impact the floor link is the first of `links`. */
  readonly source: string;
  readonly kind: "airborne" | "impact";
  readonly spaces: readonly string[];
  readonly links: readonly string[];
  readonly levelsDb: readonly number[];
  readonly dba: number;
  /** Fraction of the receiver's A-weighted energy. */
  readonly share: number;
}

export interface LinkResult {
  readonly id: string;
  /** A-weighted share of the receiver energy. */
  readonly share: number;
  readonly shareByBand: readonly number[];
  /** Exact A-weighted drop at the receiver if the link were perfect (dB); only for the top links. */
  readonly gainIfPerfectDb?: number;
  readonly gainIfPerfectByBandDb?: readonly number[];
}

export interface SolveResult {
  readonly bands: BandSetId;
  readonly frequenciesHz: readonly number[];
  readonly receiver: string;
  readonly sources: readonly string[];
  readonly levelsDb: readonly number[];
  readonly dba: number;
  readonly nc: NcRating;
  readonly spaces: readonly { id: string; levelsDb: readonly number[]; dba: number; fixed: boolean }[];
  readonly paths: readonly PathResult[];
  readonly pathsTruncated: boolean;
  /** Every link, largest share first. */
  readonly links: readonly LinkResult[];
  readonly shortfall?: Shortfall;
  readonly warnings: readonly string[];
  readonly solver: { readonly forward: SolveStats; readonly adjoint: SolveStats; readonly pathExpansions: number };
}

/** A solved base state kept for re-use (option evaluation, gains). */
export interface SolvedNetwork {
  readonly c: CompiledNetwork;
  readonly ex: Excitation;
  readonly base: BaseSolution;
  readonly aWeights: Float64Array;
  readonly forward: SolveStats;
  readonly adjoint: SolveStats;
}

/** Solve forward energies and the receiver adjoint for a compiled network. */
export function solveBase(c: CompiledNetwork, request: { source?: string; receiver: string; tolerance?: number }): SolvedNetwork {
  const ex = buildExcitation(c, selectSources(c, request.source));
  const receiver = receiverIndex(c, ex, request.receiver);
  const tolerance = request.tolerance ?? 1e-10;
  const fwd = solveEnergies(c, ex, { tolerance });
  // The adjoint weights shares, path bounds and error bounds; 1e-8 relative is ample for those.
  const unit = new Float64Array(c.n * c.B);
  unit.fill(1, receiver * c.B, receiver * c.B + c.B);
  const adj = solveEnergies(c, { fixed: ex.fixed, fixedEnergy: new Float64Array(c.n * c.B), injection: unit }, { tolerance: Math.max(tolerance, 1e-8) });
  if (!fwd.stats.converged || !adj.stats.converged) throw new NetworkSolveError(notConverged(c, fwd.stats));
  const base: BaseSolution = { c, ex, e: fwd.energy, z: adj.energy, receiver };
  return { c, ex, base, aWeights: aWeightsLinear(c.bands), forward: fwd.stats, adjoint: adj.stats };
}

function notConverged(c: CompiledNetwork, stats: SolveStats): string {
  const over = overTransmittingSpaces(c).map(
    (o) => `"${c.spaceIds[o.space]}" (${bandSet(c.bands).nominalHz[o.band]} Hz: its links transmit ${o.ratio.toFixed(2)}× its absorption area)`,
  );
  const why = stats.diverged ? "the power balance has no steady state" : `the solver did not converge in ${stats.sweeps} sweeps`;
  const hint = over.length > 0 ? `; these spaces give away more sound than they absorb: ${over.join(", ")} — their absorption_m2/rt60_s must include what leaves through their links` : "";
  return why + hint;
}

/** Warnings about the network that do not stop the solve. */
export function networkWarnings(c: CompiledNetwork): string[] {
  return overTransmittingSpaces(c).map(
    (o) => `space "${c.spaceIds[o.space]}": its links transmit ${o.ratio.toFixed(2)}× its absorption area at ${bandSet(c.bands).nominalHz[o.band]} Hz (absorption should include what leaves through the links)`,
  );
}

// Plain loops rather than Array.from: a result holds a row per link, and Array.from over typed
// arrays goes through the iterator protocol.
function levelsOf(e: Float64Array, from: number, B: number): number[] {
  const out = new Array<number>(B);
  for (let b = 0; b < B; b++) out[b] = energyToDb(e[from * B + b]!);
  return out;
}

function plainArray(v: Float64Array): number[] {
  const out = new Array<number>(v.length);
  for (let b = 0; b < v.length; b++) out[b] = v[b]!;
  return out;
}

function aSum(e: ArrayLike<number>, aWeights: Float64Array): number {
  let s = 0;
  for (let b = 0; b < aWeights.length; b++) s += aWeights[b]! * e[b]!;
  return s;
}

function gainsFor(s: SolvedNetwork, links: readonly number[]): Map<number, { a: number; byBand: number[] }> {
  const evaluator = new PerturbationEvaluator(s.base);
  const { c, base } = s;
  const er = base.e.subarray(base.receiver * c.B, base.receiver * c.B + c.B);
  const out = new Map<number, { a: number; byBand: number[] }>();
  for (const l of links) {
    // Below 10⁻¹² of the base (120 dB) the remainder is rounding: nothing else reaches the receiver.
    const after = receiverEnergyIfPerfect(evaluator, l).map((v, b) => (v <= er[b]! * 1e-12 ? 0 : v));
    out.set(l, {
      a: 10 * Math.log10(aSum(er, s.aWeights) / aSum(after, s.aWeights)),
      byBand: Array.from(after, (v, b) => 10 * Math.log10(er[b]! / v)),
    });
  }
  return out;
}

/** Solve a parsed network for a source and a receiver (see docs/acoustics-model.md). */
export function solveNetwork(network: Network, request: SolveRequest): SolveResult {
  return solveCompiled(compileNetwork(network), request).result;
}

/**
 * The same for a compiled network, also handing back the solved base state, so a caller that
 * evaluates further changes (exact gains of parts of a link) re-uses the forward and adjoint
 * solves instead of repeating them.
 */
export function solveCompiled(c: CompiledNetwork, request: SolveRequest): { result: SolveResult; solved: SolvedNetwork } {
  const s = solveBase(c, request);
  const { ex, base, aWeights } = s;
  const B = c.B;
  const r = base.receiver;
  const levels = spectrum(c.bands, levelsOf(base.e, r, B)) as Spectrum;
  const dba = aWeightedLevelDb(levels);
  const totalA = aSum(base.e.subarray(r * B, r * B + B), aWeights);
  const found = strongestPaths(c, ex, base.z, r, aWeights, { k: request.k ?? 10 });
  const shares = linkShares(c, ex, base.e, base.z, r, aWeights);
  const top = shares.slice(0, request.gains ?? 20).filter((sh) => sh.aWeighted > 0).map((sh) => sh.link);
  const gains = gainsFor(s, top);
  const result: SolveResult = {
    bands: c.bands,
    frequenciesHz: bandSet(c.bands).nominalHz,
    receiver: request.receiver,
    sources: ex.starts.map((st) => st.label),
    levelsDb: levels.values,
    dba,
    nc: ratingNc(levels),
    spaces: c.spaceIds.map((id, j) => ({
      id,
      levelsDb: levelsOf(base.e, j, B),
      dba: energyToDb(aSum(base.e.subarray(j * B, j * B + B), aWeights)),
      fixed: ex.fixed[j] === 1,
    })),
    paths: found.paths.map((p, i) => ({
      rank: i + 1,
      source: p.start.label,
      kind: p.start.kind,
      spaces: p.nodes.map((j) => c.spaceIds[j] as string),
      links: [...(p.start.floorLink >= 0 ? [p.start.floorLink] : []), ...p.links].map((l) => c.linkIds[l] as string),
      levelsDb: Array.from(p.energy, energyToDb),
      dba: energyToDb(p.aEnergy),
      share: totalA > 0 ? p.aEnergy / totalA : 0,
    })),
    pathsTruncated: found.truncated,
    links: shares.map((sh) => {
      const g = gains.get(sh.link);
      return {
        id: c.linkIds[sh.link] as string,
        share: sh.aWeighted,
        shareByBand: plainArray(sh.byBand),
        ...(g ? { gainIfPerfectDb: g.a, gainIfPerfectByBandDb: g.byBand } : {}),
      };
    }),
    ...(request.target ? { shortfall: shortfall(request.target, levels, dba) } : {}),
    warnings: networkWarnings(c),
    solver: { forward: s.forward, adjoint: s.adjoint, pathExpansions: found.expansions },
  };
  return { result, solved: s };
}
