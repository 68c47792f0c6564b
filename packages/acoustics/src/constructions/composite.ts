/**
 * Composite transmission loss of a partition made of parts (ISO 12354-1 / textbook area
 * weighting): TLc = −10·lg(Σ Si·τi / Σ Si), τ = 10^(−TL/10), τ = 1 for open area, and for small
 * elements rated by Dn,e: τ·S = (A0/S)·10^(−Dn,e/10)·S, A0 = 10 m².
 */
import { tauOfTl } from "../bands/levels.js";

export const DNE_REFERENCE_AREA_M2 = 10;

export type CompositePart =
  | { readonly areaM2: number; readonly tlDb: number }
  | { readonly areaM2: number; readonly open: true }
  | { readonly areaM2: number; readonly dneDb: number };

/** Transmitting area τ·S in m² of one part at one band. */
export function partTransmittingAreaM2(part: CompositePart): number {
  if ("open" in part) return part.areaM2;
  if ("dneDb" in part) return DNE_REFERENCE_AREA_M2 * tauOfTl(part.dneDb);
  return part.areaM2 * tauOfTl(part.tlDb);
}

/** Composite TL in dB of parts at one band; the area S is the sum of part areas. */
export function compositeTransmissionLossDb(parts: readonly CompositePart[]): number {
  let area = 0;
  let tauS = 0;
  for (const p of parts) {
    area += p.areaM2;
    tauS += partTransmittingAreaM2(p);
  }
  if (area <= 0) throw new RangeError("composite transmission loss needs a positive total area");
  return -10 * Math.log10(tauS / area);
}
