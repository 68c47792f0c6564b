import { edgeRefParts, elementsOfType, roomEdges, type FreeWall, type Plan, type Point } from "@hushmark/floorplan";

/** A straight wall line an opening can sit on: a room edge (`room:vertex`) or a free wall's id. */
export interface WallHost {
  ref: string;
  levelId: string;
  start: Point;
  end: Point;
  lengthM: number;
  thicknessM: number;
  /** The element that owns the line: the room or the free wall. */
  ownerId: string;
}

const hostsCache = new WeakMap<object, { list: WallHost[]; byRef: Map<string, WallHost> }>();

/** Every room edge and free wall of the plan, in id order (cached per elements record). */
export function wallHosts(plan: Plan): WallHost[] {
  return hostIndex(plan).list;
}

// Opening placement asks for one host per door and window: a lookup by ref keeps a plan of
// thousands of openings from scanning every room edge for each.
function hostIndex(plan: Plan): { list: WallHost[]; byRef: Map<string, WallHost> } {
  const hit = hostsCache.get(plan.elements);
  if (hit) return hit;
  const out: WallHost[] = [];
  const thickness = plan.defaults.wallThicknessM;
  for (const room of elementsOfType(plan, "room")) {
    for (const e of roomEdges(room)) {
      out.push({ ref: e.ref, levelId: e.levelId, start: e.start, end: e.end, lengthM: e.lengthM, thicknessM: thickness, ownerId: room.id });
    }
  }
  for (const w of elementsOfType(plan, "wall")) out.push(freeWallHost(w));
  const index = { list: out, byRef: new Map(out.map((h) => [h.ref, h])) };
  hostsCache.set(plan.elements, index);
  return index;
}

function freeWallHost(w: FreeWall): WallHost {
  return {
    ref: w.id, levelId: w.levelId, start: w.start, end: w.end,
    lengthM: Math.hypot(w.end.x - w.start.x, w.end.y - w.start.y), thicknessM: w.thicknessM, ownerId: w.id,
  };
}

/** The host line an opening's `wallRef` names, or undefined when it no longer exists. */
export function hostOf(plan: Plan, wallRef: string): WallHost | undefined {
  const el = plan.elements[wallRef];
  if (el?.type === "wall") return freeWallHost(el);
  const parts = edgeRefParts(wallRef);
  if (!parts) return undefined;
  return hostIndex(plan).byRef.get(wallRef);
}

/** The level an element is drawn on; openings take their host's, ducts their first grille's. */
export function levelOf(plan: Plan, id: string): string | undefined {
  const el = plan.elements[id];
  if (!el) return undefined;
  switch (el.type) {
    case "room": case "wall": case "void": case "pin": case "note": return el.levelId;
    case "door": case "window": case "penetration": return hostOf(plan, el.wallRef)?.levelId;
    case "vent": return levelOf(plan, el.spaceId);
    case "duct": return levelOf(plan, el.fromVentId);
    default: return undefined;
  }
}
