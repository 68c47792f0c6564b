import type { Point } from "@hushmark/floorplan";
import { StateTool, type ToolEnv } from "../tool.js";
import { TypedBuffer } from "../typed-length.js";
import { addWall } from "../../commands/walls.js";
import { chainDims } from "../chain.js";
import { idle } from "./idle.js";

export const WALL_HINT = "Click where the wall starts, then where it ends; Escape stops";

/** Free interior walls, one click per end; each wall starts where the last ended. */
export class WallTool extends StateTool<WallTool> {
  readonly id = "wall" as const;
  start: Point = { x: 0, y: 0 };
  cursor: Point = { x: 0, y: 0 };
  readonly typed = new TypedBuffer();

  constructor(env: ToolEnv) {
    super(env, idle);
    this.overlay = { hint: WALL_HINT };
  }

  show(): void {
    const path = [this.start, this.cursor];
    this.overlay = { ...this.overlay, path, closed: false, dims: chainDims(path, this.env.unit), ...(this.typed.text ? { typed: this.typed.text } : { typed: undefined }) };
  }

  /** Records a wall to `end` and carries on from there. */
  place(end: Point): void {
    const { store, levelId } = this.env;
    const id = store.ids.next("wall");
    if (store.run(addWall(id, levelId, this.start, end))) {
      store.select([id]);
      this.start = end;
    }
    this.cursor = end;
    this.show();
  }

  reset(): void {
    this.typed.clear();
    this.overlay = { hint: WALL_HINT };
    this.transition(idle);
  }
}
