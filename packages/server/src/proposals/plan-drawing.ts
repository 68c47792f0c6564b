/**
 * The marked-up plan drawn as vectors into a PDF from the plan model: rooms, walls at their
 * thickness coloured by their share of the sound reaching the receiver, openings as dots in the
 * same colours, and numbered markers on the upgraded elements.
 */
import { applyAction, solveNetwork, type UpgradeOption } from "@hushmark/acoustics";
import { elementsOfType, mapResultToPlan, polygonCentroid } from "@hushmark/floorplan";
import type PDFDocument from "pdfkit";
import type { PreparedNetwork } from "../analyses/compute.js";

type Doc = InstanceType<typeof PDFDocument>;

type Prepared = Extract<PreparedNetwork, { ok: true }>;

/** The sound-path colour scale (design.md), with the share each colour starts at. */
export const SHARE_SCALE: { from: number; colour: string }[] = [
  { from: 0, colour: "#e8ecef" },
  { from: 0.02, colour: "#b9d3d6" },
  { from: 0.05, colour: "#f1c27d" },
  { from: 0.15, colour: "#e8875a" },
  { from: 0.3, colour: "#c2412d" },
  { from: 0.5, colour: "#7a1f3d" },
];

export const shareColour = (share: number) => [...SHARE_SCALE].reverse().find((s) => share >= s.from)?.colour ?? SHARE_SCALE[0]!.colour;

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

/** Draws the receiver's level of the plan into `box` (PDF points); markers number the upgraded elements. */
export function drawPlan(doc: Doc, prepared: Prepared, receiverId: string, shares: Map<string, number>, markers: Map<string, number>, box: DrawBox): void {
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
  doc.fillColor("#1d2433").fontSize(7);
  for (const room of here) {
    const [x, y] = at(polygonCentroid(room.outline));
    const share = layerShare(room.id);
    doc.fillColor(share >= 0.3 ? "#ffffff" : "#1d2433").text(room.name, x - 50, y - 4, { width: 100, align: "center" });
    if (share >= 0.02) doc.fontSize(6).text(`floor/ceiling ${Math.round(share * 100)}%`, x - 50, y + 5, { width: 100, align: "center" }).fontSize(7);
  }
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
  doc.fontSize(7).fillColor("#6b7080").text("Share of the sound reaching the room:", x, y);
  SHARE_SCALE.forEach((s, i) => {
    const next = SHARE_SCALE[i + 1];
    const label = next ? `${Math.round(s.from * 100)}–${Math.round(next.from * 100)}%` : `${Math.round(s.from * 100)}%+`;
    const cx = x + i * 62;
    doc.rect(cx, y + 11, 10, 8).fillAndStroke(s.colour, "#6b7080");
    doc.fillColor("#1d2433").text(label, cx + 13, y + 12);
  });
}
