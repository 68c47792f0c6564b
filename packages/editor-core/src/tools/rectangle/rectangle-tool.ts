import type { Point } from "@hushmark/floorplan";
import { StateTool, type ToolEnv } from "../tool.js";
import { TypedBuffer } from "../typed-length.js";
import { addRoomRectangle } from "../../commands/rooms.js";
import { addVoid } from "../../commands/marks.js";
import { formatLength } from "../../units/length.js";
import { idle } from "./idle.js";

/** Draws a rectangle by dragging, or by two clicks; typing `4 x 3` sets its size. Makes a room or a void. */
export class RectangleTool extends StateTool<RectangleTool> {
  readonly id: "room-rectangle" | "void";
  anchor: Point = { x: 0, y: 0 };
  corner: Point = { x: 0, y: 0 };
  readonly typed = new TypedBuffer();

  constructor(env: ToolEnv, makes: "room" | "void" = "room") {
    super(env, idle);
    this.id = makes === "room" ? "room-rectangle" : "void";
    this.overlay = { hint: makes === "room" ? "Drag a room, or click two corners" : "Drag the void over the rooms it spans" };
  }

  showRect(): void {
    const a = this.anchor, b = this.corner;
    const { unit } = this.env;
    const path = [a, { x: b.x, y: a.y }, b, { x: a.x, y: b.y }];
    this.overlay = {
      ...this.overlay,
      path, closed: true,
      dims: [
        { start: path[0]!, end: path[1]!, text: formatLength(Math.abs(b.x - a.x), unit) },
        { start: path[1]!, end: path[2]!, text: formatLength(Math.abs(b.y - a.y), unit) },
      ],
      ...(this.typed.text ? { typed: this.typed.text } : { typed: undefined }),
    };
  }

  /** Records the rectangle; answers whether it was big enough to keep. */
  finish(): boolean {
    const { store, levelId } = this.env;
    const a = this.anchor, b = this.corner;
    if (Math.abs(b.x - a.x) < 0.05 || Math.abs(b.y - a.y) < 0.05) return false;
    if (this.id === "room-rectangle") {
      const id = store.ids.next("room");
      const n = Object.values(store.plan.elements).filter((e) => e.type === "room").length + 1;
      if (store.run(addRoomRectangle({ id, levelId, name: `Room ${n}` }, a, b))) store.select([id]);
    } else {
      const id = store.ids.next("void");
      const x0 = Math.min(a.x, b.x), x1 = Math.max(a.x, b.x), y0 = Math.min(a.y, b.y), y1 = Math.max(a.y, b.y);
      if (store.run(addVoid(id, levelId, [{ x: x0, y: y0 }, { x: x1, y: y0 }, { x: x1, y: y1 }, { x: x0, y: y1 }]))) store.select([id]);
    }
    return true;
  }

  reset(): void {
    this.typed.clear();
    this.overlay = { hint: this.overlay.hint };
    this.transition(idle);
  }
}
