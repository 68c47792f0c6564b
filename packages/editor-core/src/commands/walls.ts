import type { Point } from "@hushmark/floorplan";
import { command, type Command } from "../store/command.js";
import { roundPoint } from "../geometry/vec.js";

/** Adds a free-standing wall from `start` to `end` (m); thickness and construction from the plan defaults unless given. */
export function addWall(id: string, levelId: string, start: Point, end: Point, options: { thicknessM?: number; constructionId?: string } = {}): Command {
  return command("wall.add", "add wall", (draft) => {
    if (draft.elements[id] || (start.x === end.x && start.y === end.y)) return;
    draft.elements[id] = {
      type: "wall", id, levelId, start: roundPoint(start), end: roundPoint(end),
      constructionId: options.constructionId ?? draft.defaults.interiorWallConstructionId,
      thicknessM: options.thicknessM ?? draft.defaults.wallThicknessM,
    };
  });
}

/** Moves one end of a free wall (m). */
export function moveWallEnd(id: string, end: "start" | "end", to: Point): Command {
  return command("wall.move-end", "move wall end", (draft) => {
    const el = draft.elements[id];
    if (el?.type !== "wall") return;
    el[end] = roundPoint(to);
  });
}
