/** Level arithmetic on decibels (re 20 µPa for pressure levels). */

/** Energy (mean-square ratio) of a level in dB: 10^(L/10). */
export function dbToEnergy(levelDb: number): number {
  return Math.pow(10, levelDb / 10);
}

/** Level in dB of an energy ratio: 10·lg(e); −Infinity for zero energy. */
export function energyToDb(energy: number): number {
  return 10 * Math.log10(energy);
}

/** Energetic sum in dB: L = 10·lg Σ 10^(Li/10) (an empty list gives −Infinity). */
export function energySumDb(levelsDb: readonly number[]): number {
  let sum = 0;
  for (const l of levelsDb) sum += dbToEnergy(l);
  return energyToDb(sum);
}

/**
 * Energetic difference in dB: the level that added to `partDb` gives `totalDb`, 10·lg(10^(Lt/10) − 10^(Lp/10)).
 * Throws when the part exceeds the total (no real level would do).
 */
export function energyDifferenceDb(totalDb: number, partDb: number): number {
  const rest = dbToEnergy(totalDb) - dbToEnergy(partDb);
  if (rest < 0) throw new RangeError(`energy difference: ${partDb} dB exceeds the total ${totalDb} dB`);
  return energyToDb(rest);
}

const LN10_OVER_10 = Math.LN10 / 10;

/** Transmission coefficient τ = 10^(−TL/10) of a transmission loss in dB. */
export function tauOfTl(tlDb: number): number {
  return Math.exp(-tlDb * LN10_OVER_10);
}

/** Transmission loss in dB of a transmission coefficient: −10·lg τ. */
export function tlOfTau(tau: number): number {
  return -10 * Math.log10(tau);
}

/** Round half away from zero to a number of decimals (the standards' rounding of reported values). */
export function roundTo(value: number, decimals = 0): number {
  const f = Math.pow(10, decimals);
  return (Math.sign(value) * Math.round(Math.abs(value) * f + 1e-9)) / f;
}
