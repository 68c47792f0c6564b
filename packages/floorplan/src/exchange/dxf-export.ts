import Drawing from "dxf-writer";
import { elementsOfType, levelsByElevation } from "../document/elements.js";
import type { Opening, Plan, Point } from "../document/schema.js";
import { openingPlacement } from "../geometry/openings.js";
import { planWallPieces } from "../geometry/walls.js";
import { bandCornersM, interiorPointM, spaceLevelId } from "./plan-points.js";
import { pieceResolved } from "./plan-thickness.js";

/** Layer names of an exported DXF, one per element kind, with their colour (AutoCAD colour index). */
export const DXF_EXPORT_LAYERS = {
  rooms: { name: "rooms", colour: 7 },
  roomNames: { name: "room-names", colour: 8 },
  walls: { name: "walls", colour: 1 },
  doors: { name: "doors", colour: 3 },
  windows: { name: "windows", colour: 5 },
  penetrations: { name: "penetrations", colour: 6 },
  vents: { name: "vents", colour: 4 },
  ducts: { name: "ducts", colour: 4 },
  voids: { name: "voids", colour: 9 },
  pins: { name: "pins", colour: 2 },
  notes: { name: "notes", colour: 2 },
} as const;

export interface DxfExportOptions {
  /** The level to draw (default: the lowest). DXF has no storeys, so each level is its own file. */
  levelId?: string;
  /** Height of room names, pins and notes, m (default 0.2). */
  textHeightM?: number;
}

const xy = (p: Point): [number, number] => [p.x, p.y];
// A line break inside a group value would end the group early and corrupt the file.
const oneLine = (s: string): string => s.replace(/[\r\n]+/g, " ");

/**
 * One plan level as a DXF text file in metres ($INSUNITS 6): room outlines at the wall
 * centrelines, wall pieces and free walls as outlines at their thickness, doors, windows and
 * penetrations as outlines across their wall, vents as circles of their open area, ducts as
 * lines between their grilles, voids, pins and notes, each kind on its own layer.
 */
export function planToDxf(plan: Plan, options: DxfExportOptions = {}): string {
  const levelId = options.levelId ?? levelsByElevation(plan)[0]?.id;
  const textM = options.textHeightM ?? 0.2;
  const d = new Drawing();
  d.setUnits("Meters");
  for (const l of Object.values(DXF_EXPORT_LAYERS)) d.addLayer(l.name, l.colour, "CONTINUOUS");
  const L = DXF_EXPORT_LAYERS;
  const onLevel = <T extends { levelId: string }>(list: readonly T[]) => list.filter((e) => e.levelId === levelId);

  const rooms = onLevel(elementsOfType(plan, "room"));
  for (const room of rooms) {
    d.setActiveLayer(L.rooms.name).drawPolyline(room.outline.map(xy), true);
    const at = interiorPointM(room.outline);
    d.setActiveLayer(L.roomNames.name).drawText(at.x, at.y, textM, 0, oneLine(room.name), "center", "middle");
  }
  const pieces = planWallPieces(plan).filter((p) => p.levelId === levelId);
  const thickness = new Map<string, number>();
  d.setActiveLayer(L.walls.name);
  for (const piece of pieces) {
    const t = pieceResolved(plan, piece).thicknessM;
    thickness.set(piece.id, t);
    d.drawPolyline(bandCornersM(piece.start, piece.end, t).map(xy), true);
  }
  for (const wall of onLevel(elementsOfType(plan, "wall"))) {
    thickness.set(wall.id, wall.thicknessM);
    d.drawPolyline(bandCornersM(wall.start, wall.end, wall.thicknessM).map(xy), true);
  }
  const allPieces = planWallPieces(plan);
  const openings: Opening[] = [...elementsOfType(plan, "door"), ...elementsOfType(plan, "window"), ...elementsOfType(plan, "penetration")];
  for (const o of openings) {
    const place = openingPlacement(plan, allPieces, o, plan.defaults.wallToleranceM);
    if (!place.ok) continue;
    const host = allPieces.find((p) => p.id === place.hostId);
    const hostLevel = host?.levelId ?? (plan.elements[place.hostId]?.type === "wall" ? (plan.elements[place.hostId] as { levelId: string }).levelId : undefined);
    if (hostLevel !== levelId) continue;
    const layer = o.type === "door" ? L.doors : o.type === "window" ? L.windows : L.penetrations;
    const t = thickness.get(place.hostId) ?? plan.defaults.wallThicknessM;
    d.setActiveLayer(layer.name).drawPolyline(bandCornersM(place.start, place.end, t).map(xy), true);
  }
  const ventsHere = new Set<string>();
  d.setActiveLayer(L.vents.name);
  for (const v of elementsOfType(plan, "vent")) {
    const lvl = spaceLevelId(plan, v.spaceId);
    if (lvl !== undefined && lvl !== levelId) continue;
    ventsHere.add(v.id);
    d.drawCircle(v.position.x, v.position.y, Math.sqrt(v.openAreaM2 / Math.PI));
  }
  d.setActiveLayer(L.ducts.name);
  for (const duct of elementsOfType(plan, "duct")) {
    const a = plan.elements[duct.fromVentId], b = plan.elements[duct.toVentId];
    if (a?.type !== "vent" || b?.type !== "vent" || !(ventsHere.has(a.id) || ventsHere.has(b.id))) continue;
    d.drawLine(a.position.x, a.position.y, b.position.x, b.position.y);
  }
  d.setActiveLayer(L.voids.name);
  for (const v of onLevel(elementsOfType(plan, "void"))) d.drawPolyline(v.outline.map(xy), true);
  for (const pin of onLevel(elementsOfType(plan, "pin"))) {
    d.setActiveLayer(L.pins.name).drawPoint(pin.position.x, pin.position.y);
    d.drawText(pin.position.x + textM / 2, pin.position.y, textM, 0, oneLine(pin.label));
  }
  for (const note of onLevel(elementsOfType(plan, "note"))) d.setActiveLayer(L.notes.name).drawText(note.position.x, note.position.y, textM, 0, oneLine(note.text));
  return d.toDxfString();
}

/** The layer roles that read an exported plan back: room outlines as walls, doors and windows as openings (no unit). */
export function dxfExportLayerRoles(): Record<string, "walls" | "doors" | "windows" | "underlay" | "ignore"> {
  const L = DXF_EXPORT_LAYERS;
  return {
    [L.rooms.name]: "walls", [L.roomNames.name]: "underlay", [L.doors.name]: "doors", [L.windows.name]: "windows",
    [L.walls.name]: "ignore", [L.penetrations.name]: "ignore", [L.vents.name]: "ignore", [L.ducts.name]: "ignore",
    [L.voids.name]: "ignore", [L.pins.name]: "ignore", [L.notes.name]: "ignore",
  };
}
