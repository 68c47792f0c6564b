import { memo } from "react";
import { Shape } from "react-konva";
import { elementsOfType, formatArea, polygonAreaM2, polygonCentroid, type Plan, type Room } from "@hushmark/floorplan";
import { AREA_ROOM_H_PX, CollisionGrid, MIN_ROOM_PX, fitName, type LabelBox } from "./label-layout";
import { brand, brandStrong, ink, muted, panel } from "./colours";

interface RoomInfo { cx: number; cy: number; wM: number; hM: number; areaM2: number }
const roomInfo = new WeakMap<Room, RoomInfo>();

/** Centre, extent and area of a room, worked out once per room object (rooms are immutable). */
function infoOf(r: Room): RoomInfo {
  const hit = roomInfo.get(r);
  if (hit) return hit;
  const c = polygonCentroid(r.outline);
  let minX = Infinity, maxX = -Infinity, minY = Infinity, maxY = -Infinity;
  for (const p of r.outline) { minX = Math.min(minX, p.x); maxX = Math.max(maxX, p.x); minY = Math.min(minY, p.y); maxY = Math.max(maxY, p.y); }
  const info = { cx: c.x, cy: c.y, wM: maxX - minX, hM: maxY - minY, areaM2: polygonAreaM2(r.outline) };
  roomInfo.set(r, info);
  return info;
}

const NAME_FONT = "600 13px 'Work Sans', sans-serif";
const SMALL_FONT = "12px 'Work Sans', sans-serif";
const READING_FONT = "600 12px 'Work Sans', sans-serif";
const widths = new Map<string, number>();

function textWidth(ctx: CanvasRenderingContext2D, font: string, text: string): number {
  const key = `${font}|${text}`;
  let w = widths.get(key);
  if (w === undefined) {
    ctx.font = font;
    w = ctx.measureText(text).width;
    if (widths.size > 20_000) widths.clear();
    widths.set(key, w);
  }
  return w;
}

function roundRect(ctx: CanvasRenderingContext2D, b: LabelBox, r: number): void {
  ctx.beginPath();
  ctx.roundRect(b.x, b.y, b.w, b.h, r);
}

export interface LabelsProps {
  plan: Plan;
  levelId: string;
  scale: number;
  unit: "metric" | "imperial";
  only?: ReadonlySet<string>;
  exclude?: ReadonlySet<string>;
  /** The canvas size and the pan offset the group is drawn at, px: labels off screen are skipped. */
  width?: number;
  height?: number;
  ox?: number;
  oy?: number;
  /** The reading to show beside each pin, by pin id ("48 dBA · peak 125 Hz"). */
  pinReadings?: ReadonlyMap<string, string>;
}

/**
 * Text in screen pixels — room names and areas, pins with their label and latest reading, notes —
 * painted by one shape at (x·scale, −y·scale) inside a group that carries only the pan offset.
 * Labels are placed in order of importance on a collision grid, so at small zoom they thin out
 * instead of piling up: pins first, then notes, then room names from the largest room down. A
 * room name shows only when it fits inside its room; a note that does not fit becomes a marker.
 */
export const LabelsGroup = memo(function LabelsGroup(props: LabelsProps) {
  const { plan, levelId, scale, unit, only, exclude, width, height, ox = 0, oy = 0, pinReadings } = props;
  return (
    <Shape
      listening={false}
      perfectDrawEnabled={false}
      sceneFunc={(context) => paintLabels(context._context, { plan, levelId, scale, unit, only, exclude, width, height, ox, oy, pinReadings })}
    />
  );
});

type PaintLabels = Omit<LabelsProps, "ox" | "oy"> & { ox: number; oy: number };

