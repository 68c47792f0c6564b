/**
 * The marked-up plan drawn as vectors into a PDF from the plan model: rooms, walls at their
 * thickness coloured by their share of the sound reaching the receiver, openings as dots in the
 * same colours, and numbered markers on the upgraded elements.
 */
import { applyAction, solveNetwork, type UpgradeOption } from "@hushmark/acoustics";
import { SHARE_LEGEND, elementsOfType, mapResultToPlan, placePathTags, polygonCentroid, shareColour, sharePercent, type LabelBox } from "@hushmark/floorplan";
import type PDFDocument from "pdfkit";
import type { PreparedNetwork } from "../analyses/compute.js";

type Doc = InstanceType<typeof PDFDocument>;

type Prepared = Extract<PreparedNetwork, { ok: true }>;

/** Each element's A-weighted share at the receiver, with the options applied (none: as surveyed). */
export function elementShares(prepared: Prepared, receiverId: string, options: readonly UpgradeOption[] = []): Map<string, number> {
  const links = prepared.network.links.map((l) => options.filter((o) => o.link === l.id).reduce((link, o) => applyAction(link, o.action), l));
  const solved = solveNetwork({ ...prepared.network, links }, { receiver: receiverId, k: 1, gains: 0 });
  const onPlan = mapResultToPlan(prepared.plan, prepared.built, solved);
  return new Map(onPlan.elements.map((e) => [e.elementId, e.share]));
}

export interface DrawBox {
  x: number;
  y: number;
  width: number;
  height: number;
}

/** A path to draw over the plan: its rank and its line through the elements it crosses. */
export interface DrawnPath {
  rank: number;
  dba: number;
  polyline: readonly { x: number; y: number; levelId: string | null }[];
}

/** A round length for a scale bar about `target` metres long: 1, 2 or 5 times a power of ten. */
export function scaleBarMetres(target: number): number {
  const p = 10 ** Math.floor(Math.log10(Math.max(target, 1e-3)));
  return [5, 2, 1].map((k) => k * p).find((v) => v <= target) ?? p;
}

/**
 * Draws the receiver's level of the plan into `box` (PDF points), with a scale bar; markers
 * number the upgraded elements, and `paths` (the weakest, strongest first) are drawn as numbered
 * lines with their level, solid for the strongest and dashed for the rest.
 */
