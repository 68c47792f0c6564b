import { elementsOfType, levelsByElevation } from "../document/elements.js";
import type { Opening, Plan, Point } from "../document/schema.js";
import { openingPlacement } from "../geometry/openings.js";
import { polygonAreaM2, polygonPerimeterM, polygonSignedAreaM2 } from "../geometry/polygon.js";
import { planWallPieces } from "../geometry/walls.js";
import { geoFrame, planToLonLat, type GeoFrame, type SiteLocation } from "./geo-frame.js";
import { spaceLevelId } from "./plan-points.js";
import { pieceResolved } from "./plan-thickness.js";

type Position = [number, number];
type Geometry =
  | { type: "Point"; coordinates: Position }
  | { type: "LineString"; coordinates: Position[] }
  | { type: "Polygon"; coordinates: Position[][] };
type Properties = Record<string, string | number | boolean | null | string[]>;

/** An RFC 7946 Feature with Hushmark's element properties. */
export interface PlanFeature {
  type: "Feature";
  id: string;
  geometry: Geometry;
  properties: Properties;
}

/** One level as an RFC 7946 FeatureCollection; `hushmark` is a foreign member naming the level and frame. */
export interface LevelFeatureCollection {
  type: "FeatureCollection";
  features: PlanFeature[];
  hushmark: { planId: string; levelId: string; levelName: string; elevationM: number; frame: GeoFrame["kind"]; note: string };
}

const r3 = (v: number) => Math.round(v * 1000) / 1000;
const r4 = (v: number) => Math.round(v * 10000) / 10000;

/**
 * The plan as GeoJSON, one FeatureCollection per level (RFC 7946, WGS84 longitude/latitude):
 * rooms and voids as polygons with their planar area (m²), wall pieces, free walls and openings as
 * lines, vents, pins and notes as points. With a site location the plan's metres are placed
 * there; without one they go into the documented local frame (`frame.kind` says which).
 */
export function planToGeoJson(plan: Plan, site?: SiteLocation): { frame: GeoFrame; levels: LevelFeatureCollection[] } {
  const frame = geoFrame(site);
  const pt = (p: Point): Position => planToLonLat(frame, p);
  const ring = (outline: readonly Point[]): Position[] => {
    // RFC 7946 §3.1.6: exterior rings counter-clockwise; the frame keeps plan orientation.
    const ccw = polygonSignedAreaM2(outline) >= 0 ? [...outline] : [...outline].reverse();
    const coords = ccw.map(pt);
    return [...coords, coords[0]!];
  };
  const pieces = planWallPieces(plan);
  const openings: Opening[] = [...elementsOfType(plan, "door"), ...elementsOfType(plan, "window"), ...elementsOfType(plan, "penetration")];
  const levels = levelsByElevation(plan).map((level): LevelFeatureCollection => {
    const f: PlanFeature[] = [];
    for (const room of elementsOfType(plan, "room")) {
      if (room.levelId !== level.id || room.outline.length < 3) continue;
      f.push({ type: "Feature", id: room.id, geometry: { type: "Polygon", coordinates: [ring(room.outline)] }, properties: {
        kind: "room", name: room.name, use: room.use, levelId: room.levelId, areaM2: r4(polygonAreaM2(room.outline)), perimeterM: r3(polygonPerimeterM(room.outline)),
        floorConstructionId: room.floor?.constructionId ?? plan.defaults.floorConstructionId,
      } });
    }
    for (const v of elementsOfType(plan, "void")) {
      if (v.levelId !== level.id || v.outline.length < 3) continue;
      f.push({ type: "Feature", id: v.id, geometry: { type: "Polygon", coordinates: [ring(v.outline)] }, properties: { kind: v.kind, name: v.name, levelId: v.levelId, areaM2: r4(polygonAreaM2(v.outline)), depthM: v.depthM } });
    }
    for (const piece of pieces) {
      if (piece.levelId !== level.id) continue;
      const s = pieceResolved(plan, piece);
      f.push({ type: "Feature", id: piece.id, geometry: { type: "LineString", coordinates: [pt(piece.start), pt(piece.end)] }, properties: {
        kind: "wall", wallKind: piece.kind, levelId: level.id, rooms: piece.sides.map((x) => x.roomId), lengthM: r3(piece.lengthM), thicknessM: s.thicknessM, heightM: s.heightM, constructionId: s.constructionId,
      } });
    }
    for (const w of elementsOfType(plan, "wall")) {
      if (w.levelId !== level.id) continue;
      f.push({ type: "Feature", id: w.id, geometry: { type: "LineString", coordinates: [pt(w.start), pt(w.end)] }, properties: { kind: "free-wall", levelId: w.levelId, thicknessM: w.thicknessM, constructionId: w.constructionId } });
    }
    for (const o of openings) {
      const place = openingPlacement(plan, pieces, o, plan.defaults.wallToleranceM);
      if (!place.ok) continue;
      const hostLevel = pieces.find((p) => p.id === place.hostId)?.levelId ?? (plan.elements[place.hostId] as { levelId?: string } | undefined)?.levelId;
      if (hostLevel !== level.id) continue;
      f.push({ type: "Feature", id: o.id, geometry: { type: "LineString", coordinates: [pt(place.start), pt(place.end)] }, properties: {
        kind: o.type, name: o.name ?? null, levelId: level.id, wallRef: o.wallRef, hostId: place.hostId, widthM: o.widthM, heightM: o.heightM,
        constructionId: o.type === "penetration" ? null : o.constructionId, ...(o.type === "penetration" ? { openAreaM2: o.openAreaM2, what: o.what } : {}),
      } });
    }
    const ventsHere = new Set<string>();
    for (const v of elementsOfType(plan, "vent")) {
      const lvl = spaceLevelId(plan, v.spaceId);
      if (lvl !== level.id) continue;
      ventsHere.add(v.id);
      f.push({ type: "Feature", id: v.id, geometry: { type: "Point", coordinates: pt(v.position) }, properties: { kind: "vent", name: v.name ?? null, levelId: level.id, spaceId: v.spaceId, mount: v.mount, openAreaM2: v.openAreaM2 } });
    }
    for (const d of elementsOfType(plan, "duct")) {
      const a = plan.elements[d.fromVentId], b = plan.elements[d.toVentId];
      if (a?.type !== "vent" || b?.type !== "vent" || !ventsHere.has(a.id)) continue;
      f.push({ type: "Feature", id: d.id, geometry: { type: "LineString", coordinates: [pt(a.position), pt(b.position)] }, properties: { kind: "duct", name: d.name ?? null, levelId: level.id, lengthM: d.lengthM, lining: d.lining, fromVentId: a.id, toVentId: b.id } });
    }
    for (const p of elementsOfType(plan, "pin")) {
      if (p.levelId === level.id) f.push({ type: "Feature", id: p.id, geometry: { type: "Point", coordinates: pt(p.position) }, properties: { kind: "pin", levelId: p.levelId, label: p.label, spaceId: p.spaceId ?? null } });
    }
    for (const n of elementsOfType(plan, "note")) {
      if (n.levelId === level.id) f.push({ type: "Feature", id: n.id, geometry: { type: "Point", coordinates: pt(n.position) }, properties: { kind: "note", levelId: n.levelId, text: n.text } });
    }
    return { type: "FeatureCollection", features: f, hushmark: { planId: plan.id, levelId: level.id, levelName: level.name, elevationM: level.elevationM, frame: frame.kind, note: frame.note } };
  });
  return { frame, levels };
}
