import { OCTAVES_HZ, rounded, thirdOctavesFromOctaves } from "./bands.js";
import type { SourceNote } from "./types.js";

/** A room finish: the mean absorption coefficient of all its surfaces per band (no unit, 0–1). */
export interface FinishPreset {
  id: string;
  name: string;
  alpha: number[];
  source: SourceNote;
}

const TYPICAL: SourceNote = { kind: "typical", note: "Mean absorption coefficients for the whole room surface, octave values interpolated to third-octave bands; typical values (common practice), not a measurement." };

function preset(id: string, name: string, octaves125to4k: [number, number, number, number, number, number]): FinishPreset {
  const [a125, a250, a500, a1k, a2k, a4k] = octaves125to4k;
  return { id, name, alpha: rounded(thirdOctavesFromOctaves(OCTAVES_HZ, [a125, a125, a250, a500, a1k, a2k, a4k, a4k]).map((v) => v * 1000)).map((v) => v / 1000), source: TYPICAL };
}

/** Finish choices offered to the surveyor, from bare to treated. */
export const finishPresets: FinishPreset[] = [
  preset("bare-hard", "Bare and hard (plaster, tile, concrete; empty)", [0.04, 0.04, 0.05, 0.05, 0.06, 0.07]),
  preset("furnished", "Furnished (some soft furniture, hard floor)", [0.12, 0.14, 0.17, 0.2, 0.22, 0.24]),
  preset("soft-furnished", "Soft furnished (carpet, curtains, upholstery)", [0.16, 0.22, 0.3, 0.36, 0.4, 0.42]),
  preset("acoustically-treated", "Acoustically treated (absorber panels, bass traps)", [0.3, 0.45, 0.6, 0.7, 0.75, 0.75]),
];

/** A finish preset by id, or undefined (no unit). */
export function finishPreset(id: string): FinishPreset | undefined {
  return finishPresets.find((f) => f.id === id);
}

/** Reverberation time assumed for a room with no finish recorded, s (a furnished room). */
export const ASSUMED_RT60_S = 0.5;
