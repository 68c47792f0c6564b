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
/** A name crowded out at full size gets a second try at this size before it is left out. */
const NAME_FONT_SMALL = "600 11px 'Work Sans', sans-serif";
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
  /**
   * A read-only view (a proposal, the client's paths): room names are placed before the labels of
   * pins and notes, which give way to them, because there the rooms are what a reader looks for.
   */
  roomNamesFirst?: boolean;
  /** Plan points (metres) that something else draws a marker (22 px across) on, kept clear of text. */
  keepClear?: readonly { x: number; y: number }[];
  /** Boxes on the canvas (stage px) that something drawn above the labels covers, kept clear too. */
  keepClearPx?: readonly LabelBox[];
}

/**
 * Text in screen pixels — room names and areas, pins with their label and latest reading, notes —
 * painted by one shape at (x·scale, −y·scale) inside a group that carries only the pan offset.
 * Labels are placed in order of importance on a collision grid, so at small zoom they thin out
 * instead of piling up: pins first, then notes, then room names from the largest room down (on a
 * read-only view room names come before the pins' and notes' text). A room name shows only when
 * it fits inside its room; a note that does not fit becomes a marker.
 */
export const LabelsGroup = memo(function LabelsGroup(props: LabelsProps) {
  const { plan, levelId, scale, unit, only, exclude, width, height, ox = 0, oy = 0, pinReadings, roomNamesFirst, keepClear, keepClearPx } = props;
  return (
    <Shape
      listening={false}
      perfectDrawEnabled={false}
      sceneFunc={(context) => paintLabels(context._context, { plan, levelId, scale, unit, only, exclude, width, height, ox, oy, pinReadings, roomNamesFirst, keepClear, keepClearPx })}
    />
  );
});

type PaintLabels = Omit<LabelsProps, "ox" | "oy"> & { ox: number; oy: number };

