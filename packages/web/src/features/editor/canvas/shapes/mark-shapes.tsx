import { memo } from "react";
import { Group, Line, Rect } from "react-konva";
import type { Void as PlanVoid, Vent } from "@hushmark/floorplan";
import { brand, ink, muted } from "../colours";
import { flat } from "./arc";

/** A grille: a small square with a line across it. Sized in metres so it scales with the plan. */
export const VentShape = memo(function VentShape({ vent }: { vent: Vent }) {
  const s = 0.3;
  const { x, y } = vent.position;
  return (
    <Group listening={false}>
      <Rect x={x - s / 2} y={y - s / 2} width={s} height={s} fill="#ffffff" stroke={ink} strokeWidth={1.5} strokeScaleEnabled={false} />
      <Line points={[x - s / 2, y - s / 2, x + s / 2, y + s / 2]} stroke={ink} strokeWidth={1.5} strokeScaleEnabled={false} />
    </Group>
  );
});

/** A void as a hatched outline: the hatching says "space you do not stand in". */
export const VoidShape = memo(function VoidShape({ space }: { space: PlanVoid }) {
  const pts = flat(space.outline);
  const xs = space.outline.map((p) => p.x), ys = space.outline.map((p) => p.y);
  const minX = Math.min(...xs), maxX = Math.max(...xs), minY = Math.min(...ys), maxY = Math.max(...ys);
  const step = 0.6;
  const hatch: number[][] = [];
  for (let k = minX - (maxY - minY); k < maxX; k += step) hatch.push([k, minY, k + (maxY - minY), maxY]);
  return (
    <Group listening={false}>
      <Group clipFunc={(ctx) => { ctx.beginPath(); space.outline.forEach((p, i) => (i ? ctx.lineTo(p.x, p.y) : ctx.moveTo(p.x, p.y))); ctx.closePath(); }}>
        {hatch.map((h, i) => <Line key={i} points={h} stroke={muted} strokeWidth={0.75} opacity={0.45} strokeScaleEnabled={false} />)}
      </Group>
      <Line points={pts} closed stroke={muted} strokeWidth={1.5} dash={[8, 4]} strokeScaleEnabled={false} />
    </Group>
  );
});

/** A duct run between two grilles, drawn as a dashed line. */
export const DuctShape = memo(function DuctShape({ from, to }: { from: { x: number; y: number }; to: { x: number; y: number } }) {
  return <Line points={[from.x, from.y, to.x, to.y]} stroke={brand} strokeWidth={3} dash={[10, 6]} opacity={0.7} strokeScaleEnabled={false} listening={false} />;
});
