import type { Point } from "@hushmark/floorplan";
import { StateTool, type ToolEnv } from "../tool.js";
import { TypedBuffer } from "../typed-length.js";
import { addRoomPolygon } from "../../commands/rooms.js";
import { chainDims } from "../chain.js";
import { idle } from "./idle.js";

export const POLYGON_HINT = "Click each corner; click the first corner or press Enter to close";

/** A room by its corners, clicked one by one; a typed length places the next corner exactly. */
export class PolygonTool extends StateTool<PolygonTool> {
  readonly id = "room-polygon" as const;
  points: Point[] = [];
  cursor: Point = { x: 0, y: 0 };
  readonly typed = new TypedBuffer();

  constructor(env: ToolEnv) {
    super(env, idle);
    this.overlay = { hint: POLYGON_HINT };
  }

  show(): void {
    const path = [...this.points, this.cursor];
    this.overlay = {
      ...this.overlay, path, closed: false, dims: chainDims(path, this.env.unit),
      ...(this.typed.text ? { typed: this.typed.text } : { typed: undefined }),
    };
  }

  /** Closes the outline into a room when it has three corners or more. */
  close(): boolean {
    if (this.points.length < 3) return false;
    const { store, levelId } = this.env;
    const id = store.ids.next("room");
    const n = Object.values(store.plan.elements).filter((e) => e.type === "room").length + 1;
    const entry = store.run(addRoomPolygon({ id, levelId, name: `Room ${n}` }, this.points));
    if (entry) store.select([id]);
    this.reset();
    return !!entry;
  }

  reset(): void {
    this.points = [];
    this.typed.clear();
    this.overlay = { hint: POLYGON_HINT };
    this.transition(idle);
  }
}
