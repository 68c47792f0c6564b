import { edgeRefParts, elementsOfType, type Opening, type Plan, type Point } from "@hushmark/floorplan";
import { levelOf } from "@hushmark/editor-core";
import { openingSpan, roomOutlineBands, wallBands, type OpeningSpan, type WallBand } from "../model/wall-geometry";
import { brand, caution, danger, ink, muted, paper, roomFill } from "./colours";

/** What to paint: one level of a plan, optionally only or except some element ids. */
export interface PaintSpec {
  plan: Plan;
  levelId: string;
  /** Pixels per metre the context is scaled by, for hairlines and dashes drawn in screen pixels. */
  scale: number;
  exclude?: ReadonlySet<string>;
  /** Paint only these (and what hangs on them), with room outlines standing in for wall pieces. */
  only?: ReadonlySet<string>;
  ghost?: boolean;
  /** A traced drawing shows under this level: rooms are filled faintly so it stays readable. */
  overUnderlay?: boolean;
}

/** How much of a room's fill covers a visible underlay: enough to tell the kinds of room apart, little enough to read the drawing through. */
export const UNDERLAY_FILL_ALPHA = 0.3;

const hostOwner = (o: Opening) => edgeRefParts(o.wallRef)?.roomId ?? o.wallRef;

function polygon(ctx: CanvasRenderingContext2D, pts: readonly Point[]): void {
  pts.forEach((p, i) => (i ? ctx.lineTo(p.x, p.y) : ctx.moveTo(p.x, p.y)));
  ctx.closePath();
}

function strokeBands(ctx: CanvasRenderingContext2D, bands: readonly WallBand[], colour: string): void {
  // One path per thickness: thousands of walls become a handful of strokes.
  const byWidth = new Map<number, WallBand[]>();
  for (const b of bands) {
    const list = byWidth.get(b.thicknessM);
    if (list) list.push(b);
    else byWidth.set(b.thicknessM, [b]);
  }
  ctx.strokeStyle = colour;
  ctx.lineCap = "square";
  for (const [w, list] of byWidth) {
    ctx.lineWidth = w;
    ctx.beginPath();
    for (const b of list) { ctx.moveTo(b.start.x, b.start.y); ctx.lineTo(b.end.x, b.end.y); }
    ctx.stroke();
  }
  ctx.lineCap = "butt";
}

/** Below this many pixels per metre door swings and window lines are drawn plainly: their detail is a few pixels wide and dashed arcs are slow to paint by the thousand. */
const DETAIL_SCALE = 14;

function paintOpening(ctx: CanvasRenderingContext2D, o: Opening, s: OpeningSpan, px: number): void {
  const { start: a, end: b, normal: n } = s;
  const h = s.thicknessM / 2 + 0.004;
  ctx.fillStyle = o.type === "window" ? "#ffffff" : paper;
  ctx.beginPath();
  polygon(ctx, [{ x: a.x + n.x * h, y: a.y + n.y * h }, { x: b.x + n.x * h, y: b.y + n.y * h }, { x: b.x - n.x * h, y: b.y - n.y * h }, { x: a.x - n.x * h, y: a.y - n.y * h }]);
  ctx.fill();
  ctx.strokeStyle = ink;
  if (px > 1 / DETAIL_SCALE && o.type !== "penetration") {
    ctx.lineWidth = 1.5 * px;
    ctx.beginPath(); ctx.moveTo(a.x, a.y); ctx.lineTo(b.x, b.y); ctx.stroke();
    return;
  }
  if (o.type === "door") {
    const tip = { x: a.x + n.x * o.widthM, y: a.y + n.y * o.widthM };
    ctx.lineWidth = 2 * px;
    ctx.beginPath(); ctx.moveTo(a.x, a.y); ctx.lineTo(tip.x, tip.y); ctx.stroke();
    const a0 = Math.atan2(tip.y - a.y, tip.x - a.x), a1 = Math.atan2(b.y - a.y, b.x - a.x);
    let d = a1 - a0;
    while (d > Math.PI) d -= 2 * Math.PI;
    while (d < -Math.PI) d += 2 * Math.PI;
    ctx.lineWidth = px;
    ctx.setLineDash([4 * px, 3 * px]);
    ctx.beginPath(); ctx.arc(a.x, a.y, o.widthM, a0, a0 + d, d < 0); ctx.stroke();
    const l = o.leaks;
    if (l && (l.undercutMm > 6 || l.perimeterGapMm > 3 || l.sealsCracked)) {
      ctx.strokeStyle = caution; ctx.lineWidth = 3 * px; ctx.setLineDash([2 * px, 3 * px]);
      ctx.beginPath(); ctx.moveTo(a.x, a.y); ctx.lineTo(b.x, b.y); ctx.stroke();
    }
    ctx.setLineDash([]);
  } else if (o.type === "window") {
    const t = s.thicknessM / 2;
    ctx.lineWidth = 1.25 * px;
    ctx.beginPath();
    for (const k of [t, 0, -t]) { ctx.moveTo(a.x + n.x * k, a.y + n.y * k); ctx.lineTo(b.x + n.x * k, b.y + n.y * k); }
    for (const e of [a, b]) { ctx.moveTo(e.x + n.x * t, e.y + n.y * t); ctx.lineTo(e.x - n.x * t, e.y - n.y * t); }
    ctx.stroke();
  } else {
    const c = { x: (a.x + b.x) / 2, y: (a.y + b.y) / 2 };
    const q = Math.max(s.thicknessM * 0.6, 0.06);
    ctx.fillStyle = danger;
    ctx.fillRect(c.x - q / 2, c.y - q / 2, q, q);
  }
}

