import { SHARE_LEGEND, elementsOfType, formatArea, placePathTags, polygonAreaM2, polygonCentroid, type LabelBox, type Plan } from "@hushmark/floorplan";
import { levelOf, planBounds } from "@hushmark/editor-core";
import { wallBands, openingSpan } from "../model/wall-geometry";
import { ink, muted, paper, rule } from "../canvas/colours";
import { roomFill } from "../canvas/colours";

/** The analysis drawn onto an export: each element's colour and the legend to explain it. */
export interface ExportMarkup {
  colours: Record<string, string>;
  legend: readonly { colour: string; label: string }[];
  subtitle: string;
  /** The weakest paths to draw, strongest first: rank, level at the receiver, line in plan metres. */
  paths?: readonly { rank: number; dba: number; polyline: readonly { x: number; y: number; levelId: string | null }[] }[];
}

export interface ExportOptions {
  title: string;
  /** e.g. "Ground floor". */
  levelName: string;
  date: string;
  north?: boolean;
  markup?: ExportMarkup;
  /** Drawing scale in px per metre at 1× (print resolution is applied when rasterising). */
  pxPerM?: number;
}

const esc = (s: string) => s.replace(/&/g, "&amp;").replace(/</g, "&lt;").replace(/>/g, "&gt;").replace(/"/g, "&quot;");
const n = (v: number) => (Math.round(v * 100) / 100).toString();

/** A "nice" scale-bar length (m) that is about a fifth of the drawing width. */
export function scaleBarMetres(widthM: number): number {
  const target = widthM / 5;
  const steps = [0.5, 1, 2, 5, 10, 20, 50, 100];
  return steps.reduce((best, s) => (Math.abs(s - target) < Math.abs(best - target) ? s : best), 1);
}

/**
 * The plan of one level as a standalone SVG: walls at thickness, doors with swings, windows as
 * triple lines, room names and areas, optional analysis colours, with a title block, scale bar,
 * optional north arrow and legend. Units are px with y flipped so north is up.
 */
export function planToSvg(plan: Plan, levelId: string, options: ExportOptions): { svg: string; width: number; height: number } {
  const k = options.pxPerM ?? 60;
  const b = planBounds(plan, levelId) ?? { minX: 0, minY: 0, maxX: 10, maxY: 8 };
  const margin = 40;
  const drawW = (b.maxX - b.minX) * k, drawH = (b.maxY - b.minY) * k;
  const legendW = options.markup ? 220 : 0;
  const width = Math.ceil(Math.max(drawW + margin * 2 + legendW, 640));
  const blockH = 90;
  const height = Math.ceil(drawH + margin * 2 + blockH);
  const X = (x: number) => margin + (x - b.minX) * k;
  const Y = (y: number) => margin + (b.maxY - y) * k;
  const colours = options.markup?.colours ?? {};
  const parts: string[] = [];
  parts.push(`<rect width="${width}" height="${height}" fill="#ffffff"/>`);
  for (const r of elementsOfType(plan, "room")) {
    if (r.levelId !== levelId || r.outline.length < 3) continue;
    parts.push(`<polygon points="${r.outline.map((p) => `${n(X(p.x))},${n(Y(p.y))}`).join(" ")}" fill="${roomFill(r.use)}"/>`);
  }
  // A floor or ceiling (`upper^lower`) tints its room on this level, as on the canvas.
  for (const [id, colour] of Object.entries(colours)) {
    if (!id.includes("^")) continue;
    const room = id.split("^").map((part) => plan.elements[part]).find((e) => e?.type === "room" && e.levelId === levelId);
    if (room?.type !== "room") continue;
    parts.push(`<polygon points="${room.outline.map((p) => `${n(X(p.x))},${n(Y(p.y))}`).join(" ")}" fill="${colour}" fill-opacity="0.4"/>`);
  }
  for (const band of wallBands(plan)) {
    if (band.levelId !== levelId) continue;
    parts.push(`<line x1="${n(X(band.start.x))}" y1="${n(Y(band.start.y))}" x2="${n(X(band.end.x))}" y2="${n(Y(band.end.y))}" stroke="${colours[band.id] ?? ink}" stroke-width="${n(band.thicknessM * k)}" stroke-linecap="square"/>`);
  }
  for (const o of [...elementsOfType(plan, "door"), ...elementsOfType(plan, "window"), ...elementsOfType(plan, "penetration")]) {
    const s = openingSpan(plan, o);
    if (!s || s.levelId !== levelId) continue;
    const h = (s.thicknessM / 2) * k + 0.5;
    const nx = s.normal.x, ny = -s.normal.y;
    const a = { x: X(s.start.x), y: Y(s.start.y) }, e = { x: X(s.end.x), y: Y(s.end.y) };
    const colour = colours[o.id];
    const quad = [[a.x + nx * h, a.y + ny * h], [e.x + nx * h, e.y + ny * h], [e.x - nx * h, e.y - ny * h], [a.x - nx * h, a.y - ny * h]].map(([x, y]) => `${n(x!)},${n(y!)}`).join(" ");
    parts.push(`<polygon points="${quad}" fill="${colour ?? (o.type === "window" ? "#ffffff" : paper)}"/>`);
    if (o.type === "door") {
      const w = o.widthM * k;
      const tip = { x: a.x + nx * w, y: a.y + ny * w };
      const sweep = nx * (e.y - a.y) - ny * (e.x - a.x) > 0 ? 0 : 1;
      parts.push(`<line x1="${n(a.x)}" y1="${n(a.y)}" x2="${n(tip.x)}" y2="${n(tip.y)}" stroke="${ink}" stroke-width="2"/>`);
      parts.push(`<path d="M${n(tip.x)},${n(tip.y)} A${n(w)},${n(w)} 0 0 ${sweep} ${n(e.x)},${n(e.y)}" fill="none" stroke="${ink}" stroke-dasharray="4 3"/>`);
    } else if (o.type === "window") {
      for (const off of [-h + 0.5, 0, h - 0.5]) parts.push(`<line x1="${n(a.x + nx * off)}" y1="${n(a.y + ny * off)}" x2="${n(e.x + nx * off)}" y2="${n(e.y + ny * off)}" stroke="${ink}" stroke-width="1.3"/>`);
    } else {
      parts.push(`<rect x="${n((a.x + e.x) / 2 - 3)}" y="${n((a.y + e.y) / 2 - 3)}" width="6" height="6" fill="${colour ?? "#c2412d"}"/>`);
    }
  }
  for (const v of elementsOfType(plan, "vent")) {
    if (levelOf(plan, v.id) !== levelId) continue;
    const x = X(v.position.x), y = Y(v.position.y), s = 0.3 * k;
    parts.push(`<rect x="${n(x - s / 2)}" y="${n(y - s / 2)}" width="${n(s)}" height="${n(s)}" fill="${colours[v.id] ?? "#ffffff"}" stroke="${ink}"/><line x1="${n(x - s / 2)}" y1="${n(y + s / 2)}" x2="${n(x + s / 2)}" y2="${n(y - s / 2)}" stroke="${ink}"/>`);
  }
  // The paths' lines under the names; names with a halo; the tags placed off the names.
  const drawn = (options.markup?.paths ?? []).flatMap((p) => {
    const pts = p.polyline.filter((q) => q.levelId === levelId || q.levelId === null).map((q) => ({ x: X(q.x), y: Y(q.y) }));
    return pts.length < 2 ? [] : [{ ...p, pts }];
  });
  // The strongest path last, on top where paths share a stretch.
  for (const p of [...drawn].reverse()) {
    const d = p.pts.map((q, i) => `${i ? "L" : "M"}${n(q.x)},${n(q.y)}`).join(" ");
    parts.push(`<path d="${d}" fill="none" stroke="#ffffff" stroke-width="6" stroke-linejoin="round"/>`);
    parts.push(`<path d="${d}" fill="none" stroke="${ink}" stroke-width="2.5" stroke-linejoin="round"${p.rank === 1 ? "" : ` stroke-dasharray="8 5"`}/>`);
    const end = p.pts[p.pts.length - 1]!, before = p.pts[p.pts.length - 2]!;
    const angle = Math.atan2(end.y - before.y, end.x - before.x);
    const head = (a: number) => `${n(end.x - 10 * Math.cos(angle + a))},${n(end.y - 10 * Math.sin(angle + a))}`;
    parts.push(`<circle cx="${n(p.pts[0]!.x)}" cy="${n(p.pts[0]!.y)}" r="4" fill="${ink}"/><polygon points="${n(end.x)},${n(end.y)} ${head(0.45)} ${head(-0.45)}" fill="${ink}"/>`);
  }
  const names: LabelBox[] = [];
  for (const r of elementsOfType(plan, "room")) {
    if (r.levelId !== levelId || r.outline.length < 3) continue;
    const c = polygonCentroid(r.outline);
    const halo = drawn.length ? ` stroke="#ffffff" stroke-width="3.5" stroke-linejoin="round" paint-order="stroke"` : "";
    parts.push(`<text x="${n(X(c.x))}" y="${n(Y(c.y) - 2)}" text-anchor="middle" font-family="Work Sans, sans-serif" font-size="13" font-weight="600" fill="${ink}"${halo}>${esc(r.name)}</text>`);
    parts.push(`<text x="${n(X(c.x))}" y="${n(Y(c.y) + 14)}" text-anchor="middle" font-family="Work Sans, sans-serif" font-size="11" fill="${muted}"${halo}>${esc(formatArea(polygonAreaM2(r.outline), plan.displayUnit))}</text>`);
    const w = r.name.length * 7.6 + 8;
    names.push({ x: X(c.x) - w / 2, y: Y(c.y) - 16, w, h: 34 });
  }
  const tagText = (p: { rank: number; dba: number }) => `${p.rank}  ${Math.round(p.dba)} dBA`;
  const tags = placePathTags(drawn.map((p) => ({ rank: p.rank, points: p.pts, w: tagText(p).length * 7 + 10, h: 22 })), names);
  for (const p of drawn) {
    const t = tags.get(p.rank);
    if (!t) continue;
    parts.push(`<rect x="${n(t.x)}" y="${n(t.y)}" width="${n(t.w)}" height="${t.h}" rx="10" fill="${ink}"/><text x="${n(t.x + 5)}" y="${n(t.y + 15)}" font-family="Work Sans, sans-serif" font-size="12" font-weight="600" fill="#ffffff" xml:space="preserve">${esc(tagText(p))}</text>`);
  }
  // Title block along the bottom.
  const ty = height - blockH + 10;
  parts.push(`<line x1="${margin}" y1="${ty - 4}" x2="${width - margin}" y2="${ty - 4}" stroke="${rule}"/>`);
  parts.push(`<text x="${margin}" y="${ty + 18}" font-family="Work Sans, sans-serif" font-size="17" font-weight="600" fill="${ink}">${esc(options.title)}</text>`);
  parts.push(`<text x="${margin}" y="${ty + 38}" font-family="Work Sans, sans-serif" font-size="12" fill="${muted}">${esc(options.levelName)}${options.markup ? ` · ${esc(options.markup.subtitle)}` : ""} · ${esc(options.date)} · Hushmark</text>`);
  const barM = scaleBarMetres(b.maxX - b.minX);
  const bx = margin, by = ty + 58;
  parts.push(`<g data-part="scale-bar"><rect x="${bx}" y="${by}" width="${n((barM * k) / 2)}" height="6" fill="${ink}"/><rect x="${n(bx + (barM * k) / 2)}" y="${by}" width="${n((barM * k) / 2)}" height="6" fill="#ffffff" stroke="${ink}"/><text x="${n(bx + barM * k + 8)}" y="${by + 7}" font-family="Work Sans, sans-serif" font-size="11" fill="${ink}">${barM} m</text></g>`);
  if (options.north) {
    const nx0 = width - margin - legendW - 30, ny0 = margin + 10;
    parts.push(`<g data-part="north"><path d="M${nx0},${ny0 + 30} L${nx0 + 10},${ny0} L${nx0 + 20},${ny0 + 30} L${nx0 + 10},${ny0 + 22} Z" fill="${ink}"/><text x="${nx0 + 10}" y="${ny0 + 46}" text-anchor="middle" font-family="Work Sans, sans-serif" font-size="12" fill="${ink}">N</text></g>`);
  }
  if (options.markup) {
    const lx = width - margin - legendW + 20;
    parts.push(`<g data-part="legend"><text x="${lx}" y="${margin + 6}" font-family="Work Sans, sans-serif" font-size="12" font-weight="600" fill="${ink}">Share of the sound reaching the room</text>`);
    options.markup.legend.forEach((l, i) => {
      parts.push(`<rect x="${lx}" y="${margin + 18 + i * 22}" width="18" height="14" fill="${l.colour}" stroke="${rule}"/><text x="${lx + 26}" y="${margin + 30 + i * 22}" font-family="Work Sans, sans-serif" font-size="11" fill="${ink}">${esc(l.label)}</text>`);
    });
    parts.push(`</g>`);
  }
  const svg = `<svg xmlns="http://www.w3.org/2000/svg" width="${width}" height="${height}" viewBox="0 0 ${width} ${height}">${parts.join("")}</svg>`;
  return { svg, width, height };
}

export const DEFAULT_LEGEND = SHARE_LEGEND;
