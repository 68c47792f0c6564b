import type { Door, Room, Window } from "../document/schema.js";
import { distanceM } from "../geometry/polygon.js";
import { projectionAlongM } from "../geometry/segments.js";
import { roomEdges, type RoomEdge } from "../geometry/walls.js";
import type { TracedPath } from "./dxf-loops.js";
import type { ReportLines } from "./dxf-report.js";

/** Narrower than this along the wall, a door or window drawing is not taken as an opening, m. */
export const MIN_OPENING_WIDTH_M = 0.2;

function distanceToSegmentM(p: { x: number; y: number }, e: RoomEdge): number {
  const t = Math.max(0, Math.min(e.lengthM, projectionAlongM(p, e.start, e.end)));
  const ux = (e.end.x - e.start.x) / e.lengthM, uy = (e.end.y - e.start.y) / e.lengthM;
  return distanceM(p, { x: e.start.x + ux * t, y: e.start.y + uy * t });
}

/** Groups paths whose bounding boxes touch within `snapM`: a leaf line and its swing arc are one door. */
function clusters(paths: readonly TracedPath[], snapM: number): TracedPath[][] {
  const boxes = paths.map((p) => {
    let minX = Infinity, minY = Infinity, maxX = -Infinity, maxY = -Infinity;
    for (const q of p.points) {
      minX = Math.min(minX, q.x); minY = Math.min(minY, q.y); maxX = Math.max(maxX, q.x); maxY = Math.max(maxY, q.y);
    }
    return { minX: minX - snapM, minY: minY - snapM, maxX: maxX + snapM, maxY: maxY + snapM };
  });
  const parent = paths.map((_, i) => i);
  const find = (x: number): number => (parent[x] === x ? x : (parent[x] = find(parent[x]!)));
  const order = boxes.map((_, i) => i).sort((a, b) => boxes[a]!.minX - boxes[b]!.minX);
  for (let k = 0; k < order.length; k++) {
    const a = boxes[order[k]!]!;
    for (let m = k + 1; m < order.length && boxes[order[m]!]!.minX <= a.maxX; m++) {
      const b = boxes[order[m]!]!;
      if (b.minY <= a.maxY && a.minY <= b.maxY) parent[find(order[m]!)] = find(order[k]!);
    }
  }
  const groups = new Map<number, TracedPath[]>();
  paths.forEach((p, i) => groups.set(find(i), [...(groups.get(find(i)) ?? []), p]));
  return [...groups.values()];
}

/**
 * Door and window drawings turned into openings on the nearest edge of the imported rooms: the
 * edge with most of the drawing's points within `hostToleranceM`, the opening spanning the
 * drawing's extent along it (m). Drawings near no wall go back as underlay.
 */
export function openingsFromDrawings(
  kind: "door" | "window",
  paths: readonly TracedPath[],
  rooms: readonly Room[],
  opts: { snapM: number; hostToleranceM: number; idPrefix: string; door: { heightM: number; constructionId: string }; window: { heightM: number; sillM: number; constructionId: string } },
  toUnderlay: ReportLines,
): { openings: Array<Door | Window>; leftover: TracedPath[] } {
  const edges = rooms.flatMap((r) => roomEdges(r));
  const openings: Array<Door | Window> = [];
  const leftover: TracedPath[] = [];
  const taken = new Set<string>();
  for (const group of clusters(paths, opts.snapM)) {
    const points = group.flatMap((p) => p.points);
    const handles = group.flatMap((p) => p.handles).sort();
    let best: { edge: RoomEdge; near: number; meanM: number } | undefined;
    for (const edge of edges) {
      let near = 0, sum = 0;
      for (const p of points) {
        const d = distanceToSegmentM(p, edge);
        if (d <= opts.hostToleranceM) near++;
        sum += d;
      }
      const meanM = sum / points.length;
      if (near === 0) continue;
      if (!best || near > best.near || (near === best.near && (meanM < best.meanM - 1e-9 || (Math.abs(meanM - best.meanM) <= 1e-9 && edge.ref < best.edge.ref)))) {
        best = { edge, near, meanM };
      }
    }
    if (!best) {
      toUnderlay.add(`a ${kind} drawing lies more than ${opts.hostToleranceM} m from every imported room wall`, kind, handles, group.length);
      leftover.push(...group);
      continue;
    }
    const along = points.map((p) => Math.max(0, Math.min(best!.edge.lengthM, projectionAlongM(p, best!.edge.start, best!.edge.end))));
    const fromM = Math.min(...along), toM = Math.max(...along);
    if (toM - fromM < MIN_OPENING_WIDTH_M) {
      toUnderlay.add(`a ${kind} drawing spans under ${MIN_OPENING_WIDTH_M} m along its wall`, kind, handles, group.length);
      leftover.push(...group);
      continue;
    }
    let id = `${opts.idPrefix}-${kind}-${safeId(handles[0] ?? String(openings.length + 1))}`;
    for (let k = 2; taken.has(id); k++) id = `${opts.idPrefix}-${kind}-${safeId(handles[0] ?? "")}-${k}`;
    taken.add(id);
    const host = { id, wallRef: best.edge.ref, offsetM: fromM, widthM: toM - fromM };
    openings.push(kind === "door"
      ? { type: "door", ...host, heightM: opts.door.heightM, constructionId: opts.door.constructionId }
      : { type: "window", ...host, heightM: opts.window.heightM, sillM: opts.window.sillM, constructionId: opts.window.constructionId });
  }
  return { openings, leftover };
}

/** Entity handles are hex, but a stray character must not make an invalid element id (no unit). */
export function safeId(s: string): string {
  return s.replace(/[^A-Za-z0-9_.-]/g, "_") || "x";
}
