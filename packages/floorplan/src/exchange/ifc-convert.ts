import type { Door, FreeWall, Level, Room, Window } from "../document/schema.js";
import { polygonAreaM2 } from "../geometry/polygon.js";
import { DXF_IMPORT_DEFAULTS } from "./dxf-convert.js";
import { safeId } from "./dxf-openings.js";
import { ReportLines } from "./dxf-report.js";
import { outlineOnWallAxes } from "./ifc-outline.js";
import type { IfcImport, IfcImportOptions, IfcImportReport, IfcModelRead, IfcSurvey, IfcWallRead } from "./ifc-types.js";

export const IFC_IMPORT_DEFAULTS = {
  idPrefix: "ifc",
  roomOutlines: "wall-centre",
  hostToleranceM: 0.1,
  wallConstructionId: "stud-wood-1x1-gypsum",
  roomUse: "other",
  door: { constructionId: DXF_IMPORT_DEFAULTS.door.constructionId },
  window: { constructionId: DXF_IMPORT_DEFAULTS.window.constructionId },
} as const;

/** Walls bucketed on a square grid (m) by their bounding boxes, so nearby walls are found without a scan of all. */
function wallGrid(walls: readonly IfcWallRead[], cellM = 2) {
  const cells = new Map<string, IfcWallRead[]>();
  const order = new Map(walls.map((w, i) => [w, i]));
  const range = (a: number, b: number) => [Math.floor(Math.min(a, b) / cellM), Math.floor(Math.max(a, b) / cellM)] as const;
  const visit = (x0: number, y0: number, x1: number, y1: number, fn: (key: string) => void) => {
    const [i0, i1] = range(x0, x1), [j0, j1] = range(y0, y1);
    for (let i = i0; i <= i1; i++) for (let j = j0; j <= j1; j++) fn(`${i},${j}`);
  };
  for (const w of walls) {
    const pad = w.thicknessM;
    visit(Math.min(w.start.x, w.end.x) - pad, Math.min(w.start.y, w.end.y) - pad, Math.max(w.start.x, w.end.x) + pad, Math.max(w.start.y, w.end.y) + pad, (k) => {
      const list = cells.get(k);
      if (list) list.push(w);
      else cells.set(k, [w]);
    });
  }
  /** Walls whose boxes may come within `padM` of the box (m), each once, in reading order. */
  return (box: { minX: number; minY: number; maxX: number; maxY: number }, padM: number): IfcWallRead[] => {
    const found = new Set<IfcWallRead>();
    visit(box.minX - padM, box.minY - padM, box.maxX + padM, box.maxY + padM, (k) => { for (const w of cells.get(k) ?? []) found.add(w); });
    return [...found].sort((a, b) => order.get(a)! - order.get(b)!);
  };
}

const boxOf = (pts: ReadonlyArray<{ x: number; y: number }>) => ({
  minX: Math.min(...pts.map((p) => p.x)), minY: Math.min(...pts.map((p) => p.y)), maxX: Math.max(...pts.map((p) => p.x)), maxY: Math.max(...pts.map((p) => p.y)),
});

/** Storeys with what is on them and the distinct wall layer sets, for the surveyor to confirm and map. */
export function ifcSurvey(model: IfcModelRead): IfcSurvey {
  const sets = new Map<string, IfcSurvey["layerSets"][number]>();
  let wallsWithoutLayers = 0;
  for (const w of model.walls) {
    if (!w.layerSet) {
      wallsWithoutLayers++;
      continue;
    }
    const s = sets.get(w.layerSet.key);
    if (s) s.walls++;
    else sets.set(w.layerSet.key, { ...w.layerSet, walls: 1 });
  }
  const wallStorey = new Map(model.walls.map((w) => [w.globalId, w.storeyId]));
  const hostStorey = (o: IfcModelRead["openings"][number]) => (o.hostWallId ? wallStorey.get(o.hostWallId) : undefined) ?? o.storeyId;
  return {
    schema: model.schema,
    lengthUnit: model.lengthUnit,
    storeys: model.storeys.map((s) => ({
      ...s,
      spaces: model.spaces.filter((x) => x.storeyId === s.globalId).length,
      walls: model.walls.filter((x) => x.storeyId === s.globalId).length,
      doors: model.openings.filter((x) => x.kind === "door" && hostStorey(x) === s.globalId).length,
      windows: model.openings.filter((x) => x.kind === "window" && hostStorey(x) === s.globalId).length,
    })),
    layerSets: [...sets.values()].sort((a, b) => b.walls - a.walls || (a.key < b.key ? -1 : 1)),
    wallsWithoutLayers,
  };
}

