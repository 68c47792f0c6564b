import { memo } from "react";
import { Line } from "react-konva";
import type { WallBand } from "../../model/wall-geometry";
import { ink } from "../colours";

/** A wall as a solid band at its real thickness; square caps close the corners where bands meet. */
export const WallShape = memo(function WallShape({ band, colour = ink }: { band: WallBand; colour?: string }) {
  return (
    <Line
      points={[band.start.x, band.start.y, band.end.x, band.end.y]}
      stroke={colour}
      strokeWidth={band.thicknessM}
      lineCap="square"
      listening={false}
      perfectDrawEnabled={false}
    />
  );
});
