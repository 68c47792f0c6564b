import type { Plan, Point } from "@hushmark/floorplan";

/** The view the drawing is dropped into: px per metre, the screen position of the plan origin, and the canvas size (px). */
export interface DropView {
  scale: number;
  ox: number;
  oy: number;
  width: number;
  height: number;
}

/**
 * Where a new underlay first lies: centred in the view and filling about 70 % of it, unturned.
 * Its scale is a guess until it is calibrated.
 */
export function dropPlacement(widthPx: number, heightPx: number, view: DropView): { origin: Point; scaleMPerPx: number } {
  const viewW = Math.max(view.width, 1) / view.scale, viewH = Math.max(view.height, 1) / view.scale;
  const scaleMPerPx = Math.min((0.7 * viewW) / widthPx, (0.7 * viewH) / heightPx);
  const cx = (view.width / 2 - view.ox) / view.scale, cy = -(view.height / 2 - view.oy) / view.scale;
  return { origin: { x: cx - (widthPx * scaleMPerPx) / 2, y: cy + (heightPx * scaleMPerPx) / 2 }, scaleMPerPx };
}

/** An underlay id not yet used in the plan, from the upload's id. */
export function newUnderlayId(plan: Plan, fileId: string): string {
  const used = new Set((plan.underlays ?? []).map((u) => u.id));
  const stem = `underlay-${fileId.replace(/[^A-Za-z0-9]/g, "").slice(0, 12)}`;
  if (!used.has(stem)) return stem;
  for (let i = 2; ; i++) if (!used.has(`${stem}-${i}`)) return `${stem}-${i}`;
}

/** How the scale reads to a person: "1 px = 12 mm" or, for imperial plans, "1 in = 8 px". */
export function scaleText(scaleMPerPx: number, unit: "metric" | "imperial"): string {
  if (unit === "imperial") {
    const pxPerInch = 0.0254 / scaleMPerPx;
    return pxPerInch >= 1 ? `1 in = ${pxPerInch.toFixed(pxPerInch < 10 ? 1 : 0)} px` : `1 px = ${(1 / pxPerInch).toFixed(1)} in`;
  }
  const mm = scaleMPerPx * 1000;
  return mm >= 10 ? `1 px = ${(mm / 10).toFixed(1)} cm` : `1 px = ${mm.toFixed(mm < 1 ? 2 : 1)} mm`;
}
