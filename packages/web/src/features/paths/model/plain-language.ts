/**
 * Everyday comparisons for an A-weighted level heard in a room. The thresholds follow commonly
 * published tables of typical indoor levels; the wording is ours. Basis: docs/plain-language-levels.md.
 */
const PHRASES: Array<[number, string]> = [
  [15, "practically silent"],
  [20, "barely audible, like a still night in the countryside"],
  [25, "very faint, like leaves rustling"],
  [30, "faint, like a whisper across the room"],
  [35, "soft, like a quiet library"],
  [40, "noticeable, like a quiet conversation next door"],
  [45, "clearly heard, like a fridge humming in a kitchen"],
  [50, "distracting, like ordinary conversation nearby"],
  [60, "loud enough to follow, like a busy office"],
  [Infinity, "intrusive, like a loud conversation in the same room"],
];

export function levelInWords(dba: number): string {
  for (const [upTo, words] of PHRASES) if (dba < upTo) return words;
  return PHRASES.at(-1)![1];
}

/** How a shortfall against the target reads: "about 6 dB too loud — clearly louder than wanted". */
export function shortfallInWords(shortfallDb: number): string {
  if (shortfallDb <= 0) return "within the target";
  if (shortfallDb < 3) return "just over the target — hard to notice";
  if (shortfallDb < 6) return "over the target — noticeable";
  if (shortfallDb < 10) return "well over the target — clearly louder than wanted";
  return "far over the target — roughly twice as loud as wanted or more";
}
