/**
 * Construction catalogue: band transmission loss for common constructions, each with its source.
 * Entries with only a published single number (STC) get band values shaped like the STC contour
 * and are labelled as estimates; octave data are spread to one-third octaves by interpolation on
 * a log-frequency axis (also labelled).
 */
import { OCTAVE, THIRD_OCTAVE, type BandSetId } from "../bands/bands.js";
import { spectrum, type Spectrum } from "../bands/spectrum.js";
import { STC_CONTOUR_DB } from "../ratings/stc.js";

export interface CatalogueEntry {
  readonly id: string;
  readonly name: string;
  /** Band data as published: octave TL 63–8000 Hz, or a single STC. */
  readonly data: { readonly octaveTlDb: readonly number[] } | { readonly stc: number };
  readonly source: string;
}

const BHH = "Bies, Hansen & Howard, Engineering Noise Control, 5th ed., Table 7.6";
const SPRINGER = "Springer Handbook of Acoustics, 2014, Table 11.4";
const HARRIS = "Harris, Handbook of Acoustical Measurements and Noise Control, 3rd ed.";

export const CONSTRUCTION_CATALOGUE: readonly CatalogueEntry[] = Object.freeze([
  { id: "glass-6mm", name: "6 mm glass", data: { octaveTlDb: [17, 11, 24, 28, 32, 27, 35, 39] }, source: BHH },
  { id: "door-solid-hardwood", name: "Solid hardwood door as hung", data: { octaveTlDb: [13, 17, 21, 26, 29, 31, 34, 32] }, source: BHH },
  { id: "concrete-100mm", name: "100 mm concrete", data: { octaveTlDb: [32, 37, 36, 45, 52, 59, 62, 63] }, source: BHH },
  { id: "wood-stud-gypsum", name: "Wood studs, 12.7 mm gypsum both sides", data: { stc: 33 }, source: SPRINGER },
  { id: "wood-stud-gypsum-insulated", name: "Wood studs, 12.7 mm gypsum both sides, insulation", data: { stc: 37 }, source: SPRINGER },
  { id: "wood-stud-double-gypsum", name: "Wood studs, double gypsum layers", data: { stc: 41 }, source: SPRINGER },
  { id: "staggered-stud-insulated", name: "Staggered studs with insulation", data: { stc: 48 }, source: SPRINGER },
  { id: "steel-stud-gypsum", name: "Steel studs, gypsum both sides", data: { stc: 39 }, source: SPRINGER },
  { id: "steel-stud-gypsum-insulated", name: "Steel studs, gypsum both sides, insulation", data: { stc: 45 }, source: SPRINGER },
  { id: "masonry-block-200mm", name: "200 mm masonry block", data: { stc: 53 }, source: SPRINGER },
  { id: "brick-100mm", name: "100 mm brick", data: { stc: 45 }, source: SPRINGER },
  { id: "glass-3mm", name: "3 mm glass", data: { stc: 26 }, source: SPRINGER },
  { id: "glass-laminated-12mm", name: "12.7 mm laminated glass", data: { stc: 40 }, source: SPRINGER },
  { id: "glazing-double-3-50-3", name: "Double 3 mm glass, 50 mm gap", data: { stc: 37 }, source: SPRINGER },
  { id: "door-hollow-wood", name: "Hollow wood door", data: { stc: 19 }, source: SPRINGER },
  { id: "door-solid-wood", name: "Solid wood door", data: { stc: 34 }, source: SPRINGER },
  { id: "door-hollow-unsealed", name: "Hollow-core door, unsealed", data: { stc: 17 }, source: HARRIS },
  { id: "door-hollow-sealed", name: "Hollow-core door, sealed", data: { stc: 20 }, source: HARRIS },
  { id: "door-solid-unsealed", name: "Solid-core door, unsealed", data: { stc: 20 }, source: HARRIS },
  { id: "door-solid-sealed", name: "Solid-core door, sealed", data: { stc: 28 }, source: HARRIS },
  { id: "wood-joist-floor", name: "Wood-joist floor/ceiling", data: { stc: 37 }, source: SPRINGER },
  { id: "concrete-slab-200mm", name: "200 mm concrete slab", data: { stc: 50 }, source: SPRINGER },
] satisfies CatalogueEntry[]);

export interface CatalogueTl {
  readonly entry: CatalogueEntry;
  readonly tl: Spectrum;
  /** True when the band values are not the published data themselves. */
  readonly estimate: boolean;
  readonly basis: string;
}

/** Linear interpolation of y over log f, extrapolating with the end slopes. */
function interpolateLogF(xsHz: readonly number[], ys: readonly number[], atHz: number): number {
  const lx = xsHz.map(Math.log10);
  const x = Math.log10(atHz);
  let k = 0;
  while (k < lx.length - 2 && x > (lx[k + 1] as number)) k++;
  const x0 = lx[k] as number;
  const x1 = lx[k + 1] as number;
  const y0 = ys[k] as number;
  const y1 = ys[k + 1] as number;
  return y0 + ((y1 - y0) * (x - x0)) / (x1 - x0);
}

/**
 * TL values shaped like the STC contour that rate exactly `stc`, 50–5000 Hz: the contour placed
 * 2 dB lower (16 bands × 2 dB = the 32 dB allowance), its slope continued below 125 Hz, flat
 * above 4000 Hz.
 */
export function stcShapedThirdOctaveTl(stc: number): number[] {
  const core = STC_CONTOUR_DB.map((c) => stc - 2 + c);
  const low = [core[0]! - 12, core[0]! - 9, core[0]! - 6, core[0]! - 3];
  return [...low, ...core, core[15]!].map((v) => Math.max(0, v));
}

/** A catalogue entry's TL in the requested band set (dB). */
export function catalogueTl(id: string, bands: BandSetId): CatalogueTl {
  const entry = CONSTRUCTION_CATALOGUE.find((e) => e.id === id);
  if (entry === undefined) throw new RangeError(`unknown construction "${id}"`);
  if ("stc" in entry.data) {
    const third = stcShapedThirdOctaveTl(entry.data.stc);
    const values = bands === "third-octave" ? third : octaveFromThirdTl(third);
    return { entry, tl: spectrum(bands, values), estimate: true, basis: `estimate shaped like the STC ${entry.data.stc} contour` };
  }
  const oct = entry.data.octaveTlDb;
  if (bands === "octave") return { entry, tl: spectrum("octave", oct), estimate: false, basis: "published octave data" };
  const third = THIRD_OCTAVE.nominalHz.map((hz) => interpolateLogF(OCTAVE.nominalHz, oct, hz));
  return { entry, tl: spectrum("third-octave", third), estimate: true, basis: "interpolated from published octave data" };
}

/** Octave TL from one-third-octave TL: −10·lg of the mean τ of the three bands; 8 kHz repeats 4 kHz. */
export function octaveFromThirdTl(thirdDb: readonly number[]): number[] {
  const out: number[] = [];
  for (let k = 0; k < 7; k++) {
    let tau = 0;
    for (let j = 0; j < 3; j++) tau += Math.pow(10, -(thirdDb[3 * k + j] as number) / 10);
    out.push(-10 * Math.log10(tau / 3));
  }
  out.push(out[6] as number);
  return out;
}
