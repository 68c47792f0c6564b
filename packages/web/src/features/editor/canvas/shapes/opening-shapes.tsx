import { memo } from "react";
import { Group, Line, Rect } from "react-konva";
import type { Door, Penetration, Window } from "@hushmark/floorplan";
import type { OpeningSpan } from "../../model/wall-geometry";
import { caution, danger, ink, paper } from "../colours";
import { arcPoints } from "./arc";

/** Clears the wall band over an opening's width so the gap reads as a gap. */
function Cut({ span, fill = paper }: { span: OpeningSpan; fill?: string }) {
  const h = span.thicknessM / 2 + 0.004;
  const { start: a, end: b, normal: n } = span;
  const pts = [a.x + n.x * h, a.y + n.y * h, b.x + n.x * h, b.y + n.y * h, b.x - n.x * h, b.y - n.y * h, a.x - n.x * h, a.y - n.y * h];
  return <Line points={pts} closed fill={fill} listening={false} perfectDrawEnabled={false} />;
}

/** A door: the gap, the leaf standing open square to the wall from the hinge, and its swing arc. */
export const DoorShape = memo(function DoorShape({ door, span }: { door: Door; span: OpeningSpan }) {
  const { start: hinge, end, normal: n } = span;
  const tip = { x: hinge.x + n.x * door.widthM, y: hinge.y + n.y * door.widthM };
  const leaky = (door.leaks?.undercutMm ?? 0) > 6 || (door.leaks?.perimeterGapMm ?? 0) > 3 || door.leaks?.sealsCracked;
  return (
    <Group listening={false}>
      <Cut span={span} />
      <Line points={[hinge.x, hinge.y, tip.x, tip.y]} stroke={ink} strokeWidth={2} strokeScaleEnabled={false} listening={false} />
      <Line points={arcPoints(hinge, tip, end)} stroke={ink} strokeWidth={1} strokeScaleEnabled={false} dash={[4, 3]} listening={false} />
      {leaky ? <Line points={[span.start.x, span.start.y, span.end.x, span.end.y]} stroke={caution} strokeWidth={3} strokeScaleEnabled={false} dash={[2, 3]} listening={false} /> : null}
    </Group>
  );
});

/** A window as three lines across the wall: both faces and the glass between. */
export const WindowShape = memo(function WindowShape({ span }: { window: Window; span: OpeningSpan }) {
  const h = span.thicknessM / 2;
  const { start: a, end: b, normal: n } = span;
  const line = (k: number, w: number) => (
    <Line key={k} points={[a.x + n.x * k, a.y + n.y * k, b.x + n.x * k, b.y + n.y * k]} stroke={ink} strokeWidth={w} strokeScaleEnabled={false} listening={false} />
  );
  return (
    <Group listening={false}>
      <Cut span={span} fill="#ffffff" />
      {line(h, 1.25)}
      {line(0, 1.5)}
      {line(-h, 1.25)}
      <Line points={[a.x + n.x * h, a.y + n.y * h, a.x - n.x * h, a.y - n.y * h]} stroke={ink} strokeWidth={1.25} strokeScaleEnabled={false} listening={false} />
      <Line points={[b.x + n.x * h, b.y + n.y * h, b.x - n.x * h, b.y - n.y * h]} stroke={ink} strokeWidth={1.25} strokeScaleEnabled={false} listening={false} />
    </Group>
  );
});

/** A gap (outlet box, pipe, crack): a small hot mark through the wall. */
export const GapShape = memo(function GapShape({ span }: { gap: Penetration; span: OpeningSpan }) {
  const c = { x: (span.start.x + span.end.x) / 2, y: (span.start.y + span.end.y) / 2 };
  const s = Math.max(span.thicknessM * 0.6, 0.06);
  return <Rect x={c.x - s / 2} y={c.y - s / 2} width={s} height={s} fill={danger} stroke={paper} strokeWidth={1} strokeScaleEnabled={false} listening={false} />;
});
