import { ratingIic, ratingLnw, ratingOitc, ratingRw, ratingStc } from "@hushmark/acoustics";
import { BANDS_HZ } from "./bands.js";
import type { Construction, Covering } from "./types.js";

const table = (values: readonly number[]) => new Map(BANDS_HZ.map((hz, i) => [hz, values[i]!]));

/** Single-number ratings of a construction by the engine (STC, Rw with C/Ctr, OITC; floors Ln,w and IIC), dB. */
export function constructionRatings(c: Construction): { stc: number; rw: number; c: number; ctr: number; oitc: number; lnw?: number; iic?: number } {
  const rw = ratingRw(table(c.tlDb));
  return {
    stc: ratingStc(table(c.tlDb)).value,
    rw: rw.value,
    c: rw.c,
    ctr: rw.ctr,
    oitc: ratingOitc(table(c.tlDb)).value,
    ...(c.impactLnDb ? { lnw: ratingLnw(table(c.impactLnDb)).value, iic: ratingIic(table(c.impactLnDb)).value } : {}),
  };
}

/** Heavyweight reference floor of ISO 717-2, 100–3150 Hz (Ln,r,0,w = 78 dB), dB. */
const REFERENCE_FLOOR_DB = [67.0, 67.5, 68.0, 68.5, 69.0, 69.5, 70.0, 70.5, 71.0, 71.5, 72.0, 72.0, 72.0, 72.0, 72.0, 72.0];

/** Weighted impact improvement of a covering, dB: ΔLw = 78 − Ln,r,w on the ISO 717-2 reference floor. */
export function coveringDeltaLwDb(covering: Covering): number {
  const first = BANDS_HZ.indexOf(100);
  const lnr = new Map(REFERENCE_FLOOR_DB.map((v, k) => [BANDS_HZ[first + k]!, v - covering.deltaLDb[first + k]!]));
  return 78 - ratingLnw(lnr).value;
}
