/**
 * Targets at the receiver and the shortfall against them: a level in dB(A), a noise criterion,
 * or a reduction in dB(A) relative to a baseline (by default the existing network).
 */
import { ncCurveDb, ratingNc } from "../ratings/nc.js";
import { aWeightedLevelDb } from "../bands/weighting.js";
import { thirdOctaveToOctave, type Spectrum } from "../bands/spectrum.js";
import { z } from "zod";

export const targetSchema = z.discriminatedUnion("kind", [
  z.object({ kind: z.literal("level"), dba: z.number() }),
  z.object({ kind: z.literal("nc"), nc: z.number().min(15).max(70) }),
  z.object({ kind: z.literal("reduction"), db: z.number().nonnegative() }),
]);
export type Target = z.output<typeof targetSchema>;

export interface Shortfall {
  readonly target: Target;
  /** dB still needed: positive = short of the target, ≤ 0 = met with that margin. */
  readonly shortfallDb: number;
  readonly met: boolean;
  readonly detail: string;
}

/** Worst excess in dB of the octave levels over the NC-N curve (positive: above the curve). */
export function ncExcessDb(levels: Spectrum, nc: number): { excessDb: number; hz: number } {
  const oct = levels.bands === "octave" ? levels : thirdOctaveToOctave(levels as Spectrum<"third-octave">);
  const curve = ncCurveDb(nc);
  const hz = [63, 125, 250, 500, 1000, 2000, 4000, 8000];
  let worst = { excessDb: -Infinity, hz: 0 };
  oct.values.forEach((v, i) => {
    const x = v - (curve[i] as number);
    if (Number.isFinite(v) && x > worst.excessDb) worst = { excessDb: x, hz: hz[i] as number };
  });
  return worst;
}

/** Shortfall of receiver levels (dB per band) against a target; `baselineDba` for reductions. */
export function shortfall(target: Target, levels: Spectrum, baselineDba: number): Shortfall {
  const dba = aWeightedLevelDb(levels);
  if (target.kind === "level") {
    const s = dba - target.dba;
    return { target, shortfallDb: s, met: s <= 1e-9, detail: `${dba.toFixed(1)} dB(A) against ${target.dba} dB(A)` };
  }
  if (target.kind === "reduction") {
    const achieved = baselineDba - dba;
    const s = target.db - achieved;
    return { target, shortfallDb: s, met: s <= 1e-9, detail: `reduction ${achieved.toFixed(1)} dB(A) against ${target.db} dB(A)` };
  }
  const { excessDb, hz } = ncExcessDb(levels, target.nc);
  const nc = ratingNc(levels).value;
  return { target, shortfallDb: excessDb, met: excessDb <= 1e-9, detail: `NC-${nc} against NC-${target.nc} (worst octave ${hz} Hz)` };
}
