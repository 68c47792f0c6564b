import type { Point, RoomUse } from "@hushmark/floorplan";
import { command, type Command } from "../store/command.js";
import { roundPoint } from "../geometry/vec.js";

export interface NewRoom {
  id: string;
  levelId: string;
  name: string;
  use?: RoomUse;
}

/** Adds a room from its corners (m), counter-clockwise or not; vertex ids are `${id}-v1…`. */
export function addRoomPolygon(room: NewRoom, corners: readonly Point[]): Command {
  return command("room.add", "add room", (draft) => {
    if (corners.length < 3 || draft.elements[room.id]) return;
    draft.elements[room.id] = {
      type: "room", id: room.id, levelId: room.levelId, name: room.name, use: room.use ?? "other",
      outline: corners.map((p, i) => ({ id: `${room.id}-v${i + 1}`, ...roundPoint(p) })),
    };
  });
}

/** Adds a rectangular room between two opposite corners (m). */
export function addRoomRectangle(room: NewRoom, a: Point, b: Point): Command {
  const x0 = Math.min(a.x, b.x), x1 = Math.max(a.x, b.x), y0 = Math.min(a.y, b.y), y1 = Math.max(a.y, b.y);
  const cmd = addRoomPolygon(room, [{ x: x0, y: y0 }, { x: x1, y: y0 }, { x: x1, y: y1 }, { x: x0, y: y1 }]);
  return x1 - x0 <= 0 || y1 - y0 <= 0 ? command("room.add", "add room", () => {}) : cmd;
}

/** Moves one corner of a room or void outline to a new place (m). */
export function moveVertex(elementId: string, vertexId: string, to: Point): Command {
  return command("vertex.move", "move corner", (draft) => {
    const el = draft.elements[elementId];
    if (!el || (el.type !== "room" && el.type !== "void")) return;
    const v = el.outline.find((o) => o.id === vertexId);
    if (!v) return;
    const p = roundPoint(to);
    v.x = p.x;
    v.y = p.y;
  });
}

/**
 * Splits the edge starting at `vertexId` by inserting a corner at `at` (m). The new corner gets
 * `newVertexId`; openings on the old edge beyond the split move to the new edge so they stay put.
 */
export function splitEdge(elementId: string, vertexId: string, at: Point, newVertexId: string): Command {
  return command("edge.split", "split wall", (draft) => {
    const el = draft.elements[elementId];
    if (!el || (el.type !== "room" && el.type !== "void")) return;
    const i = el.outline.findIndex((o) => o.id === vertexId);
    if (i < 0 || el.outline.some((o) => o.id === newVertexId)) return;
    const a = el.outline[i]!;
    const p = roundPoint(at);
    const splitM = Math.hypot(p.x - a.x, p.y - a.y);
    el.outline.splice(i + 1, 0, { id: newVertexId, ...p });
    if (el.type !== "room") return;
    const oldRef = `${elementId}:${vertexId}`;
    for (const o of Object.values(draft.elements)) {
      if ((o.type === "door" || o.type === "window" || o.type === "penetration") && o.wallRef === oldRef && o.offsetM >= splitM) {
        o.wallRef = `${elementId}:${newVertexId}`;
        o.offsetM = Math.round((o.offsetM - splitM) * 1000) / 1000;
      }
    }
  });
}

/** Removes a corner; refuses to leave fewer than three. Openings on the two edges it joined go too. */
export function deleteVertex(elementId: string, vertexId: string): Command {
  return command("vertex.delete", "delete corner", (draft) => {
    const el = draft.elements[elementId];
    if (!el || (el.type !== "room" && el.type !== "void") || el.outline.length <= 3) return;
    const i = el.outline.findIndex((o) => o.id === vertexId);
    if (i < 0) return;
    const prev = el.outline[(i - 1 + el.outline.length) % el.outline.length]!;
    el.outline.splice(i, 1);
    const gone = new Set([`${elementId}:${vertexId}`, `${elementId}:${prev.id}`]);
    for (const o of Object.values(draft.elements)) {
      if ((o.type === "door" || o.type === "window" || o.type === "penetration") && gone.has(o.wallRef)) delete draft.elements[o.id];
    }
  });
}
