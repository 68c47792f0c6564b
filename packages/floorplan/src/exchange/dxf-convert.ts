import type { IEntity } from "dxf-parser";
import type { Point, Room } from "../document/schema.js";
import { boundsM, pointInPolygon, polygonAreaM2, polygonSelfIntersections } from "../geometry/polygon.js";
import { polygonOverlapM2 } from "../geometry/overlap.js";
import { distanceToLineM } from "../geometry/segments.js";
import { affineMaxScale, affinePoint, affineThen, IDENTITY, insertMaps, type Affine } from "./dxf-blocks.js";
import { entityShape } from "./dxf-entities.js";
import type { DxfImport, DxfImportOptions, DxfLayerRole } from "./dxf-import-types.js";
import { lineNetworkFaces, MAX_FACE_SEGMENTS, MIN_FACE_WIDTH_M } from "./dxf-faces.js";
import { closedLoops, type TracedPath } from "./dxf-loops.js";
import { openingsFromDrawings, safeId } from "./dxf-openings.js";
import { ReportLines } from "./dxf-report.js";
import type { DxfUnits } from "./dxf-units.js";

/** Defaults of the import options (m). */
export const DXF_IMPORT_DEFAULTS = {
  chordToleranceM: 0.01,
  snapM: 0.005,
  hostToleranceM: 0.3,
  idPrefix: "dxf",
  door: { heightM: 2.0, constructionId: "door-hollow-core" },
  window: { heightM: 1.2, sillM: 0.9, constructionId: "glazing-double-4-16-4" },
} as const;

/** Smaller closed outlines are not rooms, m² (the plan's own zero-area threshold). */
const MIN_ROOM_AREA_M2 = 0.01;

/** An incremental DXF converter: feed it parsed entities chunk by chunk, then finish. */
export interface DxfConverter {
  /** Converts one chunk of entities; returns how many have been read so far. */
  add(entities: readonly IEntity[]): number;
  finish(): DxfImport;
}

/** Drops repeated corners and corners in a straight line with their neighbours (m). */
function cleanOutline(points: readonly Point[], snapM: number): Point[] {
  let pts = points.filter((p, i) => {
    const q = points[(i + 1) % points.length]!;
    return Math.hypot(q.x - p.x, q.y - p.y) > snapM;
  });
  let changed = true;
  while (changed && pts.length > 3) {
    changed = false;
    for (let i = 0; i < pts.length; i++) {
      const prev = pts[(i + pts.length - 1) % pts.length]!, next = pts[(i + 1) % pts.length]!;
      if (distanceToLineM(pts[i]!, prev, next) < 1e-7) {
        pts = pts.filter((_, k) => k !== i);
        changed = true;
        break;
      }
    }
  }
  return pts;
}

/**
 * Starts an incremental conversion with resolved units (`metresPerUnit`): entities on walls
 * layers become room outlines where they close, those on doors and windows layers openings on
 * the nearest room edge, everything else kept is underlay, and every skip is reported.
 */
