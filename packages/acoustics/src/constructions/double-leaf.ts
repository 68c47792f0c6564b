/**
 * Double-leaf transmission loss estimates (two leaves on separate or light studs with an air
 * cavity): mass–air–mass resonance and Sharp's three-region model (Bies, Hansen & Howard,
 * Engineering Noise Control, 5th ed., 7.2.3). Estimates, labelled as such.
 */
import { AIR_DENSITY_KG_M3, SPEED_OF_SOUND_M_S } from "./air.js";
import { singleLeafTlDb, type SingleLeafInput } from "./single-leaf.js";

/**
 * Mass–air–mass resonance f0 = (1/2π)·√(ρ0·c0²·(1/m1 + 1/m2)/d) in Hz (m in kg/m², d in m);
 * ≈ 60·√((1/m1 + 1/m2)/d).
 */
export function massAirMassResonanceHz(m1KgM2: number, m2KgM2: number, cavityM: number): number {
  const k = AIR_DENSITY_KG_M3 * SPEED_OF_SOUND_M_S * SPEED_OF_SOUND_M_S;
  return Math.sqrt((k * (1 / m1KgM2 + 1 / m2KgM2)) / cavityM) / (2 * Math.PI);
}

export interface DoubleLeafInput {
  readonly leaf1: SingleLeafInput;
  readonly leaf2: SingleLeafInput;
  readonly cavityM: number;
  /** Porous absorber in the cavity (Sharp's model assumes it; without it the mid region is lowered by 5 dB, an approximation). */
  readonly cavityAbsorption: boolean;
}

/**
 * TL in dB at f (Hz): below f0 the two leaves act as one mass, 20·lg((m1+m2)·f) − 47; between f0
 * and fl = c0/(2π·d) R1 + R2 + 20·lg(f·d) − 29; above fl R1 + R2 + 6 (Sharp). R1, R2 are the
 * single-leaf TLs with coincidence.
 */
export function doubleLeafTlDb(input: DoubleLeafInput, fHz: number): number {
  const { leaf1, leaf2, cavityM: d } = input;
  const m = leaf1.surfaceDensityKgM2 + leaf2.surfaceDensityKgM2;
  const f0 = massAirMassResonanceHz(leaf1.surfaceDensityKgM2, leaf2.surfaceDensityKgM2, d);
  const fl = SPEED_OF_SOUND_M_S / (2 * Math.PI * d);
  const together = 20 * Math.log10(m * fHz) - 47;
  if (fHz <= f0) return Math.max(0, together);
  const r1 = singleLeafTlDb(leaf1, fHz);
  const r2 = singleLeafTlDb(leaf2, fHz);
  const penalty = input.cavityAbsorption ? 0 : 5;
  const mid = fHz < fl ? r1 + r2 + 20 * Math.log10(fHz * d) - 29 : r1 + r2 + 6;
  return Math.max(mid - penalty, 0);
}