/** Paints the labels of a level; exported for the plan export, which draws the same text. */
export function paintLabels(ctx: CanvasRenderingContext2D, spec: PaintLabels): void {
  const { plan, levelId, scale, unit, only, exclude, width, height, ox, oy, pinReadings } = spec;
  const keep = (id: string) => (only ? only.has(id) : !exclude?.has(id));
  // Off-screen labels (with a margin for text hanging past the edge) are neither placed nor drawn.
  const onScreen = (x: number, y: number, margin = 160) =>
    width === undefined || height === undefined || (x + ox > -margin && x + ox < width + margin && y + oy > -margin && y + oy < height + margin);
  const grid = new CollisionGrid();
  ctx.textBaseline = "middle";

  for (const p of elementsOfType(plan, "pin")) {
    if (p.levelId !== levelId || !keep(p.id)) continue;
    const x = p.position.x * scale, y = -p.position.y * scale;
    if (!onScreen(x, y)) continue;
    grid.place({ x: x - 8, y: y - 8, w: 16, h: 16 }, 0);
    ctx.beginPath(); ctx.arc(x, y, 7, 0, 2 * Math.PI);
    ctx.fillStyle = panel; ctx.fill();
    ctx.lineWidth = 2.5; ctx.strokeStyle = brand; ctx.stroke();
    ctx.beginPath(); ctx.arc(x, y, 2, 0, 2 * Math.PI); ctx.fillStyle = brand; ctx.fill();
    const reading = pinReadings?.get(p.id);
    const lines = [p.label || "Pin", ...(reading ? [reading] : [])];
    const w = Math.max(textWidth(ctx, SMALL_FONT, lines[0]!), reading ? textWidth(ctx, READING_FONT, reading) : 0) + 8;
    const h = lines.length * 15 + 4;
    // Right of the pin if there is room, else left of it; otherwise the ring stands alone.
    const right = { x: x + 10, y: y - h / 2, w, h }, left = { x: x - 10 - w, y: y - h / 2, w, h };
    const box = grid.place(right) ? right : grid.place(left) ? left : null;
    if (!box) continue;
    ctx.globalAlpha = 0.9; ctx.fillStyle = panel; roundRect(ctx, box, 3); ctx.fill(); ctx.globalAlpha = 1;
    ctx.textAlign = "left";
    ctx.font = SMALL_FONT; ctx.fillStyle = ink;
    ctx.fillText(lines[0]!, box.x + 4, box.y + 2 + 7.5);
    if (reading) { ctx.font = READING_FONT; ctx.fillStyle = brandStrong; ctx.fillText(reading, box.x + 4, box.y + 2 + 22.5); }
  }

  for (const n of elementsOfType(plan, "note")) {
    if (n.levelId !== levelId || !keep(n.id)) continue;
    const x = n.position.x * scale, y = -n.position.y * scale;
    if (!onScreen(x, y)) continue;
    const text = n.text ? (n.text.length > 40 ? `${n.text.slice(0, 38)}…` : n.text) : "Note";
    const w = Math.min(220, textWidth(ctx, SMALL_FONT, text) + 12), h = 22;
    const box = { x: x - w / 2, y: y - 6 - h, w, h };
    ctx.fillStyle = "#fff8e6"; ctx.strokeStyle = "#e5cf9a"; ctx.lineWidth = 1;
    if (grid.place(box)) {
      roundRect(ctx, box, 3); ctx.fill(); ctx.stroke();
      ctx.beginPath(); ctx.moveTo(x - 4, y - 6); ctx.lineTo(x, y); ctx.lineTo(x + 4, y - 6); ctx.closePath(); ctx.fill();
      ctx.textAlign = "center"; ctx.font = SMALL_FONT; ctx.fillStyle = ink;
      ctx.fillText(text, x, box.y + h / 2, w - 8);
    } else {
      // Crowded out: a small marker keeps the note findable; zooming in brings its text back.
      grid.place({ x: x - 5, y: y - 5, w: 10, h: 10 }, 0);
      ctx.beginPath(); ctx.rect(x - 4, y - 4, 8, 8); ctx.fill(); ctx.stroke();
    }
  }

  const rooms: { r: Room; info: RoomInfo; x: number; y: number; wPx: number; hPx: number }[] = [];
  for (const r of elementsOfType(plan, "room")) {
    if (r.levelId !== levelId || r.outline.length < 3 || !keep(r.id)) continue;
    const info = infoOf(r);
    const wPx = info.wM * scale, hPx = info.hM * scale;
    if (wPx < MIN_ROOM_PX.w || hPx < MIN_ROOM_PX.h) continue;
    const x = info.cx * scale, y = -info.cy * scale;
    if (!onScreen(x, y, Math.max(wPx, hPx) / 2)) continue;
    rooms.push({ r, info, x, y, wPx, hPx });
  }
  // The largest rooms keep their names when two would collide.
  rooms.sort((a, b) => b.info.areaM2 - a.info.areaM2);
  ctx.textAlign = "center";
  for (const { r, info, x, y, wPx, hPx } of rooms) {
    const name = fitName(r.name || "Unnamed room", wPx, (t) => textWidth(ctx, NAME_FONT, t));
    if (!name) continue;
    const area = scale >= 25 && hPx >= AREA_ROOM_H_PX ? formatArea(info.areaM2, unit) : null;
    const areaW = area ? textWidth(ctx, SMALL_FONT, area) : 0;
    const showArea = area !== null && areaW <= wPx - 8;
    const nameW = textWidth(ctx, NAME_FONT, name);
    const h = showArea ? 32 : 16;
    // At the centre, or moved up or down inside the room when a pin's label or a note sits there.
    let placed: LabelBox | null = null;
    for (const dy of [0, 20, -20, 40, -40]) {
      const box = { x: x - Math.max(nameW, areaW) / 2, y: y - h / 2 + dy, w: Math.max(nameW, showArea ? areaW : 0), h };
      if (Math.abs(dy) + h / 2 > hPx / 2 - 4) continue;
      if (grid.place(box)) { placed = box; break; }
    }
    if (!placed) continue;
    ctx.font = NAME_FONT; ctx.fillStyle = ink;
    ctx.fillText(name, x, placed.y + 8);
    if (showArea) { ctx.font = SMALL_FONT; ctx.fillStyle = muted; ctx.fillText(area!, x, placed.y + 24); }
  }
}