/**
 * Paints a level straight onto a canvas context in plan metres (the caller's transform flips y).
 * One Konva shape runs this instead of a node per element, so a plan of thousands of elements
 * opens and redraws without thousands of nodes to create and walk.
 */
export function paintPlan(ctx: CanvasRenderingContext2D, spec: PaintSpec): void {
  const { plan, levelId, exclude, only, ghost } = spec;
  const px = 1 / spec.scale;
  const keep = (id: string) => (only ? only.has(id) : !exclude?.has(id));
  const bands = only
    ? [...only].flatMap((id) => {
        const el = plan.elements[id];
        if (el?.type === "room" && el.levelId === levelId) return roomOutlineBands(plan, id);
        if (el?.type === "wall" && el.levelId === levelId) return [{ id, levelId, start: el.start, end: el.end, thicknessM: el.thicknessM, kind: "free" as const, roomIds: [] }];
        return [];
      })
    : wallBands(plan).filter((b) => b.levelId === levelId && !exclude?.has(b.id) && !b.roomIds.some((id) => exclude?.has(id)));
  if (ghost) {
    ctx.globalAlpha = 0.35;
    strokeBands(ctx, bands, "#8a8f9c");
    ctx.globalAlpha = 1;
    return;
  }
  // One alpha for every fill: no extra pass or per-room state on a plan of thousands of rooms.
  if (spec.overUnderlay) ctx.globalAlpha = UNDERLAY_FILL_ALPHA;
  for (const r of elementsOfType(plan, "room")) {
    if (r.levelId !== levelId || !keep(r.id) || r.outline.length < 3) continue;
    ctx.fillStyle = roomFill(r.use);
    ctx.beginPath(); polygon(ctx, r.outline); ctx.fill();
  }
  ctx.globalAlpha = 1;
  for (const v of elementsOfType(plan, "void")) {
    if (v.levelId !== levelId || !keep(v.id) || v.outline.length < 3) continue;
    const xs = v.outline.map((p) => p.x), ys = v.outline.map((p) => p.y);
    const minX = Math.min(...xs), maxX = Math.max(...xs), minY = Math.min(...ys), maxY = Math.max(...ys);
    ctx.save();
    ctx.beginPath(); polygon(ctx, v.outline); ctx.clip();
    ctx.strokeStyle = muted; ctx.globalAlpha = 0.45; ctx.lineWidth = 0.75 * px;
    ctx.beginPath();
    for (let k = minX - (maxY - minY); k < maxX; k += 0.6) { ctx.moveTo(k, minY); ctx.lineTo(k + (maxY - minY), maxY); }
    ctx.stroke();
    ctx.restore();
    ctx.strokeStyle = muted; ctx.lineWidth = 1.5 * px; ctx.setLineDash([8 * px, 4 * px]);
    ctx.beginPath(); polygon(ctx, v.outline); ctx.stroke();
    ctx.setLineDash([]);
  }
  strokeBands(ctx, bands, ink);
  for (const o of [...elementsOfType(plan, "door"), ...elementsOfType(plan, "window"), ...elementsOfType(plan, "penetration")]) {
    const owner = hostOwner(o);
    if (only ? !(only.has(o.id) || only.has(owner)) : exclude?.has(o.id) || exclude?.has(owner)) continue;
    const span = openingSpan(plan, o);
    if (span && span.levelId === levelId) paintOpening(ctx, o, span, px);
  }
  ctx.strokeStyle = brand; ctx.globalAlpha = 0.7; ctx.lineWidth = 3 * px; ctx.setLineDash([10 * px, 6 * px]);
  ctx.beginPath();
  for (const d of elementsOfType(plan, "duct")) {
    const a = plan.elements[d.fromVentId], b = plan.elements[d.toVentId];
    if (a?.type !== "vent" || b?.type !== "vent") continue;
    const moving = (id: string, space: string) => (only ? only.has(id) || only.has(space) : exclude?.has(id) || exclude?.has(space));
    const m = moving(a.id, a.spaceId) || moving(b.id, b.spaceId);
    if (only ? !m : m) continue;
    if (levelOf(plan, a.id) !== levelId && levelOf(plan, b.id) !== levelId) continue;
    ctx.moveTo(a.position.x, a.position.y); ctx.lineTo(b.position.x, b.position.y);
  }
  ctx.stroke();
  ctx.setLineDash([]); ctx.globalAlpha = 1;
  const q = 0.3;
  for (const v of elementsOfType(plan, "vent")) {
    const hit = only ? only.has(v.id) || only.has(v.spaceId) : !(exclude?.has(v.id) || exclude?.has(v.spaceId));
    if (!hit || levelOf(plan, v.id) !== levelId) continue;
    const { x, y } = v.position;
    ctx.fillStyle = "#ffffff"; ctx.strokeStyle = ink; ctx.lineWidth = 1.5 * px;
    ctx.fillRect(x - q / 2, y - q / 2, q, q);
    ctx.strokeRect(x - q / 2, y - q / 2, q, q);
    ctx.beginPath(); ctx.moveTo(x - q / 2, y - q / 2); ctx.lineTo(x + q / 2, y + q / 2); ctx.stroke();
  }
}
