import { memo } from "react";
import { Group } from "react-konva";
import { elementsOfType, type Plan } from "@hushmark/floorplan";
import { levelOf } from "@hushmark/editor-core";
import { wallBands, openingSpan } from "../model/wall-geometry";
import { RoomShape } from "./shapes/room-shape";
import { WallShape } from "./shapes/wall-shape";
import { DoorShape, GapShape, WindowShape } from "./shapes/opening-shapes";
import { DuctShape, VentShape, VoidShape } from "./shapes/mark-shapes";

/**
 * Everything drawn in plan metres on one level. Each shape is memoised on its element object,
 * which immer keeps identical when unchanged, so an edit redraws only what it touched.
 */
export const ElementsGroup = memo(function ElementsGroup({ plan, levelId, ghost }: { plan: Plan; levelId: string; ghost?: boolean }) {
  const rooms = elementsOfType(plan, "room").filter((r) => r.levelId === levelId);
  const bands = wallBands(plan).filter((b) => b.levelId === levelId);
  const openings = [...elementsOfType(plan, "door"), ...elementsOfType(plan, "window"), ...elementsOfType(plan, "penetration")];
  const vents = elementsOfType(plan, "vent").filter((v) => levelOf(plan, v.id) === levelId);
  const voids = elementsOfType(plan, "void").filter((v) => v.levelId === levelId);
  const ducts = elementsOfType(plan, "duct");
  if (ghost) {
    return (
      <Group listening={false} opacity={0.35}>
        {bands.map((b) => <WallShape key={b.id} band={b} colour="#8a8f9c" />)}
      </Group>
    );
  }
  return (
    <Group listening={false}>
      {rooms.map((r) => <RoomShape key={r.id} room={r} />)}
      {voids.map((v) => <VoidShape key={v.id} space={v} />)}
      {bands.map((b) => <WallShape key={b.id} band={b} />)}
      {openings.map((o) => {
        const span = openingSpan(plan, o);
        if (!span || span.levelId !== levelId) return null;
        if (o.type === "door") return <DoorShape key={o.id} door={o} span={span} />;
        if (o.type === "window") return <WindowShape key={o.id} window={o} span={span} />;
        return <GapShape key={o.id} gap={o} span={span} />;
      })}
      {ducts.map((d) => {
        const a = plan.elements[d.fromVentId], b = plan.elements[d.toVentId];
        if (a?.type !== "vent" || b?.type !== "vent") return null;
        if (levelOf(plan, a.id) !== levelId && levelOf(plan, b.id) !== levelId) return null;
        return <DuctShape key={d.id} from={a.position} to={b.position} />;
      })}
      {vents.map((v) => <VentShape key={v.id} vent={v} />)}
    </Group>
  );
});
