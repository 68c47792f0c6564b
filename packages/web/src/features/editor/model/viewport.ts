import type { Bounds } from "@hushmark/editor-core";

/**
 * The view onto the plan: `scale` pixels per metre and the screen position of the plan origin.
 * Plan y points north (up), screen y down, so screen y = oy − y·scale.
 */
export interface Viewport {
  scale: number;
  ox: number;
  oy: number;
}

export const MIN_SCALE = 4;
export const MAX_SCALE = 800;

export const toPlan = (v: Viewport, sx: number, sy: number) => ({ x: (sx - v.ox) / v.scale, y: -(sy - v.oy) / v.scale });
export const toScreen = (v: Viewport, x: number, y: number) => ({ x: v.ox + x * v.scale, y: v.oy - y * v.scale });

/** Zooms by `factor` keeping the plan point under (sx, sy) where it is. */
export function zoomAt(v: Viewport, factor: number, sx: number, sy: number): Viewport {
  const scale = Math.min(MAX_SCALE, Math.max(MIN_SCALE, v.scale * factor));
  const k = scale / v.scale;
  return { scale, ox: sx - (sx - v.ox) * k, oy: sy - (sy - v.oy) * k };
}

export function panBy(v: Viewport, dx: number, dy: number): Viewport {
  return { ...v, ox: v.ox + dx, oy: v.oy + dy };
}

/** The view that shows `bounds` whole inside a width × height box with a margin (px). */
export function fitBounds(bounds: Bounds | null, width: number, height: number, margin = 48): Viewport {
  if (width <= 0 || height <= 0) return { scale: 50, ox: 0, oy: 0 };
  // An empty plan shows a room-sized area (8 × 6 m from the origin) to start drawing in.
  if (!bounds) return fitBounds({ minX: 0, minY: 0, maxX: 8, maxY: 6 }, width, height, margin);
  // A small canvas (a phone, a short bottom sheet) keeps a thinner margin, so the plan is not lost in it.
  margin = Math.min(margin, Math.max(12, Math.min(width, height) * 0.1));
  const w = Math.max(bounds.maxX - bounds.minX, 1);
  const h = Math.max(bounds.maxY - bounds.minY, 1);
  const scale = Math.min(MAX_SCALE, Math.max(MIN_SCALE, Math.min((width - 2 * margin) / w, (height - 2 * margin) / h)));
  const cx = (bounds.minX + bounds.maxX) / 2;
  const cy = (bounds.minY + bounds.maxY) / 2;
  return { scale, ox: width / 2 - cx * scale, oy: height / 2 + cy * scale };
}
