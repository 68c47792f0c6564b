import type { Door, FreeWall, Level, Point, Room, RoomUse, Window } from "../document/schema.js";
import type { DxfReportLine } from "./dxf-import-types.js";

/** One layer of a wall's material layer set, outside to inside as the file lists them. */
export interface IfcMaterialLayer {
  material: string;
  thicknessM: number;
}

/** A wall's layer set: `key` tells sets apart (name and layers), `name` is what the file calls it. */
export interface IfcLayerSet {
  key: string;
  name: string;
  layers: IfcMaterialLayer[];
  totalThicknessM: number;
}

/** A storey as read: elevation and the height found for it (m), with where the height came from. */
export interface IfcStoreyRead {
  globalId: string;
  name: string;
  elevationM: number;
  heightM: number | undefined;
  heightFrom: "spaces" | "next storey" | "walls" | "none";
}

/** A space's footprint on its storey in plan metres (counter-clockwise, not closed). */
export interface IfcSpaceRead {
  globalId: string;
  name: string;
  longName: string;
  storeyId: string;
  footprint: Point[];
  heightM: number;
  /** Height of the floor face in the file's frame, m. */
  bottomZM: number;
}

/** A straight wall as read: its axis (centreline) in plan metres, thickness and height (m). */
export interface IfcWallRead {
  globalId: string;
  /** IfcWall or IfcWallStandardCase, for the report's counts. */
  ifcType: string;
  name: string;
  storeyId: string;
  start: Point;
  end: Point;
  thicknessM: number;
  heightM: number;
  bottomZM: number;
  layerSet: IfcLayerSet | null;
}

/** A door or window as read: size (m), its centre in plan metres and the wall it fills (if the file says). */
export interface IfcOpeningRead {
  kind: "door" | "window";
  globalId: string;
  ifcType: string;
  name: string;
  storeyId: string | null;
  centre: Point;
  widthM: number;
  heightM: number;
  /** Height of its bottom in the file's frame, m (the sill comes from this and the storey). */
  bottomZM: number;
  hostWallId: string | null;
}

/** Everything taken from an IFC file, in metres, before any choice of the surveyor: plain data a worker can keep. */
export interface IfcModelRead {
  schema: string;
  lengthUnit: { name: string; metres: number };
  entitiesRead: number;
  storeys: IfcStoreyRead[];
  spaces: IfcSpaceRead[];
  walls: IfcWallRead[];
  openings: IfcOpeningRead[];
  /** Elements read but not usable, each with its reason (IFC type names, GlobalIds as handles). */
  skipped: DxfReportLine[];
  byType: Record<string, { read: number; used: number; skipped: number }>;
}

/** What the storey-and-materials step needs: storeys with counts, distinct layer sets with wall counts. */
export interface IfcSurvey {
  schema: string;
  lengthUnit: { name: string; metres: number };
  storeys: Array<IfcStoreyRead & { spaces: number; walls: number; doors: number; windows: number }>;
  layerSets: Array<IfcLayerSet & { walls: number }>;
  wallsWithoutLayers: number;
}

export interface IfcImportOptions {
  /** Storeys to bring in (GlobalIds); default all. */
  storeys?: readonly string[];
  /** Put a storey onto a level already in the plan instead of adding a new one (storey GlobalId → level id). */
  ontoLevels?: Readonly<Record<string, string>>;
  /** Catalogue construction per layer set key; walls of other sets get `wallConstructionId`. */
  constructionFor?: Readonly<Record<string, string>>;
  wallConstructionId?: string;
  /** `wall-centre` moves room edges that lie along a wall face onto the wall's centreline (the plan's convention). */
  roomOutlines?: "wall-centre" | "as-drawn";
  /** A door or window without a `fills` relation goes on a wall whose centreline is within half its thickness plus this, m. */
  hostToleranceM?: number;
  idPrefix?: string;
  roomUse?: RoomUse;
  door?: { constructionId: string };
  window?: { constructionId: string };
}

/** Per wall: its plan id, IFC name, the layer set read and the construction it got. */
export interface IfcWallLayersLine {
  wallId: string;
  name: string;
  layerSetKey: string | null;
  layers: IfcMaterialLayer[];
  constructionId: string;
}

/** What an IFC import converted and what it did not: the DXF report's shape with IFC's extras. */
export interface IfcImportReport {
  schema: string;
  lengthUnit: { name: string; metres: number };
  entitiesRead: number;
  converted: { levels: number; rooms: number; walls: number; doors: number; windows: number; roomNames: number };
  byType: Record<string, { read: number; used: number; skipped: number }>;
  skipped: DxfReportLine[];
  /** Rooms whose edges were moved onto wall centrelines: the file's area and the plan's (m²). */
  rooms: Array<{ roomId: string; name: string; ifcAreaM2: number; planAreaM2: number; edgesMoved: number }>;
  levels: Array<{ levelId: string; name: string; elevationM: number; heightM: number | undefined; heightFrom: IfcStoreyRead["heightFrom"]; added: boolean }>;
  wallLayers: IfcWallLayersLine[];
}

/** The converted model: new levels, rooms, free walls and openings (not yet in any plan) and the report. */
export interface IfcImport {
  levels: Level[];
  rooms: Room[];
  walls: FreeWall[];
  openings: Array<Door | Window>;
  report: IfcImportReport;
}

/** A file problem: `ifc-malformed`, `ifc-empty`, `ifc-not-step`, `ifc-no-storeys`, `ifc-level-unknown`. */
export interface IfcProblem {
  code: string;
  message: string;
}

export type IfcReadResult = { ok: true; model: IfcModelRead } | { ok: false; problem: IfcProblem };
