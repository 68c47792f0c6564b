import { edgeRefParts, type Element, type Plan, type Point } from "@hushmark/floorplan";
import { command, type Command } from "../store/command.js";
import { dependents } from "./edit.js";
import type { IdSource } from "../store/ids.js";
import { roundMm } from "../geometry/vec.js";

/** Copied elements, plain JSON so it can go through the system clipboard. */
export interface Clip {
  kind: "hushmark-clip";
  elements: Element[];
}

/** Copies elements with what hangs on them (openings, grilles, ducts). Levels are not copied. */
export function copyElements(plan: Plan, ids: readonly string[]): Clip {
  const all = dependents(plan, ids);
  const elements = [...all].map((id) => plan.elements[id]).filter((e): e is Element => !!e && e.type !== "level");
  return { kind: "hushmark-clip", elements: JSON.parse(JSON.stringify(elements)) as Element[] };
}

function moved(p: Point, d: Point): Point {
  return { x: roundMm(p.x + d.x), y: roundMm(p.y + d.y) };
}

/**
 * Pastes a clip shifted by `offset` (m) onto `levelId`, with fresh ids; references inside the
 * clip (opening hosts, grille rooms, duct ends) follow the new ids. Answers the command and the new ids.
 */
export function pasteClip(clip: Clip, offset: Point, levelId: string, ids: IdSource): { cmd: Command; newIds: string[] } {
  const map = new Map<string, string>();
  const taken = new Set<string>();
  for (const el of clip.elements) {
    const id = ids.next(el.type, taken);
    taken.add(id);
    map.set(el.id, id);
  }
  const remapRef = (ref: string): string | null => {
    const parts = edgeRefParts(ref);
    if (parts) {
      const room = map.get(parts.roomId);
      return room ? `${room}:${parts.vertexId}` : null;
    }
    return map.get(ref) ?? null;
  };
  const out: Element[] = [];
  for (const src of clip.elements) {
    const el = JSON.parse(JSON.stringify(src)) as Element;
    el.id = map.get(src.id)!;
    switch (el.type) {
      case "room": case "void": el.levelId = levelId; el.outline = el.outline.map((v) => ({ id: v.id, ...moved(v, offset) })); break;
      case "wall": el.levelId = levelId; el.start = moved(el.start, offset); el.end = moved(el.end, offset); break;
      case "pin": case "note": el.levelId = levelId; el.position = moved(el.position, offset); break;
      case "vent": { el.position = moved(el.position, offset); const s = remapRef(el.spaceId); if (s) el.spaceId = s; break; }
      case "duct": { const a = remapRef(el.fromVentId), b = remapRef(el.toVentId); if (!a || !b) continue; el.fromVentId = a; el.toVentId = b; break; }
      case "door": case "window": case "penetration": { const r = remapRef(el.wallRef); if (!r) continue; el.wallRef = r; break; }
      default: break;
    }
    out.push(el);
  }
  const cmd = command("elements.paste", out.length === 1 ? "paste" : `paste ${out.length} items`, (draft) => {
    for (const el of out) draft.elements[el.id] = el;
  });
  return { cmd, newIds: out.map((e) => e.id) };
}
