import { forwardRef, memo } from "react";
import type Konva from "konva";
import { Layer, Line } from "react-konva";
import type { Viewport } from "../model/viewport";
import { rule } from "./colours";

/** The background grid: 1 m lines, with 0.5 m between them when zoomed in; never listens for events. */
export const GridLayer = memo(forwardRef<Konva.Layer, { v: Viewport; width: number; height: number }>(function GridLayer({ v, width, height }, ref) {
  const stepM = v.scale >= 60 ? 0.5 : v.scale >= 15 ? 1 : 5;
  const step = stepM * v.scale;
  const lines = [];
  const x0 = ((v.ox % step) + step) % step;
  const y0 = ((v.oy % step) + step) % step;
  for (let x = x0, i = 0; x < width; x += step, i++) {
    const m = Math.round((x - v.ox) / v.scale / stepM) * stepM;
    lines.push(<Line key={`x${i}`} points={[x, 0, x, height]} stroke={rule} strokeWidth={Math.abs(m % 5) < 1e-6 ? 1 : 0.5} opacity={0.7} />);
  }
  for (let y = y0, i = 0; y < height; y += step, i++) {
    const m = Math.round((v.oy - y) / v.scale / stepM) * stepM;
    lines.push(<Line key={`y${i}`} points={[0, y, width, y]} stroke={rule} strokeWidth={Math.abs(m % 5) < 1e-6 ? 1 : 0.5} opacity={0.7} />);
  }
  return <Layer ref={ref} listening={false}>{lines}</Layer>;
}));
