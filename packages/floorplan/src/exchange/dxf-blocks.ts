import type { Point } from "../document/schema.js";

/** A 2D affine map x' = a·x + b·y + e, y' = c·x + d·y + f (drawing units). */
export interface Affine {
  a: number; b: number; c: number; d: number; e: number; f: number;
}

/** The map that leaves every point where it is. */
export const IDENTITY: Affine = { a: 1, b: 0, c: 0, d: 1, e: 0, f: 0 };

/** The map applying `inner` first, then `outer` (no unit). */
export function affineThen(outer: Affine, inner: Affine): Affine {
  return {
    a: outer.a * inner.a + outer.b * inner.c,
    b: outer.a * inner.b + outer.b * inner.d,
    c: outer.c * inner.a + outer.d * inner.c,
    d: outer.c * inner.b + outer.d * inner.d,
    e: outer.a * inner.e + outer.b * inner.f + outer.e,
    f: outer.c * inner.e + outer.d * inner.f + outer.f,
  };
}

/** A point through the map (drawing units). */
export function affinePoint(m: Affine, p: Point): Point {
  return { x: m.a * p.x + m.b * p.y + m.e, y: m.c * p.x + m.d * p.y + m.f };
}

/** The largest stretch the map gives any length (no unit), to keep chord tolerances honest inside scaled blocks. */
export function affineMaxScale(m: Affine): number {
  return Math.max(Math.hypot(m.a, m.c), Math.hypot(m.b, m.d), 1e-12);
}

/** Whether the map mirrors (turns counter-clockwise into clockwise). */
export function affineMirrors(m: Affine): boolean {
  return m.a * m.d - m.b * m.c < 0;
}

interface InsertFields {
  position?: { x?: number; y?: number };
  xScale?: number;
  yScale?: number;
  rotation?: number;
  columnCount?: number;
  rowCount?: number;
  columnSpacing?: number;
  rowSpacing?: number;
  extrusionDirection?: { z?: number };
}

/**
 * The maps placing a block's contents for one INSERT (one per cell of a MINSERT array): move the
 * block's base point to the origin, scale, step to the array cell, rotate (degrees), move to the
 * insertion point, and mirror x under a (0, 0, −1) extrusion (drawing units).
 */
export function insertMaps(insert: InsertFields, base: { x?: number; y?: number } | undefined): Affine[] {
  const sx = Number.isFinite(insert.xScale) && insert.xScale !== 0 ? insert.xScale! : 1;
  const sy = Number.isFinite(insert.yScale) && insert.yScale !== 0 ? insert.yScale! : 1;
  const rot = ((insert.rotation ?? 0) * Math.PI) / 180;
  const cos = Math.cos(rot), sin = Math.sin(rot);
  const px = insert.position?.x ?? 0, py = insert.position?.y ?? 0;
  const bx = base?.x ?? 0, by = base?.y ?? 0;
  const mirror = (insert.extrusionDirection?.z ?? 1) < 0 ? -1 : 1;
  const cols = Math.max(1, Math.min(insert.columnCount ?? 1, 100));
  const rows = Math.max(1, Math.min(insert.rowCount ?? 1, 100));
  const maps: Affine[] = [];
  for (let r = 0; r < rows; r++) {
    for (let k = 0; k < cols; k++) {
      const ox = k * (insert.columnSpacing ?? 0), oy = r * (insert.rowSpacing ?? 0);
      const scaled: Affine = { a: sx, b: 0, c: 0, d: sy, e: -bx * sx + ox, f: -by * sy + oy };
      const turned: Affine = { a: cos, b: -sin, c: sin, d: cos, e: px, f: py };
      const placed = affineThen(turned, scaled);
      maps.push(mirror < 0 ? affineThen({ a: -1, b: 0, c: 0, d: 1, e: 0, f: 0 }, placed) : placed);
    }
  }
  return maps;
}
