import type { Point, Underlay } from "@hushmark/floorplan";
import { parseLength, type DisplayUnit } from "../units/length.js";

/** The part of an underlay that fixes where its pixels land on the plan. */
export type UnderlayPlacement = Pick<Underlay, "origin" | "scaleMPerPx" | "rotationDeg">;

const RAD = Math.PI / 180;

/** Plan point (m) of image pixel (u, v), v counted down from the image's top edge. */
export function underlayPixelToPlan(p: UnderlayPlacement, u: number, v: number): Point {
  const c = Math.cos(p.rotationDeg * RAD), s = Math.sin(p.rotationDeg * RAD);
  const lx = u * p.scaleMPerPx, ly = -v * p.scaleMPerPx;
  return { x: p.origin.x + c * lx - s * ly, y: p.origin.y + s * lx + c * ly };
}

/** Image pixel (u, v) under a plan point (m); the inverse of `underlayPixelToPlan`. */
export function underlayPlanToPixel(p: UnderlayPlacement, at: Point): { u: number; v: number } {
  const c = Math.cos(p.rotationDeg * RAD), s = Math.sin(p.rotationDeg * RAD);
  const dx = at.x - p.origin.x, dy = at.y - p.origin.y;
  return { u: (c * dx + s * dy) / p.scaleMPerPx, v: -(-s * dx + c * dy) / p.scaleMPerPx };
}

/** The four plan corners (m) of an underlay, from the top-left going round. */
export function underlayCorners(p: UnderlayPlacement & Pick<Underlay, "widthPx" | "heightPx">): Point[] {
  return [[0, 0], [p.widthPx, 0], [p.widthPx, p.heightPx], [0, p.heightPx]].map(([u, v]) => underlayPixelToPlan(p, u!, v!));
}

export type CalibrationResult = { ok: true; placement: UnderlayPlacement } | { ok: false; message: string };

/**
 * Scale from two points picked on the underlay (plan m, as it is drawn now) and the real distance
 * between them (m): the pixels between the points are counted and given that length. The first
 * point stays where it is, so the drawing grows or shrinks about it and the rotation is kept.
 */
export function calibrateUnderlay(p: UnderlayPlacement, a: Point, b: Point, realM: number): CalibrationResult {
  if (!(realM > 0) || !Number.isFinite(realM)) return { ok: false, message: "Type the real distance between the two points, more than zero." };
  const pa = underlayPlanToPixel(p, a), pb = underlayPlanToPixel(p, b);
  const px = Math.hypot(pb.u - pa.u, pb.v - pa.v);
  if (px < 2) return { ok: false, message: "The two points are too close together; pick points far apart on the drawing, such as the ends of a long wall." };
  const scaleMPerPx = realM / px;
  const next: UnderlayPlacement = { origin: { x: 0, y: 0 }, scaleMPerPx, rotationDeg: p.rotationDeg };
  // Put the first picked pixel back under the first picked point.
  const moved = underlayPixelToPlan(next, pa.u, pa.v);
  return { ok: true, placement: { ...next, origin: { x: a.x - moved.x, y: a.y - moved.y } } };
}

/** The same, with the distance as typed in the display unit (`4.2`, `420 cm`, `13' 9"`). */
export function calibrateUnderlayTyped(p: UnderlayPlacement, a: Point, b: Point, typed: string, unit: DisplayUnit): CalibrationResult {
  const realM = parseLength(typed, unit);
  if (realM === null) {
    return { ok: false, message: unit === "metric" ? "Type the distance as a length, such as 4.2 or 420 cm." : `Type the distance as a length, such as 13' 9" or 13.75.` };
  }
  return calibrateUnderlay(p, a, b, realM);
}

/** Turns the underlay by `deltaDeg` anticlockwise about a plan point (m). */
export function rotateUnderlayAbout(p: UnderlayPlacement, pivot: Point, deltaDeg: number): UnderlayPlacement {
  const c = Math.cos(deltaDeg * RAD), s = Math.sin(deltaDeg * RAD);
  const dx = p.origin.x - pivot.x, dy = p.origin.y - pivot.y;
  return { ...p, origin: { x: pivot.x + c * dx - s * dy, y: pivot.y + s * dx + c * dy }, rotationDeg: normalDeg(p.rotationDeg + deltaDeg) };
}

/**
 * The smallest turn (degrees, −45..45) that makes the line a→b, picked on the drawing, run
 * straight across or straight up the plan: for squaring a drawing to the grid.
 */
export function squaringTurnDeg(a: Point, b: Point): number {
  const angle = Math.atan2(b.y - a.y, b.x - a.x) / RAD;
  let turn = -angle;
  while (turn > 45) turn -= 90;
  while (turn <= -45) turn += 90;
  return Math.round(turn * 1e6) / 1e6;
}

/** An angle in (−180, 180] degrees. */
export function normalDeg(deg: number): number {
  let d = deg % 360;
  if (d > 180) d -= 360;
  if (d <= -180) d += 360;
  return Math.round(d * 1e6) / 1e6;
}
