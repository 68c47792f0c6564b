/**
 * The sound-path colour scale, one for every drawing of a result (the app's canvas, its PNG and
 * SVG, and the server's PDFs), so a colour means the same share everywhere. An element's share is
 * the fraction of the A-weighted energy at the receiver that passes through it.
 */

/** Upper edges of the share bins; the last bin is open. */
export const SHARE_EDGES = [0.02, 0.05, 0.1, 0.2, 0.4] as const;

/** One colour per bin, low → high: perceptually ordered and readable in grey (design.md). */
export const SHARE_COLOURS = ["#e8ecef", "#b9d3d6", "#f1c27d", "#e8875a", "#c2412d", "#7a1f3d"] as const;

export function shareBin(share: number): number {
  const i = SHARE_EDGES.findIndex((edge) => share < edge);
  return i === -1 ? SHARE_EDGES.length : i;
}

export const shareColour = (share: number): string => SHARE_COLOURS[shareBin(share)]!;

/**
 * A share as a whole percentage. A link that sound crosses back and forth (into a ceiling void
 * and out again) is counted once per crossing, so a share can come out a little over 1; it is
 * written as 100 %, which is what it means to a reader: all of the sound passes there.
 */
export const sharePercent = (share: number): string => (share >= 0.995 ? "100 %" : share < 0.01 ? "under 1 %" : `${Math.round(share * 100)} %`);

/** The legend: each colour with the range of shares it stands for. */
export const SHARE_LEGEND: readonly { colour: string; label: string }[] = SHARE_COLOURS.map((colour, i) => ({
  colour,
  label: i === 0 ? `under ${SHARE_EDGES[0] * 100} %` : i === SHARE_EDGES.length ? `${SHARE_EDGES[i - 1]! * 100} % or more` : `${Math.round(SHARE_EDGES[i - 1]! * 100)}–${Math.round(SHARE_EDGES[i]! * 100)} %`,
}));
