import type { Point } from "@hushmark/floorplan";
import { snapPoint, type SnapResult } from "../geometry/snap.js";
import type { PointerInput, ToolEnv } from "./tool.js";

/** Snaps a pointer with the tool's settings; Alt turns snapping off. */
export function snapFor(env: ToolEnv, e: PointerInput, from?: Point, ignore?: ReadonlySet<string>): SnapResult {
  return snapPoint(env.store.plan, e.point, {
    levelId: env.levelId, gridM: env.gridM, toleranceM: env.toleranceM, disabled: e.alt,
    ...(from ? { from } : {}), ...(ignore ? { ignore } : {}),
  });
}
