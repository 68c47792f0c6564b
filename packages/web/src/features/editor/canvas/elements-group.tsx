import { memo } from "react";
import { Shape } from "react-konva";
import type { Plan } from "@hushmark/floorplan";
import { paintPlan } from "./paint-plan";

const NONE: ReadonlySet<string> = new Set();

/**
 * Everything drawn in plan metres on one level, except `exclude` (what a drag is moving, drawn by
 * MovingGroup). One shape paints it all; while a drag runs its props stay equal, so Konva never
 * redraws this layer and only the small moving group is repainted each frame.
 */
export const ElementsGroup = memo(function ElementsGroup({ plan, levelId, ghost, exclude = NONE, scale, overUnderlay = false }: { plan: Plan; levelId: string; ghost?: boolean; exclude?: ReadonlySet<string>; scale: number; overUnderlay?: boolean }) {
  return (
    <Shape
      listening={false}
      perfectDrawEnabled={false}
      sceneFunc={(context) => paintPlan(context._context, { plan, levelId, scale, exclude, overUnderlay, ...(ghost ? { ghost } : {}) })}
    />
  );
});

/** What a drag is moving, painted from the live plan, with room outlines standing in for wall pieces. */
export function MovingGroup({ plan, levelId, ids, scale, overUnderlay = false }: { plan: Plan; levelId: string; ids: ReadonlySet<string>; scale: number; overUnderlay?: boolean }) {
  if (ids.size === 0) return null;
  return <Shape listening={false} perfectDrawEnabled={false} sceneFunc={(context) => paintPlan(context._context, { plan, levelId, scale, only: ids, overUnderlay })} />;
}

/** The ids whose element objects differ between the plan at pointer-down and now (what the drag moved). */
export function changedIds(base: Plan, current: Plan): Set<string> {
  const out = new Set<string>();
  if (base.elements === current.elements) return out;
  for (const [id, el] of Object.entries(current.elements)) if (base.elements[id] !== el) out.add(id);
  for (const id of Object.keys(base.elements)) if (!(id in current.elements)) out.add(id);
  return out;
}
