import { memo } from "react";
import { Line } from "react-konva";
import type { Room } from "@hushmark/floorplan";
import { roomFill } from "../colours";
import { flat } from "./arc";

/** A room's floor area; its walls are drawn separately as bands. */
export const RoomShape = memo(function RoomShape({ room, fill }: { room: Room; fill?: string }) {
  return <Line points={flat(room.outline)} closed fill={fill ?? roomFill(room.use)} listening={false} perfectDrawEnabled={false} />;
});
