import type { ToolId } from "@hushmark/editor-core";

export interface ToolInfo {
  id: ToolId;
  name: string;
  /** What the tooltip says. */
  tip: string;
  /** Single-key shortcut. */
  key: string;
}

/** The Sketch tools in rail order, grouped by what they make. */
export const TOOL_GROUPS: ToolInfo[][] = [
  [
    { id: "select", name: "Select", tip: "Select and move. Shift adds to the selection; drag on empty space to box-select.", key: "v" },
    { id: "pan", name: "Pan", tip: "Drag the view. Space-drag or the middle button pans with any tool.", key: "h" },
  ],
  [
    { id: "room-rectangle", name: "Room", tip: "Drag a rectangular room, or click two corners. Type 4 x 3 for an exact size.", key: "r" },
    { id: "room-polygon", name: "Room by corners", tip: "Click each corner of an irregular room; type a length for the next wall.", key: "p" },
    { id: "corners", name: "Corners", tip: "Drag a room's corners; click a wall line to add a corner.", key: "e" },
    { id: "wall", name: "Wall", tip: "A free-standing interior wall, click each end. Type a length.", key: "w" },
  ],
  [
    { id: "door", name: "Door", tip: "Click a wall to put a door in it.", key: "d" },
    { id: "window", name: "Window", tip: "Click a wall to put a window in it.", key: "n" },
    { id: "gap", name: "Gap", tip: "A penetration or crack where sound leaks through a wall: outlet box, pipe, cable hole.", key: "g" },
  ],
  [
    { id: "vent", name: "Vent", tip: "A grille inside a room.", key: "o" },
    { id: "duct-link", name: "Duct link", tip: "Link two grilles joined by a duct: click one, then the other.", key: "l" },
    { id: "void", name: "Void", tip: "A ceiling void, attic or crawlspace spanning several rooms.", key: "c" },
  ],
  [
    { id: "pin", name: "Pin", tip: "A measurement place.", key: "m" },
    { id: "note", name: "Note", tip: "A note on the plan.", key: "t" },
    { id: "tape", name: "Tape", tip: "Measure a distance without drawing.", key: "u" },
  ],
];

export const ALL_TOOLS = TOOL_GROUPS.flat();
export const toolInfo = (id: ToolId) => ALL_TOOLS.find((t) => t.id === id)!;