/** Paints the labels of a level; exported for the plan export, which draws the same text. */
export function paintLabels(ctx: CanvasRenderingContext2D, spec: PaintLabels): void {
  const { plan, levelId, scale, unit, only, exclude, width, height, ox, oy, pinReadings, roomNamesFirst, keepClear, keepClearPx } = spec;
  const keep = (id: string) => (only ? only.has(id) : !exclude?.has(id));
  // Off-screen labels (with a margin for text hanging past the edge) are neither placed nor drawn.
  const onScreen = (x: number, y: number, margin = 160) =>
    width === undefined || height === undefined || (x + ox > -margin && x + ox < width + margin && y + oy > -margin && y + oy < height + margin);
  const inView = (b: LabelBox) => width === undefined || (b.x + ox >= 0 && b.x + b.w + ox <= width);
  const grid = new CollisionGrid();
  ctx.textBaseline = "middle";
  // The numbered markers of a proposal are circles 22 px across (marked-up-plan.tsx).
  for (const p of keepClear ?? []) grid.place({ x: p.x * scale - 11, y: -p.y * scale - 11, w: 22, h: 22 }, 0);
  for (const b of keepClearPx ?? []) grid.place({ x: b.x - ox, y: b.y - oy, w: b.w, h: b.h }, 0);

  // The rings go down first whatever the order, so no text ever covers a measurement place.
  const pins: { label: string; reading: string | undefined; x: number; y: number }[] = [];
  for (const p of elementsOfType(plan, "pin")) {
    if (p.levelId !== levelId || !keep(p.id)) continue;
    const x = p.position.x * scale, y = -p.position.y * scale;
    if (!onScreen(x, y)) continue;
    grid.place({ x: x - 8, y: y - 8, w: 16, h: 16 }, 0);
    ctx.beginPath(); ctx.arc(x, y, 7, 0, 2 * Math.PI);
    ctx.fillStyle = panel; ctx.fill();
    ctx.lineWidth = 2.5; ctx.strokeStyle = brand; ctx.stroke();
    ctx.beginPath(); ctx.arc(x, y, 2, 0, 2 * Math.PI); ctx.fillStyle = brand; ctx.fill();
    pins.push({ label: p.label || "Pin", reading: pinReadings?.get(p.id), x, y });
  }

  const pinLabels = () => {
    for (const { label, reading, x, y } of pins) {
      const w = Math.max(textWidth(ctx, SMALL_FONT, label), reading ? textWidth(ctx, READING_FONT, reading) : 0) + 8;
      const h = (reading ? 2 : 1) * 15 + 4;
      // Right of the pin if there is room, else left of it, else above or below; otherwise the
      // ring stands alone.
      const right = { x: x + 10, y: y - h / 2, w, h }, left = { x: x - 10 - w, y: y - h / 2, w, h };
      const above = { x: x - w / 2, y: y - 10 - h, w, h }, below = { x: x - w / 2, y: y + 10, w, h };
      // A side that would run off the canvas is tried only when all would.
      const sides = [right, left, above, below].filter(inView);
      const box = (sides.length ? sides : [right, left]).find((b) => grid.place(b)) ?? null;
      if (!box) continue;
      ctx.globalAlpha = 0.9; ctx.fillStyle = panel; roundRect(ctx, box, 3); ctx.fill(); ctx.globalAlpha = 1;
      ctx.textAlign = "left";
      ctx.font = SMALL_FONT; ctx.fillStyle = ink;
      ctx.fillText(label, box.x + 4, box.y + 2 + 7.5);
      if (reading) { ctx.font = READING_FONT; ctx.fillStyle = brandStrong; ctx.fillText(reading, box.x + 4, box.y + 2 + 22.5); }
    }
  };

  const notes = () => {
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
      } else if (grid.place({ x: x - 5, y: y - 5, w: 10, h: 10 }, 0)) {
        // Crowded out: a small marker keeps the note findable; zooming in brings its text back.
        ctx.beginPath(); ctx.rect(x - 4, y - 4, 8, 8); ctx.fill(); ctx.stroke();
      }
    }
  };

  const roomNames = () => {
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
      const full = r.name || "Unnamed room";
      const area = scale >= 25 && hPx >= AREA_ROOM_H_PX ? formatArea(info.areaM2, unit) : null;
      const areaW = area ? textWidth(ctx, SMALL_FONT, area) : 0;
      const showArea = area !== null && areaW <= wPx - 8;
      // At the centre, or moved up, down or sideways inside the room when something already sits
      // there; the area is dropped before the name is, and the name is shortened further (leaving
      // room to slide past a marker) and set smaller before it goes.
      let placed: { box: LabelBox; name: string; font: string } | null = null;
      const tries = [[NAME_FONT, true, 1], [NAME_FONT, false, 1], [NAME_FONT, false, 0.8], [NAME_FONT_SMALL, false, 1], [NAME_FONT_SMALL, false, 0.8]] as const;
      for (const [font, withArea, widthShare] of tries) {
        if (withArea && !showArea) continue;
        const name = fitName(full, wPx * widthShare, (t) => textWidth(ctx, font, t));
        if (!name) continue;
        const nameW = textWidth(ctx, font, name);
        const h = withArea ? 32 : 16;
        const w = withArea ? Math.max(nameW, areaW) : nameW;
        const slack = Math.max(0, (wPx - 8 - w) / 2);
        const shifts = slack > 0 ? [0, -slack, slack] : [0];
        for (const dy of [0, 20, -20, 40, -40]) {
          if (Math.abs(dy) + h / 2 > hPx / 2 - 4) continue;
          const box = shifts.map((dx) => ({ x: x + dx - w / 2, y: y - h / 2 + dy, w, h })).find((b) => grid.place(b));
          if (box) { placed = { box, name, font }; break; }
        }
        if (placed) break;
      }
      if (!placed) continue;
      const { box, name, font } = placed;
      const cx = box.x + box.w / 2;
      ctx.font = font; ctx.fillStyle = ink;
      // On read-only views lines are drawn under the names (Paths), so a name gets a halo.
      if (roomNamesFirst) { ctx.lineJoin = "round"; ctx.lineWidth = 3.5; ctx.strokeStyle = panel; ctx.strokeText(name, cx, box.y + 8); }
      ctx.fillText(name, cx, box.y + 8);
      if (box.h > 16) { ctx.font = SMALL_FONT; ctx.fillStyle = muted; ctx.fillText(area!, cx, box.y + 24); }
    }
  };

  if (roomNamesFirst) { roomNames(); pinLabels(); notes(); }
  else { pinLabels(); notes(); roomNames(); }
}
