import type { Draft } from "immer";
import { edgeRefParts, type Element, type Plan, type Point, type WallSetting } from "@hushmark/floorplan";
import { command, type Command } from "../store/command.js";
import { hostOf } from "../geometry/hosts.js";
import { roundMm } from "../geometry/vec.js";

type DraftPlan = Draft<Plan>;

function shift(p: { x: number; y: number }, d: Point): void {
  p.x = roundMm(p.x + d.x);
  p.y = roundMm(p.y + d.y);
}

function hostOwner(wallRef: string): string {
  return edgeRefParts(wallRef)?.roomId ?? wallRef;
}

/**
 * Moves elements by `delta` (m). Openings whose wall moves with them ride along; an opening
 * moved on its own slides along its wall by the part of the move that lies along it.
 */
export function moveElements(ids: readonly string[], delta: Point, base: Plan): Command {
  const set = new Set(ids);
  return command("elements.move", ids.length === 1 ? "move" : `move ${ids.length} items`, (draft) => {
    for (const id of set) {
      const el = draft.elements[id];
      if (!el) continue;
      switch (el.type) {
        case "room": case "void": for (const v of el.outline) shift(v, delta); break;
        case "wall": shift(el.start, delta); shift(el.end, delta); break;
        case "pin": case "note": case "vent": shift(el.position, delta); break;
        case "door": case "window": case "penetration": {
          if (set.has(hostOwner(el.wallRef))) break;
          const host = hostOf(base, el.wallRef);
          if (!host || host.lengthM === 0) break;
          const along = (delta.x * (host.end.x - host.start.x) + delta.y * (host.end.y - host.start.y)) / host.lengthM;
          el.offsetM = roundMm(Math.max(0, Math.min(host.lengthM - el.widthM, el.offsetM + along)));
          break;
        }
        default: break;
      }
    }
    // Grilles belong to their room: moving the room carries them.
    for (const el of Object.values(draft.elements)) {
      if (el.type === "vent" && !set.has(el.id) && set.has(el.spaceId)) shift(el.position, delta);
    }
  });
}

/** Everything that cannot stand without `ids`: openings on their walls, grilles in their rooms, ducts on their grilles. */
export function dependents(plan: Plan, ids: readonly string[]): Set<string> {
  const gone = new Set(ids);
  let grew = true;
  while (grew) {
    grew = false;
    for (const el of Object.values(plan.elements)) {
      if (gone.has(el.id)) continue;
      let orphan = false;
      if (el.type === "door" || el.type === "window" || el.type === "penetration") orphan = gone.has(hostOwner(el.wallRef));
      else if (el.type === "vent") orphan = gone.has(el.spaceId);
      else if (el.type === "duct") orphan = gone.has(el.fromVentId) || gone.has(el.toVentId);
      else if (el.type === "room" || el.type === "void" || el.type === "wall" || el.type === "pin" || el.type === "note") orphan = gone.has(el.levelId);
      if (orphan) { gone.add(el.id); grew = true; }
    }
  }
  return gone;
}

/** Deletes elements and what depends on them, with the wall settings of the pieces they made. */
export function deleteElements(ids: readonly string[], base: Plan): Command {
  const gone = dependents(base, ids);
  return command("elements.delete", ids.length === 1 ? "delete" : `delete ${ids.length} items`, (draft) => {
    for (const id of gone) delete draft.elements[id];
    for (const key of Object.keys(draft.wallSettings)) {
      if (key.split("|").some((part) => gone.has(edgeRefParts(part)?.roomId ?? part))) delete draft.wallSettings[key];
    }
  });
}

/** The editable fields of each element type (everything but its type and id). */
export type ElementPatch = Partial<Omit<Element, "type" | "id">> & Record<string, unknown>;

/**
 * Sets fields on one element (a shallow merge; `undefined` removes an optional field). The
 * caller passes fields valid for the element's type; the plan is validated as a whole elsewhere.
 */
export function setProperties(id: string, patch: Record<string, unknown>, label = "change details"): Command {
  return command("element.set", label, (draft) => {
    const el = draft.elements[id] as unknown as Record<string, unknown> | undefined;
    if (!el) return;
    for (const [key, value] of Object.entries(patch)) {
      if (key === "id" || key === "type") continue;
      if (value === undefined) delete el[key];
      else el[key] = value;
    }
  });
}

/** Sets the construction, thickness, height or far side of one derived wall piece. */
export function setWallSetting(pieceId: string, patch: Partial<WallSetting>): Command {
  return command("wall-piece.set", "change wall", (draft) => {
    const current: Record<string, unknown> = { ...(draft.wallSettings[pieceId] ?? {}) };
    for (const [key, value] of Object.entries(patch)) {
      if (value === undefined) delete current[key];
      else current[key] = value;
    }
    if (Object.keys(current).length === 0) delete draft.wallSettings[pieceId];
    else draft.wallSettings[pieceId] = current as WallSetting;
  });
}

export function setPlanUnit(unit: "metric" | "imperial"): Command {
  return command("plan.unit", "change units", (draft) => { draft.displayUnit = unit; });
}

export function addLevel(id: string, name: string, elevationM: number, heightM?: number): Command {
  return command("level.add", "add level", (draft) => {
    if (draft.elements[id]) return;
    draft.elements[id] = { type: "level", id, name, elevationM, ...(heightM !== undefined ? { heightM } : {}) };
  });
}

export function renameElement(id: string, name: string): Command {
  return command("element.rename", "rename", (draft: DraftPlan) => {
    const el = draft.elements[id];
    if (el && "name" in el) (el as { name?: string }).name = name;
  });
}