/** The wall an opening fills (the file's relation), else the nearest on its storey within tolerance whose span holds its centre. */
function hostOf(byId: ReadonlyMap<string, IfcWallRead>, near: ReturnType<typeof wallGrid>, o: IfcModelRead["openings"][number], tolM: number): IfcWallRead | undefined {
  if (o.hostWallId) {
    const w = byId.get(o.hostWallId);
    if (w) return w;
  }
  let best: { w: IfcWallRead; d: number } | undefined;
  for (const w of near({ minX: o.centre.x, minY: o.centre.y, maxX: o.centre.x, maxY: o.centre.y }, tolM)) {
    if (o.storeyId && w.storeyId !== o.storeyId) continue;
    const len = Math.hypot(w.end.x - w.start.x, w.end.y - w.start.y);
    const ux = (w.end.x - w.start.x) / len, uy = (w.end.y - w.start.y) / len;
    const t = (o.centre.x - w.start.x) * ux + (o.centre.y - w.start.y) * uy;
    const d = Math.abs(-(o.centre.x - w.start.x) * uy + (o.centre.y - w.start.y) * ux);
    if (t < 0 || t > len || d > w.thicknessM / 2 + tolM) continue;
    if (!best || d < best.d) best = { w, d };
  }
  return best?.w;
}

/**
 * Turns a read model into plan elements with the surveyor's choices: a level per chosen storey
 * (or an existing level), rooms from spaces, free walls from walls with their thickness and the
 * construction mapped from their layer set, doors and windows hosted on their wall (m).
 */
