import { BANDS_HZ } from "./bands.js";

// TODO(engine): replace with the engine's STC rating once @hushmark/acoustics exports it. Only
// used to fit catalogue curves to published STC values; the ratings shown to users come from
// `constructionRatings`, which calls the engine.
const STC_CONTOUR = [-16, -13, -10, -7, -4, -1, 0, 1, 2, 3, 4, 4, 4, 4, 4, 4];
const STC_FIRST = BANDS_HZ.indexOf(125);

/** STC of a 21-band curve per ASTM E413 (deficiencies ≤ 32 dB in total, ≤ 8 dB in any band), dB. */
export function stcForFit(tlDb: readonly number[]): number {
  for (let c = 150; c > 0; c--) {
    let sum = 0, worst = 0;
    STC_CONTOUR.forEach((off, k) => {
      const d = Math.max(0, c + off - tlDb[STC_FIRST + k]!);
      sum += d;
      worst = Math.max(worst, d);
    });
    if (sum <= 32 && worst <= 8) return c;
  }
  return 0;
}

/** A curve moved up or down by whole decibels until its STC equals `stc` (dB); the shift is returned too. */
export function shiftedToStc(tlDb: readonly number[], stc: number): { tlDb: number[]; shiftDb: number } {
  // A uniform whole-dB shift moves the contour fit by exactly the same amount.
  const shiftDb = stc - stcForFit(tlDb);
  return { tlDb: tlDb.map((v) => v + shiftDb), shiftDb };
}
