import type { Point } from "@hushmark/floorplan";
import { StateTool, type ToolEnv } from "../tool.js";
import { chainDims } from "../chain.js";
import { idle } from "./idle.js";

/** Measures a distance on the plan without changing it; the last measurement stays shown. */
export class TapeTool extends StateTool<TapeTool> {
  readonly id = "tape" as const;
  start: Point = { x: 0, y: 0 };
  constructor(env: ToolEnv) {
    super(env, idle);
    this.overlay = { hint: "Click two points to measure between them" };
  }
  show(end: Point): void {
    const path = [this.start, end];
    this.overlay = { ...this.overlay, path, closed: false, dims: chainDims(path, this.env.unit) };
  }
  reset(): void {
    this.overlay = { hint: "Click two points to measure between them" };
    this.transition(idle);
  }
}