export function dxfConverter(options: DxfImportOptions, units: Extract<DxfUnits, { metresPerUnit: number }>): DxfConverter {
  const o = { ...DXF_IMPORT_DEFAULTS, ...options };
  const skipped = new ReportLines();
  const toUnderlay = new ReportLines();
  const byType: Record<string, { read: number; used: number; skipped: number }> = {};
  const byRole: Record<Exclude<DxfLayerRole, "ignore">, TracedPath[]> = { walls: [], doors: [], windows: [], underlay: [] };
  const labels: Array<{ text: string; at: Point }> = [];
  let read = 0;
  const roleOf = (layer: string): DxfLayerRole => o.layerRoles[layer] ?? o.otherLayers ?? "underlay";

  const blocks = options.blocks ?? {};
  const maxDepth = 8;

  // Shapes are made in the entity's own drawing units, then mapped through the block placements
  // above it and scaled to metres; arcs are flattened finely enough for the largest stretch.
  function place(entity: IEntity, parentLayer: string | null, map: Affine, handlePrefix: string, depth: number): "used" | "skipped" {
    const own = entity.layer ?? "0";
    // Entities on layer 0 inside a block take the layer of the INSERT that places them.
    const layer = parentLayer !== null && own === "0" ? parentLayer : own;
    const role = roleOf(layer);
    const type = entity.type ?? "UNKNOWN";
    const handle = `${handlePrefix}${entity.handle === undefined ? "" : String(entity.handle)}`;
    if (role === "ignore") {
      skipped.add(`on layer "${layer}", set to ignore`, type, [handle]);
      return "skipped";
    }
    if (type === "INSERT") {
      const insert = entity as unknown as { name?: string; inPaperSpace?: boolean };
      const block = insert.name === undefined ? undefined : blocks[insert.name];
      if (insert.inPaperSpace) { skipped.add("drawn on a paper-space layout, not the model", type, [handle]); return "skipped"; }
      if (!block || !Array.isArray(block.entities)) { skipped.add("a block reference to a block the file does not define", type, [handle]); return "skipped"; }
      if (depth >= maxDepth) { skipped.add(`blocks nested deeper than ${maxDepth} levels`, type, [handle]); return "skipped"; }
      let any = false;
      for (const cell of insertMaps(entity as unknown as Parameters<typeof insertMaps>[0], block.position)) {
        for (const child of block.entities) if (place(child, layer, affineThen(map, cell), `${handle}.`, depth + 1) === "used") any = true;
      }
      if (!any) skipped.add("a block reference whose block holds nothing to import", type, [handle]);
      return any ? "used" : "skipped";
    }
    const stretch = affineMaxScale(map) * units.metresPerUnit;
    const shape = entityShape(entity, 1, o.chordToleranceM / stretch);
    if (shape.kind === "skip") {
      skipped.add(shape.reason, type, [handle]);
      return "skipped";
    }
    const toPlan = (p: Point): Point => {
      const q = affinePoint(map, p);
      return { x: q.x * units.metresPerUnit, y: q.y * units.metresPerUnit };
    };
    if (shape.kind === "label") labels.push({ text: shape.text, at: toPlan(shape.at) });
    else byRole[role].push({ layer, points: shape.points.map(toPlan), closed: shape.closed, handles: handle ? [handle] : [] });
    return "used";
  }

  function add(entities: readonly IEntity[]): number {
    for (const entity of entities) {
      read++;
      const type = entity.type ?? "UNKNOWN";
      const count = (byType[type] ??= { read: 0, used: 0, skipped: 0 });
      count.read++;
      if (place(entity, null, IDENTITY, "", 0) === "used") count.used++;
      else count.skipped++;
    }
    return read;
  }

  /** Moves everything so the drawing's lower-left corner sits at the plan origin (whole metres). */
  function shiftedToOrigin(): Point {
    let minX = Infinity, minY = Infinity;
    for (const list of Object.values(byRole)) for (const p of list) for (const q of p.points) { minX = Math.min(minX, q.x); minY = Math.min(minY, q.y); }
    if (!Number.isFinite(minX)) return { x: 0, y: 0 };
    // Whole metres keep the shifted coordinates as readable as the drawing's own.
    const shift = { x: Math.floor(minX), y: Math.floor(minY) };
    for (const list of Object.values(byRole)) for (const p of list) p.points = p.points.map((q) => ({ x: q.x - shift.x, y: q.y - shift.y }));
    for (const l of labels) l.at = { x: l.at.x - shift.x, y: l.at.y - shift.y };
    return shift;
  }

  function finish(): DxfImport {
    const shiftM = o.moveToOrigin ? shiftedToOrigin() : { x: 0, y: 0 };
    const candidates: TracedPath[] = byRole.walls.filter((p) => p.closed);
    const open = byRole.walls.filter((p) => !p.closed);
    // Open wall lines enclose rooms as the faces of their network (split where lines cross or end
    // on one another); past the size limit only chains that close end to end count.
    let net = lineNetworkFaces(open, o.snapM, MIN_ROOM_AREA_M2);
    let faces = net.faces;
    if (net.tooMany) {
      const { loops, leftover } = closedLoops(open, o.snapM);
      faces = loops;
      net = { faces: loops, thin: [], unused: leftover, tooMany: true };
    }
    const reason = net.tooMany
      ? `wall lines that do not close end to end (over ${MAX_FACE_SEGMENTS} loose segments, so crossings were not looked for)`
      : "wall lines that enclose no room";
    for (const p of net.unused) toUnderlay.add(reason, "path", p.handles);
    for (const f of net.thin) toUnderlay.add(`a strip under ${MIN_FACE_WIDTH_M} m wide between wall lines (a wall drawn with two lines?)`, "outline", f.handles);
    const underlayPaths: TracedPath[] = [...byRole.underlay, ...net.unused, ...net.thin];
    const outlines: Array<{ path: TracedPath; points: Point[]; areaM2: number }> = [];
    for (const path of [...candidates, ...faces]) {
      const points = cleanOutline(path.points, o.snapM);
      const areaM2 = points.length >= 3 ? polygonAreaM2(points) : 0;
      let reason: string | null = null;
      if (areaM2 < MIN_ROOM_AREA_M2) reason = `a closed outline under ${MIN_ROOM_AREA_M2} m²`;
      else if (polygonSelfIntersections(points).length > 0) reason = "a closed outline that crosses itself";
      if (reason) {
        toUnderlay.add(reason, "outline", path.handles);
        underlayPaths.push(path);
      } else outlines.push({ path, points, areaM2 });
    }
    // A closed outline around other outlines is the building's or a flat's edge, not a room; a copy is a duplicate.
    outlines.sort((a, b) => b.areaM2 - a.areaM2);
    const bounds = outlines.map((a) => boundsM(a.points));
    // Only outlines whose left edge falls within another's x-extent can lie inside it: sweep by left edge.
    const byMinX = outlines.map((_, i) => i).sort((p, q) => bounds[p]!.minX - bounds[q]!.minX);
    const kept: typeof outlines = [];
    outlines.forEach((a, i) => {
      const ba = bounds[i]!;
      let lo = 0, hi = byMinX.length;
      while (lo < hi) {
        const mid = (lo + hi) >> 1;
        if (bounds[byMinX[mid]!]!.minX < ba.minX - o.snapM) lo = mid + 1;
        else hi = mid;
      }
      let encloses = false, duplicate = false;
      for (let s = lo; s < byMinX.length && !encloses && bounds[byMinX[s]!]!.minX <= ba.maxX + o.snapM; s++) {
        const k = byMinX[s]!;
        if (k === i) continue;
        const b = outlines[k]!;
        const bb = bounds[k]!;
        if (bb.maxX > ba.maxX + o.snapM || bb.minY < ba.minY - o.snapM || bb.maxY > ba.maxY + o.snapM) continue;
        const overlap = polygonOverlapM2(a.points, b.points);
        if (overlap < 0.95 * b.areaM2) continue;
        if (b.areaM2 >= 0.99 * a.areaM2) duplicate ||= k < i;
        else encloses = true;
      }
      if (encloses || duplicate) {
        toUnderlay.add(encloses ? "a closed outline around other outlines (a building or unit edge?)" : "a second copy of an outline", "outline", a.path.handles);
        underlayPaths.push(a.path);
      } else kept.push(a);
    });
    const ids = new Set<string>();
    const usedLabels = new Set<number>();
    // Labels sorted by x, so each room looks only at those within its x-extent.
    const labelOrder = labels.map((_, k) => k).sort((p, q) => labels[p]!.at.x - labels[q]!.at.x);
    const labelInside = (outline: readonly Point[]): number => {
      const b = boundsM(outline);
      let lo = 0, hi = labelOrder.length;
      while (lo < hi) {
        const mid = (lo + hi) >> 1;
        if (labels[labelOrder[mid]!]!.at.x < b.minX) lo = mid + 1;
        else hi = mid;
      }
      let best = -1;
      for (let s = lo; s < labelOrder.length && labels[labelOrder[s]!]!.at.x <= b.maxX; s++) {
        const k = labelOrder[s]!;
        const at = labels[k]!.at;
        // The first label in file order wins, whatever the sort put first.
        if (!usedLabels.has(k) && (best < 0 || k < best) && at.y >= b.minY && at.y <= b.maxY && pointInPolygon(at, outline)) best = k;
      }
      return best;
    };
    const rooms: Room[] = kept
      .sort((a, b) => ((a.path.handles[0] ?? "") < (b.path.handles[0] ?? "") ? -1 : 1))
      .map((a, n) => {
        let id = `${o.idPrefix}-room-${safeId(a.path.handles[0] ?? String(n + 1))}`;
        for (let k = 2; ids.has(id); k++) id = `${o.idPrefix}-room-${safeId(a.path.handles[0] ?? "")}-${k}`;
        ids.add(id);
        const li = labelInside(a.points);
        if (li >= 0) usedLabels.add(li);
        return {
          type: "room", id, levelId: o.levelId, name: li >= 0 ? labels[li]!.text : `Room ${n + 1}`, use: o.roomUse ?? "other",
          outline: a.points.map((p, k) => ({ id: `v${k + 1}`, x: p.x, y: p.y })),
        } satisfies Room;
      });
    const hostOpts = { snapM: o.snapM, hostToleranceM: o.hostToleranceM, idPrefix: o.idPrefix, door: o.door, window: o.window };
    const doors = openingsFromDrawings("door", byRole.doors, rooms, hostOpts, toUnderlay);
    const windows = openingsFromDrawings("window", byRole.windows, rooms, hostOpts, toUnderlay);
    underlayPaths.push(...doors.leftover, ...windows.leftover);
    const all = underlayPaths.flatMap((p) => p.points);
    return {
      rooms,
      openings: [...doors.openings, ...windows.openings],
      labels: labels.filter((_, k) => !usedLabels.has(k)),
      underlay: { levelId: o.levelId, paths: underlayPaths, bounds: all.length ? boundsM(all) : null },
      report: {
        units,
        chordToleranceM: o.chordToleranceM,
        shiftM,
        entitiesRead: read,
        converted: { rooms: rooms.length, doors: doors.openings.length, windows: windows.openings.length, underlayPaths: underlayPaths.length, roomNames: usedLabels.size },
        byType,
        skipped: skipped.lines(),
        toUnderlay: toUnderlay.lines(),
      },
    };
  }
  return { add, finish };
}
