/** How a catalogue curve was obtained, in words for the report. */
export interface SourceNote {
  /** `published`: band data as published; `shaped`: band curve fitted to published octave or single-number data; `estimate`: engine estimate from physical properties; `typical`: a typical assumption. */
  kind: "published" | "shaped" | "estimate" | "typical";
  note: string;
}

export type ConstructionCategory = "wall" | "door" | "window" | "floor" | "ceiling";

/** A building element type with its airborne (and for floors, impact) performance per one-third-octave band 50–5000 Hz. */
export interface Construction {
  id: string;
  name: string;
  category: ConstructionCategory;
  thicknessMm: number;
  surfaceDensityKgM2: number;
  /** Transmission loss per band, dB (21 bands 50–5000 Hz). */
  tlDb: number[];
  /** Normalized impact sound pressure level per band of the bare floor, dB (floors only). */
  impactLnDb?: number[];
  source: SourceNote;
}

/** A floor covering (carpet, underlay, floating layer): improvement of impact level per band, dB. */
export interface Covering {
  id: string;
  name: string;
  thicknessMm: number;
  deltaLDb: number[];
  source: SourceNote;
}

/** A duct silencer or baffle: insertion loss per band, dB. */
export interface Silencer {
  id: string;
  name: string;
  lengthM: number;
  insertionLossDb: number[];
  source: SourceNote;
}

/** Everything the builder looks up by id. Firms extend it with `catalogueWith`. */
export interface Catalogue {
  constructions: Record<string, Construction>;
  coverings: Record<string, Covering>;
  silencers: Record<string, Silencer>;
}

/** A catalogue with extra entries added or replacing same-id ones (no unit). */
export function catalogueWith(base: Catalogue, extra: Partial<{ [K in keyof Catalogue]: Array<Catalogue[K][string]> }>): Catalogue {
  const out: Catalogue = { constructions: { ...base.constructions }, coverings: { ...base.coverings }, silencers: { ...base.silencers } };
  for (const c of extra.constructions ?? []) out.constructions[c.id] = c;
  for (const c of extra.coverings ?? []) out.coverings[c.id] = c;
  for (const s of extra.silencers ?? []) out.silencers[s.id] = s;
  return out;
}