export function convertIfc(model: IfcModelRead, options: IfcImportOptions = {}): IfcImport {
  const o = { ...IFC_IMPORT_DEFAULTS, ...options };
  const skipped = new ReportLines();
  for (const line of model.skipped) skipped.add(line.reason, line.types[0] ?? "IfcProduct", line.handles, line.count);
  const byType = structuredCloneCounts(model.byType);
  const storeyById = new Map(model.storeys.map((s) => [s.globalId, s]));
  const chosen = new Set(options.storeys ?? model.storeys.map((s) => s.globalId));
  const levelOf = new Map<string, string>();
  const levels: Level[] = [];
  const reportLevels: IfcImportReport["levels"] = [];
  for (const s of model.storeys) {
    if (!chosen.has(s.globalId)) continue;
    const onto = options.ontoLevels?.[s.globalId];
    const levelId = onto ?? `${o.idPrefix}-level-${safeId(s.globalId)}`;
    levelOf.set(s.globalId, levelId);
    if (!onto) levels.push({ type: "level", id: levelId, name: s.name, elevationM: s.elevationM, ...(s.heightM !== undefined ? { heightM: s.heightM } : {}) });
    reportLevels.push({ levelId, name: s.name, elevationM: s.elevationM, heightM: s.heightM, heightFrom: s.heightFrom, added: !onto });
  }
  const notChosen = (type: string, gid: string) => {
    skipped.add("on a storey left out", type, [gid]);
    const c = byType[type];
    if (c) { c.used--; c.skipped++; }
  };

  const walls: FreeWall[] = [];
  const wallLayers: IfcImportReport["wallLayers"] = [];
  const wallIdOf = new Map<string, string>();
  const keptWalls: IfcWallRead[] = [];
  for (const w of model.walls) {
    const levelId = levelOf.get(w.storeyId);
    if (!levelId) { notChosen(w.ifcType, w.globalId); continue; }
    const id = `${o.idPrefix}-wall-${safeId(w.globalId)}`;
    const constructionId = (w.layerSet && o.constructionFor?.[w.layerSet.key]) || o.wallConstructionId;
    walls.push({ type: "wall", id, levelId, start: { ...w.start }, end: { ...w.end }, constructionId, thicknessM: w.thicknessM, heightM: w.heightM });
    wallLayers.push({ wallId: id, name: w.name, layerSetKey: w.layerSet?.key ?? null, layers: w.layerSet?.layers ?? [], constructionId });
    wallIdOf.set(w.globalId, id);
    keptWalls.push(w);
  }

  const nearKept = new Map<string, ReturnType<typeof wallGrid>>();
  for (const storeyId of new Set(keptWalls.map((w) => w.storeyId))) nearKept.set(storeyId, wallGrid(keptWalls.filter((w) => w.storeyId === storeyId)));
  const rooms: Room[] = [];
  const reportRooms: IfcImportReport["rooms"] = [];
  let roomNames = 0;
  for (const s of model.spaces) {
    const levelId = levelOf.get(s.storeyId);
    if (!levelId) { notChosen("IfcSpace", s.globalId); continue; }
    const onStorey = nearKept.get(s.storeyId)?.(boxOf(s.footprint), 1) ?? [];
    const snapped = o.roomOutlines === "wall-centre" ? outlineOnWallAxes(s.footprint, onStorey) : { points: s.footprint, moved: 0 };
    const id = `${o.idPrefix}-room-${safeId(s.globalId)}`;
    const name = s.longName || s.name || "Room";
    if (s.longName || s.name) roomNames++;
    rooms.push({ type: "room", id, levelId, name, use: o.roomUse, outline: snapped.points.map((p, i) => ({ id: `v${i + 1}`, x: p.x, y: p.y })) });
    reportRooms.push({ roomId: id, name, ifcAreaM2: polygonAreaM2(s.footprint), planAreaM2: polygonAreaM2(snapped.points), edgesMoved: snapped.moved });
  }

  const openings: Array<Door | Window> = [];
  const wallById = new Map(model.walls.map((w) => [w.globalId, w]));
  const nearAll = wallGrid(model.walls);
  for (const op of model.openings) {
    const typeName = op.ifcType;
    const host = hostOf(wallById, nearAll, op, o.hostToleranceM);
    const wallId = host ? wallIdOf.get(host.globalId) : undefined;
    if (!host) {
      skipped.add(`a ${op.kind} is in no wall that was read`, typeName, [op.globalId]);
      const c = byType[typeName];
      if (c) { c.used--; c.skipped++; }
      continue;
    }
    if (!wallId) { notChosen(typeName, op.globalId); continue; }
    const len = Math.hypot(host.end.x - host.start.x, host.end.y - host.start.y);
    const along = ((op.centre.x - host.start.x) * (host.end.x - host.start.x) + (op.centre.y - host.start.y) * (host.end.y - host.start.y)) / len;
    const widthM = Math.min(op.widthM, len);
    const offsetM = Math.max(0, Math.min(len - widthM, along - widthM / 2));
    const storey = storeyById.get(host.storeyId);
    const base = { id: `${o.idPrefix}-${op.kind}-${safeId(op.globalId)}`, ...(op.name ? { name: op.name } : {}), wallRef: wallId, offsetM, widthM, heightM: op.heightM };
    openings.push(op.kind === "door"
      ? { type: "door", ...base, constructionId: o.door.constructionId }
      : { type: "window", ...base, sillM: Math.max(0, op.bottomZM - (storey?.elevationM ?? host.bottomZM)), constructionId: o.window.constructionId });
  }

  return {
    levels, rooms, walls, openings,
    report: {
      schema: model.schema,
      lengthUnit: model.lengthUnit,
      entitiesRead: model.entitiesRead,
      converted: { levels: levels.length, rooms: rooms.length, walls: walls.length, doors: openings.filter((x) => x.type === "door").length, windows: openings.filter((x) => x.type === "window").length, roomNames },
      byType,
      skipped: skipped.lines(),
      rooms: reportRooms,
      levels: reportLevels,
      wallLayers,
    },
  };
}

function structuredCloneCounts(counts: IfcModelRead["byType"]): IfcModelRead["byType"] {
  return Object.fromEntries(Object.entries(counts).map(([k, v]) => [k, { ...v }]));
}
