import type { Part } from "@hushmark/acoustics";
import type { Construction } from "../catalogue/types.js";
import type { Leaks, Opening } from "../document/schema.js";

/** Seals recorded as cracked count as a gap of this width round the sides and head, mm (common practice assumption). */
export const CRACKED_SEAL_GAP_MM = 1.5;

/** Open areas of a door's or window's leaks, m²: undercut = width × gap; perimeter = (2·height + width) × gap. */
export function leakAreasM2(o: { widthM: number; heightM: number; type: Opening["type"] }, leaks: Leaks | undefined): { undercutM2: number; perimeterM2: number } {
  if (!leaks) return { undercutM2: 0, perimeterM2: 0 };
  const undercutM2 = o.type === "door" ? (o.widthM * leaks.undercutMm) / 1000 : 0;
  const gapMm = leaks.perimeterGapMm + (leaks.sealsCracked ? CRACKED_SEAL_GAP_MM : 0);
  // A door's perimeter gap runs up both jambs and across the head; a window's all round.
  const runM = o.type === "door" ? 2 * o.heightM + o.widthM : 2 * (o.heightM + o.widthM);
  return { undercutM2, perimeterM2: (runM * gapMm) / 1000 };
}

/** A per-band part of a wall link from a catalogue construction. */
export function tlPart(id: string, ref: string, kind: "wall" | "door" | "window" | "ceiling" | "floor", name: string, areaM2: number, c: Construction): Part {
  return { id, ref, kind, name, area_m2: areaM2, tl_db: c.tlDb, construction: c.id, ...(c.source.kind === "estimate" ? { estimate: true } : {}) };
}

/**
 * The parts one opening adds to its wall: the leaf or glazing (its area less its gaps) and each
 * gap as an open part, all with `ref` the opening's id; penetrations are one open part.
 */
export function openingParts(o: Opening, construction: Construction | undefined): { parts: Part[]; holeM2: number } {
  if (o.type === "penetration") {
    return { parts: o.openAreaM2 > 0 ? [{ id: `${o.id}:open`, ref: o.id, kind: "gap", name: o.name ?? o.what, area_m2: o.openAreaM2, open: true }] : [], holeM2: o.openAreaM2 };
  }
  const hole = o.widthM * o.heightM;
  const { undercutM2, perimeterM2 } = leakAreasM2(o, o.leaks);
  const parts: Part[] = [];
  const leafM2 = Math.max(hole - undercutM2 - perimeterM2, 0);
  if (construction && leafM2 > 0) parts.push(tlPart(`${o.id}:leaf`, o.id, o.type, o.name ?? construction.name, leafM2, construction));
  if (undercutM2 > 0) parts.push({ id: `${o.id}:undercut`, ref: o.id, kind: "gap", name: "gap under the door", area_m2: undercutM2, open: true });
  if (perimeterM2 > 0) parts.push({ id: `${o.id}:perimeter`, ref: o.id, kind: "gap", name: o.leaks?.sealsCracked ? "cracked seals and perimeter gap" : "perimeter gap", area_m2: perimeterM2, open: true });
  return { parts, holeM2: hole };
}
