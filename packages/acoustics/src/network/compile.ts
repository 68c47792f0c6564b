/**
 * A parsed network compiled to flat typed arrays for the solver: spaces indexed 0…n−1, links
 * 0…m−1, per-band absorption A (m²) and transmitting area τS (m²) laid out [index·B + band], and
 * the adjacency in compressed rows.
 */
import { bandCount, type BandSetId } from "../bands/bands.js";
import type { Link, Network, Space } from "./schema.js";
import { bandValue, linkTransmittingArea } from "./transmission.js";

export interface CompiledNetwork {
  readonly network: Network;
  readonly bands: BandSetId;
  /** Number of bands. */
  readonly B: number;
  readonly n: number;
  readonly m: number;
  readonly spaceIds: readonly string[];
  readonly spaceIndex: ReadonlyMap<string, number>;
  readonly linkIds: readonly string[];
  readonly linkIndex: ReadonlyMap<string, number>;
  /** Equivalent absorption area per space and band, m² (0 for outdoors). */
  readonly absorption: Float64Array;
  /** 1 for outdoors (free field: level fixed at zero energy unless a source). */
  readonly outdoors: Uint8Array;
  readonly linkA: Int32Array;
  readonly linkB: Int32Array;
  /** τ·S per link and band, m². Evaluators patch and restore rows; treat as read-only otherwise. */
  readonly weight: Float64Array;
  readonly adjStart: Int32Array;
  readonly adjNode: Int32Array;
  readonly adjLink: Int32Array;
}

/** Absorption area of a space at band b, m²: given, or Sabine A = 0.16·V/T. */
export function spaceAbsorptionAt(space: Space, b: number): number {
  if (space.absorption_m2 !== undefined) return bandValue(space.absorption_m2, b);
  if (space.rt60_s !== undefined && space.volume_m3 !== undefined) {
    return (0.16 * space.volume_m3) / bandValue(space.rt60_s, b);
  }
  return 0;
}

function buildAdjacency(n: number, linkA: Int32Array, linkB: Int32Array) {
  const m = linkA.length;
  const degree = new Int32Array(n + 1);
  for (let l = 0; l < m; l++) {
    degree[(linkA[l] as number) + 1]!++;
    degree[(linkB[l] as number) + 1]!++;
  }
  const adjStart = new Int32Array(n + 1);
  for (let j = 0; j < n; j++) adjStart[j + 1] = (adjStart[j] as number) + (degree[j + 1] as number);
  const fill = adjStart.slice(0, n);
  const adjNode = new Int32Array(2 * m);
  const adjLink = new Int32Array(2 * m);
  for (let l = 0; l < m; l++) {
    const a = linkA[l] as number;
    const b = linkB[l] as number;
    adjNode[fill[a]!] = b;
    adjLink[fill[a]!++] = l;
    adjNode[fill[b]!] = a;
    adjLink[fill[b]!++] = l;
  }
  return { adjStart, adjNode, adjLink };
}

export interface CompileOptions {
  /**
   * τ·S per band of a link when the caller already has it from `linkTransmittingArea` (a
   * builder that sized absorption with it); undefined computes it here.
   */
  readonly transmittingArea?: (link: Link) => ArrayLike<number> | undefined;
}

/** Compile a parsed (valid) network. */
export function compileNetwork(network: Network, options: CompileOptions = {}): CompiledNetwork {
  const B = bandCount(network.bands);
  const n = network.spaces.length;
  const m = network.links.length;
  const spaceIds = network.spaces.map((s) => s.id);
  const spaceIndex = new Map(spaceIds.map((id, i) => [id, i]));
  const absorption = new Float64Array(n * B);
  const outdoors = new Uint8Array(n);
  network.spaces.forEach((s, j) => {
    outdoors[j] = s.kind === "outdoors" ? 1 : 0;
    if (s.kind !== "outdoors") for (let b = 0; b < B; b++) absorption[j * B + b] = spaceAbsorptionAt(s, b);
  });
  const linkA = new Int32Array(m);
  const linkB = new Int32Array(m);
  const weight = new Float64Array(m * B);
  network.links.forEach((link, l) => {
    linkA[l] = spaceIndex.get(link.between[0]) as number;
    linkB[l] = spaceIndex.get(link.between[1]) as number;
    const known = options.transmittingArea?.(link);
    weight.set(known && known.length === B ? known : linkTransmittingArea(link, B), l * B);
  });
  const linkIds = network.links.map((l) => l.id);
  return {
    network,
    bands: network.bands,
    B,
    n,
    m,
    spaceIds,
    spaceIndex,
    linkIds,
    linkIndex: new Map(linkIds.map((id, i) => [id, i])),
    absorption,
    outdoors,
    linkA,
    linkB,
    weight,
    ...buildAdjacency(n, linkA, linkB),
  };
}
