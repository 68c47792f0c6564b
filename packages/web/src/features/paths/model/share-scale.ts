import { pathScale } from "../../editor/canvas/colours";

/** Share bins (fraction of the A-weighted energy at the receiver), upper edges; the last is open. */
export const SHARE_EDGES = [0.02, 0.05, 0.1, 0.2, 0.4] as const;

export function shareBin(share: number): number {
  const i = SHARE_EDGES.findIndex((edge) => share < edge);
  return i === -1 ? SHARE_EDGES.length : i;
}

export const shareColour = (share: number): string => pathScale[shareBin(share)]!;

export const pct = (share: number): string => (share >= 0.995 ? "100 %" : share < 0.01 ? "under 1 %" : `${Math.round(share * 100)} %`);

export const SHARE_LEGEND = pathScale.map((colour, i) => ({
  colour,
  label: i === 0 ? "under 2 %" : i === SHARE_EDGES.length ? "40 % or more" : `${Math.round(SHARE_EDGES[i - 1]! * 100)}–${Math.round(SHARE_EDGES[i]! * 100)} %`,
}));
