import type { Point } from "@hushmark/floorplan";
import { command, type Command } from "../store/command.js";
import { roundPoint } from "../geometry/vec.js";

export function addPin(id: string, levelId: string, at: Point, label: string, spaceId?: string): Command {
  return command("pin.add", "add pin", (draft) => {
    if (draft.elements[id]) return;
    draft.elements[id] = { type: "pin", id, levelId, position: roundPoint(at), label, ...(spaceId ? { spaceId } : {}) };
  });
}

export function addNote(id: string, levelId: string, at: Point, text: string): Command {
  return command("note.add", "add note", (draft) => {
    if (draft.elements[id]) return;
    draft.elements[id] = { type: "note", id, levelId, position: roundPoint(at), text };
  });
}

/** A grille opening into `spaceId` at a point (m), free area in m². */
export function addVent(id: string, spaceId: string, at: Point, options: { mount?: "wall" | "ceiling" | "floor"; openAreaM2?: number; name?: string } = {}): Command {
  return command("vent.add", "add vent", (draft) => {
    if (draft.elements[id]) return;
    draft.elements[id] = {
      type: "vent", id, spaceId, mount: options.mount ?? "ceiling", position: roundPoint(at),
      openAreaM2: options.openAreaM2 ?? 0.04, ...(options.name ? { name: options.name } : {}),
    };
  });
}

/** Links two grilles by a duct run; the length defaults to the straight distance between them (m). */
export function addDuct(id: string, fromVentId: string, toVentId: string, lengthM?: number): Command {
  return command("duct.add", "add duct link", (draft) => {
    const a = draft.elements[fromVentId], b = draft.elements[toVentId];
    if (draft.elements[id] || fromVentId === toVentId || a?.type !== "vent" || b?.type !== "vent") return;
    const straight = Math.hypot(b.position.x - a.position.x, b.position.y - a.position.y);
    draft.elements[id] = { type: "duct", id, fromVentId, toVentId, lengthM: Math.round((lengthM ?? straight) * 100) / 100, lining: "bare", bends: 0 };
  });
}

/** A ceiling void (or attic, crawlspace) outline over rooms of a level (m). */
export function addVoid(id: string, levelId: string, corners: readonly Point[], kind: "ceiling-void" | "attic" | "crawlspace" = "ceiling-void"): Command {
  return command("void.add", "add void", (draft) => {
    if (draft.elements[id] || corners.length < 3) return;
    draft.elements[id] = {
      type: "void", id, name: kind === "attic" ? "Attic" : kind === "crawlspace" ? "Crawlspace" : "Ceiling void",
      kind, levelId, depthM: 0.4, outline: corners.map((p, i) => ({ id: `${id}-v${i + 1}`, ...roundPoint(p) })),
    };
  });
}
