import { BANDS_EXACT_HZ, BANDS_HZ, OCTAVES_HZ, rounded, thirdOctavesFromOctaves } from "../catalogue/bands.js";
import type { Silencer } from "../catalogue/types.js";
import type { Duct } from "../document/schema.js";

/**
 * Attenuation of a 50 mm lined rectangular duct (perimeter/area 13.1 m⁻¹) at 63…8000 Hz, dB/m
 * (an HVAC acoustics guide reproducing a handbook table), interpolated to third octaves.
 */
export const LINED_DUCT_DB_PER_M = rounded(thirdOctavesFromOctaves(OCTAVES_HZ, [1.8, 2.0, 3.2, 6.9, 15.4, 14.1, 9.5, 7.2]));
/** Bare sheet-metal duct: about 0.3 dB/m up to 250 Hz and 0.1 dB/m above (common practice, from memory). */
export const BARE_DUCT_DB_PER_M = BANDS_HZ.map((f) => (f <= 250 ? 0.3 : 0.1));
/** One unlined square bend: 0 dB below 250 Hz, 1 dB to 400 Hz, 2 dB to 800 Hz, 3 dB above (common practice). */
export const BEND_DB = BANDS_HZ.map((f) => (f < 250 ? 0 : f <= 400 ? 1 : f <= 800 ? 2 : 3));
/** Speed of sound used for end reflection, m/s. */
const C_M_S = 343;

/**
 * End reflection at a grille flush with a wall or ceiling, dB: 10·lg[1 + (0.7·c/(π·f·D))²] with
 * D the equivalent diameter of the opening (an HVAC handbook form, from memory).
 */
export function endReflectionDb(openAreaM2: number): number[] {
  const d = Math.sqrt((4 * openAreaM2) / Math.PI);
  return BANDS_EXACT_HZ.map((f) => 10 * Math.log10(1 + ((0.7 * C_M_S) / (Math.PI * f * d)) ** 2));
}

/** The pieces of a duct run's attenuation per band, dB: lining × length, bends, silencer, end reflection. */
export function ductAttenuationParts(duct: Duct, crossSectionM2: number, silencer: Silencer | undefined): Array<{ name: string; attenuation_db: number[] }> {
  const perM = duct.lining === "lined" ? LINED_DUCT_DB_PER_M : BARE_DUCT_DB_PER_M;
  const parts = [{ name: `${duct.lengthM} m ${duct.lining} duct`, attenuation_db: rounded(perM.map((a) => a * duct.lengthM)) }];
  if (duct.bends > 0) parts.push({ name: `${duct.bends} bend${duct.bends > 1 ? "s" : ""}`, attenuation_db: BEND_DB.map((a) => a * duct.bends) });
  if (silencer) parts.push({ name: silencer.name, attenuation_db: [...silencer.insertionLossDb] });
  parts.push({ name: "end reflection at the grille", attenuation_db: rounded(endReflectionDb(crossSectionM2)) });
  return parts;
}

/** Sum of attenuation pieces per band, dB. */
export function totalAttenuationDb(parts: ReadonlyArray<{ attenuation_db: readonly number[] }>): number[] {
  return BANDS_HZ.map((_, i) => Math.round(parts.reduce((s, p) => s + p.attenuation_db[i]!, 0) * 100) / 100);
}
