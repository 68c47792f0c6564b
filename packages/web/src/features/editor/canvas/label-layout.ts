// The collision grid is shared with the server's PDF drawings.
export { CollisionGrid, overlaps, type LabelBox } from "@hushmark/floorplan";

/** Below this a room is too small on screen to carry a name, px. */
export const MIN_ROOM_PX = { w: 30, h: 16 };
/** The room's second line (its area) needs this much height on screen, px. */
export const AREA_ROOM_H_PX = 44;

/**
 * A room name that fits inside the room's width on screen: whole, or shortened with an ellipsis
 * while it keeps most of the name (at least five letters and 60 % of it — "Roo…" tells nothing);
 * null when even that does not fit. `measure` answers px.
 */
export function fitName(name: string, roomWidthPx: number, measure: (text: string) => number): string | null {
  const room = roomWidthPx - 8;
  if (measure(name) <= room) return name;
  const least = Math.max(5, Math.ceil(name.length * 0.6));
  for (let n = Math.min(name.length - 1, 30); n >= least; n--) {
    const short = `${name.slice(0, n).trimEnd()}…`;
    if (measure(short) <= room) return short;
  }
  return null;
}
