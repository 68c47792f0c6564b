/**
 * The upgrade planner: one solved base network and a list of options; evaluates any combination
 * exactly (receiver levels by the warm-started perturbation solve of network/perturb.ts).
 */
import { energyToDb } from "../bands/levels.js";
import { spectrum, type Spectrum } from "../bands/spectrum.js";
import { aWeightedLevelDb } from "../bands/weighting.js";
import { ratingNc } from "../ratings/nc.js";
import { compileNetwork, type CompiledNetwork } from "../network/compile.js";
import { PerturbationEvaluator, type Perturbation, type InjectionChange, type LinkWeightChange } from "../network/perturb.js";
import type { Link, Network } from "../network/schema.js";
import { solveBase, type SolvedNetwork } from "../network/solve.js";
import { shortfall, type Shortfall, type Target } from "../network/targets.js";
import { impactSourceTerm, linkTransmittingArea } from "../network/transmission.js";
import { applyAction } from "./apply.js";
import { upgradeCautions, type Caution } from "./cautions.js";
import { optionCosts, type OptionCosts } from "./costs.js";
import type { UpgradeFlag, UpgradeOption } from "./schema.js";

export interface UpgradeRequest {
  readonly source?: string;
  readonly receiver: string;
  readonly target?: Target;
}

export interface PreparedOption {
  readonly option: UpgradeOption;
  readonly link: number;
  readonly costs: OptionCosts;
  readonly cautions: readonly Caution[];
}

export interface CombinationResult {
  readonly options: readonly string[];
  readonly levelsDb: readonly number[];
  readonly dba: number;
  /** A-weighted drop at the receiver against the existing network, dB. */
  readonly gainDb: number;
  readonly nc: number;
  readonly shortfall?: Shortfall;
  readonly cost: number;
  readonly labourH: number;
  readonly floorAreaLostM2: number;
  readonly flags: readonly UpgradeFlag[];
  readonly cautions: readonly Caution[];
}

export class UpgradePlanner {
  readonly c: CompiledNetwork;
  readonly solved: SolvedNetwork;
  readonly evaluator: PerturbationEvaluator;
  readonly prepared: readonly PreparedOption[];
  readonly baseEnergy: Float64Array;
  readonly baseAEnergy: number;
  readonly baseDba: number;

  constructor(
    readonly network: Network,
    options: readonly UpgradeOption[],
    readonly request: UpgradeRequest,
  ) {
    this.c = compileNetwork(network);
    this.solved = solveBase(this.c, request);
    this.evaluator = new PerturbationEvaluator(this.solved.base, 1e-9);
    this.prepared = options.map((option) => {
      const link = this.c.linkIndex.get(option.link);
      if (link === undefined) throw new RangeError(`option "${option.id}": no link "${option.link}"`);
      return { option, link, costs: optionCosts(option, network.links[link] as Link), cautions: upgradeCautions(option, network) };
    });
    const { e, receiver } = this.solved.base;
    this.baseEnergy = e.slice(receiver * this.c.B, receiver * this.c.B + this.c.B);
    this.baseAEnergy = this.aEnergy(this.baseEnergy);
    this.baseDba = energyToDb(this.baseAEnergy);
  }

  /** Σ a_b·e_b of receiver band energies. */
  aEnergy(e: ArrayLike<number>): number {
    const a = this.solved.aWeights;
    let s = 0;
    for (let b = 0; b < a.length; b++) s += a[b]! * e[b]!;
    return s;
  }

  /** The network change of a set of options (several on one link apply in order). */
  perturbation(indices: readonly number[], clipped = false): Perturbation {
    const byLink = new Map<number, UpgradeOption[]>();
    for (const i of indices) {
      const p = this.prepared[i] as PreparedOption;
      byLink.set(p.link, [...(byLink.get(p.link) ?? []), p.option]);
    }
    const links: LinkWeightChange[] = [];
    const injections: InjectionChange[] = [];
    const { B } = this.c;
    for (const [l, opts] of byLink) {
      const before = this.network.links[l] as Link;
      const after = opts.reduce((link, o) => applyAction(link, o.action), before);
      const weight = linkTransmittingArea(after, B);
      if (clipped) for (let b = 0; b < B; b++) weight[b] = Math.min(weight[b]!, this.c.weight[l * B + b]!);
      links.push({ link: l, weight });
      if (after.type === "floor" && before.type === "floor") injections.push(...this.impactChanges(l, before, after, clipped));
    }
    return { links, injections };
  }

  private impactChanges(l: number, before: Link & { type: "floor" }, after: Link & { type: "floor" }, clipped: boolean): InjectionChange[] {
    const node = this.c.linkB[l] as number;
    return this.solved.ex.sources.flatMap((s) => {
      if (s.type !== "impact" || s.floor !== before.id) return [];
      const t0 = impactSourceTerm(before, s, this.c.B);
      const t1 = impactSourceTerm(after, s, this.c.B);
      return [{ node, delta: t1.map((v, b) => (clipped ? Math.min(0, v - t0[b]!) : v - t0[b]!)) }];
    });
  }

  /** Receiver band energies with the options applied (exact). */
  receiverEnergy(indices: readonly number[], clipped = false): Float64Array {
    if (indices.length === 0) return this.baseEnergy;
    return this.evaluator.receiverEnergy(this.perturbation(indices, clipped));
  }

  totals(indices: readonly number[]): { cost: number; labourH: number; floorAreaLostM2: number } {
    let cost = 0;
    let labourH = 0;
    let floorAreaLostM2 = 0;
    for (const i of indices) {
      const k = (this.prepared[i] as PreparedOption).costs;
      cost += k.cost;
      labourH += k.labourH;
      floorAreaLostM2 += k.floorAreaLostM2;
    }
    return { cost, labourH, floorAreaLostM2 };
  }

  /** Levels, single figures, costs, flags and cautions of a combination. */
  describe(indices: readonly number[], energy = this.receiverEnergy(indices)): CombinationResult {
    const levels = spectrum(this.c.bands, Array.from(energy, energyToDb)) as Spectrum;
    const dba = aWeightedLevelDb(levels);
    const picked = indices.map((i) => this.prepared[i] as PreparedOption);
    const cautions = new Map<string, Caution>();
    for (const p of picked) for (const c of p.cautions) cautions.set(`${c.code}:${c.text}`, c);
    return {
      options: picked.map((p) => p.option.id),
      levelsDb: levels.values,
      dba,
      gainDb: this.baseDba - dba,
      nc: ratingNc(levels).value,
      ...(this.request.target ? { shortfall: shortfall(this.request.target, levels, this.baseDba) } : {}),
      ...this.totals(indices),
      flags: [...new Set(picked.flatMap((p) => p.option.flags))],
      cautions: [...cautions.values()],
    };
  }

  /** The same planner (shared solution and evaluator) with no target: searches then maximise the gain. */
  withoutTarget(): UpgradePlanner {
    const view = Object.create(this) as UpgradePlanner;
    Object.defineProperty(view, "request", { value: { ...this.request, target: undefined } });
    return view;
  }

  /** True when the receiver energies meet the request's target (false without a target). */
  meetsTarget(energy: Float64Array): boolean {
    if (!this.request.target) return false;
    const levels = spectrum(this.c.bands, Array.from(energy, energyToDb)) as Spectrum;
    return shortfall(this.request.target, levels, this.baseDba).met;
  }
}