export function drawPlan(doc: Doc, prepared: Prepared, receiverId: string, shares: Map<string, number>, markers: Map<string, number>, box: DrawBox, paths: readonly DrawnPath[] = []): void {
  const plan = prepared.plan;
  const rooms = elementsOfType(plan, "room");
  const receiver = rooms.find((r) => r.id === receiverId);
  const levelId = receiver?.levelId ?? rooms[0]?.levelId;
  const here = rooms.filter((r) => r.levelId === levelId);
  const traces = Object.values(prepared.built.links).filter((t) => t.levelId === levelId && (t.kind === "wall" || t.kind === "exterior-wall"));
  const xs = here.flatMap((r) => r.outline.map((v) => v.x));
  const ys = here.flatMap((r) => r.outline.map((v) => v.y));
  if (xs.length === 0) return;
  const minX = Math.min(...xs), maxX = Math.max(...xs), minY = Math.min(...ys), maxY = Math.max(...ys);
  const scale = Math.min(box.width / Math.max(maxX - minX, 0.1), box.height / Math.max(maxY - minY, 0.1)) * 0.92;
  const ox = box.x + (box.width - (maxX - minX) * scale) / 2;
  const oy = box.y + (box.height - (maxY - minY) * scale) / 2;
  // Plan y grows north; PDF y grows down.
  const at = (p: { x: number; y: number }): [number, number] => [ox + (p.x - minX) * scale, oy + (maxY - p.y) * scale];

  doc.save();
  // A floor or ceiling element is named `upper^lower`: tint each room by the strongest one it has.
  const layerShare = (roomId: string) => Math.max(0, ...[...shares].filter(([id]) => id.split("^").includes(roomId)).map(([, v]) => v));
  for (const room of here) {
    const pts = room.outline.map(at);
    const share = layerShare(room.id);
    doc.polygon(...pts).fillAndStroke(share >= 0.02 ? shareColour(share) : room.id === receiverId ? "#eef6f5" : "#f7f5f0", "#d9d4c7");
  }
  for (const t of traces) {
    const [a, b] = t.polyline;
    if (!a || !b) continue;
    const piece = t.refs[0] ?? "";
    const share = shares.get(piece) ?? 0;
    // Walls carrying little stay ink-coloured, as on the plan; the rest take their share's colour.
    doc.moveTo(...at(a)).lineTo(...at(b)).lineWidth(Math.max(2.5, 0.12 * scale)).strokeColor(share >= 0.02 ? shareColour(share) : "#1d2433").stroke();
  }
  for (const t of traces) {
    for (const [id, p] of Object.entries(t.points ?? {})) {
      if (id === t.refs[0]) continue;
      const [x, y] = at(p);
      doc.circle(x, y, 4.5).fillAndStroke(shareColour(shares.get(id) ?? 0), "#1d2433");
    }
  }
  // The paths' lines go under the room names; their tags go off the names, after them.
  const drawn = paths.flatMap((p) => {
    const pts = p.polyline.filter((q) => q.levelId === levelId || q.levelId === null).map(at);
    return pts.length < 2 ? [] : [{ ...p, pts }];
  });
  // The strongest path last, on top where paths share a stretch.
  for (const p of [...drawn].reverse()) {
    const [first, ...rest] = p.pts;
    doc.lineWidth(4).strokeColor("#ffffff").undash().moveTo(...first!);
    for (const q of rest) doc.lineTo(...q);
    doc.stroke();
    doc.lineWidth(1.6).strokeColor("#1d2433");
    if (p.rank === 1) doc.undash(); else doc.dash(5, { space: 3 });
    doc.moveTo(...first!);
    for (const q of rest) doc.lineTo(...q);
    doc.stroke().undash();
    doc.circle(...first!, 2.5).fill("#1d2433");
    const end = p.pts[p.pts.length - 1]!, before = p.pts[p.pts.length - 2]!;
    const angle = Math.atan2(end[1] - before[1], end[0] - before[0]);
    const head = (a: number): [number, number] => [end[0] - 7 * Math.cos(angle + a), end[1] - 7 * Math.sin(angle + a)];
    doc.polygon(end, head(0.45), head(-0.45)).fill("#1d2433");
  }
  // Room names at their centres, with a halo of the room's own colour so a line under them
  // does not cut through the letters.
  const names: LabelBox[] = [];
  for (const room of here) {
    const [x, y] = at(polygonCentroid(room.outline));
    const share = layerShare(room.id);
    const fill = share >= 0.02 ? shareColour(share) : room.id === receiverId ? "#eef6f5" : "#f7f5f0";
    const ink = share >= 0.3 ? "#ffffff" : "#1d2433";
    const lines: [string, number, number][] = [[room.name, 7, y - 4]];
    if (share >= 0.02) lines.push([`floor/ceiling ${sharePercent(share)}`, 6, y + 5]);
    for (const [text, size, ty] of lines) {
      doc.fontSize(size).lineWidth(2.2).strokeColor(fill).fillColor(fill).text(text, x - 50, ty, { width: 100, align: "center", stroke: true, fill: false });
      doc.fillColor(ink).text(text, x - 50, ty, { width: 100, align: "center" });
    }
    doc.fontSize(7);
    const w = Math.min(100, doc.widthOfString(room.name) + 6);
    names.push({ x: x - w / 2, y: y - 5, w, h: share >= 0.02 ? 19 : 11 });
  }
  doc.fontSize(7);
  const tagText = (p: DrawnPath) => `${p.rank}  ${Math.round(p.dba)} dBA`;
  const tags = placePathTags(drawn.map((p) => ({ rank: p.rank, points: p.pts.map(([x, y]) => ({ x, y })), w: doc.widthOfString(tagText(p)) + 8, h: 11 })), names);
  for (const p of drawn) {
    const b = tags.get(p.rank);
    if (!b) continue;
    doc.roundedRect(b.x, b.y, b.w, b.h, 5).fill("#1d2433");
    doc.fillColor("#ffffff").text(tagText(p), b.x + 4, b.y + 2, { lineBreak: false });
  }
  // The scale bar, bottom left of the box.
  const barM = scaleBarMetres((box.width * 0.2) / scale);
  const barX = box.x, barY = box.y + box.height - 4;
  doc.lineWidth(1).strokeColor("#1d2433").rect(barX, barY - 4, (barM * scale) / 2, 4).fillAndStroke("#1d2433", "#1d2433");
  doc.rect(barX + (barM * scale) / 2, barY - 4, (barM * scale) / 2, 4).stroke();
  doc.fillColor("#1d2433").fontSize(6).text(`0`, barX - 2, barY + 2, { lineBreak: false }).text(`${barM} m`, barX + barM * scale - 6, barY + 2, { lineBreak: false });
  for (const [elementId, n] of markers) {
    const p = markerPoint(prepared, elementId);
    if (!p) continue;
    const [x, y] = at(p);
    doc.circle(x + 9, y - 9, 7).fillAndStroke("#1f7a74", "#ffffff");
    doc.fillColor("#ffffff").fontSize(7).text(String(n), x + 4, y - 12.5, { width: 10, align: "center" });
  }
  doc.restore();
}

function markerPoint(prepared: Prepared, elementId: string): { x: number; y: number } | undefined {
  for (const t of Object.values(prepared.built.links)) {
    const p = t.points?.[elementId];
    if (p) return p;
    if (t.kind === "vent" && t.refs.includes(elementId) && t.polyline[0]) return t.polyline[0];
    if (t.refs[0] === elementId && t.polyline.length > 0) {
      const a = t.polyline[0]!, b = t.polyline[t.polyline.length - 1]!;
      return { x: (a.x + b.x) / 2, y: (a.y + b.y) / 2 };
    }
  }
  return undefined;
}

/** The colour legend with its share ranges (colour is never alone: numbers beside it). */
export function drawLegend(doc: Doc, x: number, y: number): void {
  doc.fontSize(7).fillColor("#6b7080").text("Share of the sound reaching the room (walls, and rooms by their floor or ceiling; dots are doors, windows and openings):", x, y);
  SHARE_LEGEND.forEach((s, i) => {
    const cx = x + i * 72;
    doc.rect(cx, y + 11, 10, 8).fillAndStroke(s.colour, "#6b7080");
    doc.fillColor("#1d2433").text(s.label, cx + 13, y + 12);
  });
}
