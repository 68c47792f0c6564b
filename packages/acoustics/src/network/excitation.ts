/**
 * The excitation of a solve: which spaces have fixed levels (airborne sources, and outdoors at
 * zero energy), and the power terms of impact sources in the spaces below floors.
 */
import { dbToEnergy } from "../bands/levels.js";
import type { CompiledNetwork } from "./compile.js";
import type { Source } from "./schema.js";
import { impactSourceTerm } from "./transmission.js";

/** Thrown for a solve request the network cannot answer (unknown ids, receiver is a source …). */
export class NetworkRequestError extends Error {
  override readonly name = "NetworkRequestError";
}

/** Thrown when the power balance has no steady state or the solver does not converge. */
export class NetworkSolveError extends Error {
  override readonly name = "NetworkSolveError";
}

/** Where a path starts: an airborne source space, or the space below an impacted floor. */
export interface PathStart {
  readonly kind: "airborne" | "impact";
  /** Source label: its id, else its space (airborne) or floor (impact). */
  readonly label: string;
  readonly node: number;
  /** Floor link index for impact starts, else −1. */
  readonly floorLink: number;
  /** Energy per band at the start node due to this source alone (direct impact field for impact). */
  readonly energy: Float64Array;
}

export interface Excitation {
  /** 1 where the level is fixed: airborne source spaces and (non-source) outdoors. */
  readonly fixed: Uint8Array;
  /** Fixed energy per space and band (10^(L/10)); zero for outdoors. */
  readonly fixedEnergy: Float64Array;
  /** Source term b per space and band (impact), m²·energy. */
  readonly injection: Float64Array;
  readonly starts: readonly PathStart[];
  readonly sources: readonly Source[];
}

function sourceLabel(s: Source): string {
  return s.id ?? (s.type === "airborne" ? s.space : s.floor);
}

/** The sources a request names: a source id, the space of an airborne source, or the floor of an impact source; all when omitted. */
export function selectSources(c: CompiledNetwork, sourceId?: string): Source[] {
  const all = c.network.sources;
  if (sourceId === undefined) {
    if (all.length === 0) throw new NetworkRequestError("the network has no sources");
    return [...all];
  }
  const byId = all.filter((s) => s.id === sourceId);
  if (byId.length > 0) return byId;
  const bySpace = all.filter((s) => s.type === "airborne" && s.space === sourceId);
  if (bySpace.length > 0) return bySpace;
  const byFloor = all.filter((s) => s.type === "impact" && s.floor === sourceId);
  if (byFloor.length > 0) return byFloor;
  const hint = c.spaceIndex.has(sourceId) ? ` (space "${sourceId}" exists but has no source spectrum)` : "";
  throw new NetworkRequestError(`no source "${sourceId}"${hint}; sources: ${all.map(sourceLabel).join(", ") || "none"}`);
}

/** Build the excitation for the selected sources. */
export function buildExcitation(c: CompiledNetwork, sources: readonly Source[]): Excitation {
  const { n, B } = c;
  const fixed = Uint8Array.from(c.outdoors);
  const fixedEnergy = new Float64Array(n * B);
  const injection = new Float64Array(n * B);
  const starts: PathStart[] = [];
  for (const s of sources) {
    if (s.type === "airborne") {
      const j = c.spaceIndex.get(s.space) as number;
      fixed[j] = 1;
      const energy = Float64Array.from(s.levels_db, dbToEnergy);
      fixedEnergy.set(energy, j * B);
      starts.push({ kind: "airborne", label: sourceLabel(s), node: j, floorLink: -1, energy });
      continue;
    }
    const l = c.linkIndex.get(s.floor) as number;
    const floor = c.network.links[l];
    if (floor?.type !== "floor") throw new NetworkRequestError(`impact source "${s.floor}" is not on a floor link`);
    const below = c.linkB[l] as number;
    const term = impactSourceTerm(floor, s, B);
    const energy = new Float64Array(B);
    for (let b = 0; b < B; b++) {
      injection[below * B + b]! += term[b] as number;
      energy[b] = (term[b] as number) / (c.absorption[below * B + b] as number);
    }
    starts.push({ kind: "impact", label: sourceLabel(s), node: below, floorLink: l, energy });
  }
  for (const st of starts) {
    if (st.kind === "impact" && fixed[st.node]) {
      throw new NetworkRequestError(`impact source "${st.label}": the space below is ${c.outdoors[st.node] ? "outdoors" : "an airborne source"}`);
    }
  }
  return { fixed, fixedEnergy, injection, starts, sources };
}

/** Index of the receiver space; it must not be fixed (a source or outdoors). */
export function receiverIndex(c: CompiledNetwork, ex: Excitation, receiverId: string): number {
  const r = c.spaceIndex.get(receiverId);
  if (r === undefined) throw new NetworkRequestError(`no space "${receiverId}" for the receiver; spaces: ${c.spaceIds.join(", ")}`);
  if (c.outdoors[r]) throw new NetworkRequestError(`receiver "${receiverId}" is outdoors (a free field has no level to solve)`);
  if (ex.fixed[r]) throw new NetworkRequestError(`receiver "${receiverId}" is a source space`);
  return r;
}
