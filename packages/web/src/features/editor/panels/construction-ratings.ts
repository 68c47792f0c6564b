import { ratingOitc, ratingRw, ratingStc } from "@hushmark/acoustics";
import { BANDS_HZ, constructionCatalogue, type Construction, type ConstructionCategory } from "@hushmark/floorplan";

export interface RatedConstruction {
  construction: Construction;
  stc: number | null;
  rw: number | null;
  oitc: number | null;
}

const cache = new Map<string, RatedConstruction>();

function safe(fn: () => number): number | null {
  try {
    const v = fn();
    return Number.isFinite(v) ? Math.round(v) : null;
  } catch {
    return null;
  }
}

/** A catalogue entry with its single-number ratings computed from its band curve (STC per ASTM E413, Rw per ISO 717-1, OITC per ASTM E1332). */
export function rated(c: Construction): RatedConstruction {
  const hit = cache.get(c.id);
  if (hit) return hit;
  const table = new Map(BANDS_HZ.map((hz, i) => [hz, c.tlDb[i] ?? Number.NaN]));
  const r = { construction: c, stc: safe(() => ratingStc(table).value), rw: safe(() => ratingRw(table).value), oitc: safe(() => ratingOitc(table).value) };
  cache.set(c.id, r);
  return r;
}

export function constructionsOf(category: ConstructionCategory): RatedConstruction[] {
  return Object.values(constructionCatalogue.constructions).filter((c) => c.category === category).map(rated);
}

export function constructionName(id: string): string {
  return constructionCatalogue.constructions[id]?.name ?? id;
}

export const sourceKindLabel: Record<Construction["source"]["kind"], string> = {
  published: "Published data",
  shaped: "Fitted to published ratings",
  estimate: "Estimated from the build-up",
  typical: "Typical assumption",
};
