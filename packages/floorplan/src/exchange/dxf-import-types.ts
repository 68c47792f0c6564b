import type { IEntity } from "dxf-parser";
import type { Door, Point, Room, RoomUse, Window } from "../document/schema.js";
import type { TracedPath } from "./dxf-loops.js";
import type { DxfProblem } from "./dxf-scan.js";
import type { DxfUnitChoice, DxfUnits } from "./dxf-units.js";

/** What the surveyor says a DXF layer holds. */
export type DxfLayerRole = "walls" | "doors" | "windows" | "underlay" | "ignore";

/** A block definition as the DXF reader gives it: base point and entities in block units. */
export interface DxfBlock {
  position?: { x?: number; y?: number };
  entities?: IEntity[];
}

export interface DxfImportOptions {
  /** The plan level the rooms and the underlay go on. */
  levelId: string;
  /** Role of each layer by name; layers not listed take `otherLayers`. */
  layerRoles: Record<string, DxfLayerRole>;
  otherLayers?: DxfLayerRole;
  /** Units to use when the header has none, or to override it. */
  units?: DxfUnitChoice;
  /** Largest gap between an arc and its chords, m (default 0.01). */
  chordToleranceM?: number;
  /** Line ends closer than this are joined, m (default 0.005). */
  snapM?: number;
  /** A door or window drawing counts as on a wall when it lies within this of the wall's line, m (default 0.3). */
  hostToleranceM?: number;
  /** Prefix of the new element ids (default "dxf"). */
  idPrefix?: string;
  roomUse?: RoomUse;
  door?: { heightM: number; constructionId: string };
  window?: { heightM: number; sillM: number; constructionId: string };
  /** Move the drawing so its lower-left corner (whole metres) is at the plan origin, for drawings in site coordinates. */
  moveToOrigin?: boolean;
  /** Block definitions for expanding INSERTs (`importDxf` passes the file's own). */
  blocks?: Record<string, DxfBlock>;
}

/** Line work kept to trace over, in plan metres on the import's level. */
export interface DxfUnderlay {
  levelId: string;
  paths: TracedPath[];
  bounds: { minX: number; minY: number; maxX: number; maxY: number } | null;
}

/** Entities of one kind left out or sent to the underlay, and why. */
export interface DxfReportLine {
  reason: string;
  count: number;
  types: string[];
  /** Up to five entity handles, to find them in CAD. */
  handles: string[];
}

/** What an import converted and what it did not, for the surveyor to read. */
export interface DxfImportReport {
  units: DxfUnits;
  chordToleranceM: number;
  /** How far the drawing was moved to bring it to the plan origin (drawing point − shift = plan point), m. */
  shiftM: { x: number; y: number };
  entitiesRead: number;
  converted: { rooms: number; doors: number; windows: number; underlayPaths: number; roomNames: number };
  byType: Record<string, { read: number; used: number; skipped: number }>;
  skipped: DxfReportLine[];
  /** Geometry on a walls, doors or windows layer that became underlay instead, and why. */
  toUnderlay: DxfReportLine[];
}

/** The converted drawing: new rooms and openings (not yet in any plan), the underlay and the report. */
export interface DxfImport {
  rooms: Room[];
  openings: Array<Door | Window>;
  labels: Array<{ text: string; at: Point }>;
  underlay: DxfUnderlay;
  report: DxfImportReport;
}

export type DxfImportResult = { ok: true; imported: DxfImport } | { ok: false; problem: DxfProblem; units?: DxfUnits; layerNames?: string[] };
