/** A label's box on screen, px: top-left corner and size. */
export interface LabelBox { x: number; y: number; w: number; h: number }

const CELL = 64;

/**
 * Screen-space collision grid: labels are placed in priority order and one that would overlap
 * an earlier one is left out. Boxes are filed under every grid cell they touch, so a check looks
 * only at neighbours, not at every label already placed.
 */
export class CollisionGrid {
  private readonly cells = new Map<string, LabelBox[]>();

  /** Places `box` and answers true when it overlaps nothing placed before; otherwise places nothing. */
  place(box: LabelBox, gapPx = 2): boolean {
    const padded = { x: box.x - gapPx, y: box.y - gapPx, w: box.w + 2 * gapPx, h: box.h + 2 * gapPx };
    const keys = cellKeys(padded);
    for (const key of keys) {
      for (const other of this.cells.get(key) ?? []) if (overlaps(padded, other)) return false;
    }
    for (const key of keys) {
      const list = this.cells.get(key);
      if (list) list.push(box);
      else this.cells.set(key, [box]);
    }
    return true;
  }
}

function cellKeys(b: LabelBox): string[] {
  const out: string[] = [];
  const x0 = Math.floor(b.x / CELL), x1 = Math.floor((b.x + b.w) / CELL);
  const y0 = Math.floor(b.y / CELL), y1 = Math.floor((b.y + b.h) / CELL);
  for (let x = x0; x <= x1; x++) for (let y = y0; y <= y1; y++) out.push(`${x},${y}`);
  return out;
}

export const overlaps = (a: LabelBox, b: LabelBox) => a.x < b.x + b.w && b.x < a.x + a.w && a.y < b.y + b.h && b.y < a.y + a.h;

