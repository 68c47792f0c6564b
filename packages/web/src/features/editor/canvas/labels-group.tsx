import { memo } from "react";
import { Circle, Group, Label, Shape, Tag, Text } from "react-konva";
import { elementsOfType, formatArea, polygonAreaM2, polygonCentroid, type Plan } from "@hushmark/floorplan";
import { brand, ink, muted, panel } from "./colours";

/**
 * Text in screen pixels: room names and areas, pins as rings with their label, notes. Placed at
 * (x·scale, −y·scale) inside a group that carries only the pan offset, so panning never redraws it.
 */
export const LabelsGroup = memo(function LabelsGroup({ plan, levelId, scale, unit, only, exclude }: { plan: Plan; levelId: string; scale: number; unit: "metric" | "imperial"; only?: ReadonlySet<string>; exclude?: ReadonlySet<string> }) {
  const keep = (id: string) => (only ? only.has(id) : !exclude?.has(id));
  const rooms = elementsOfType(plan, "room").filter((r) => r.levelId === levelId && r.outline.length >= 3 && keep(r.id));
  const pins = elementsOfType(plan, "pin").filter((p) => p.levelId === levelId && keep(p.id));
  const notes = elementsOfType(plan, "note").filter((n) => n.levelId === levelId && keep(n.id));
  const showArea = scale >= 25;
  return (
    <Group listening={false}>
      {/* Room names are painted by one shape: a plan of hundreds of rooms would otherwise create and measure a text node each. */}
      <Shape
        listening={false}
        perfectDrawEnabled={false}
        sceneFunc={(context) => {
          const ctx = context._context;
          ctx.textAlign = "center";
          ctx.textBaseline = "middle";
          for (const r of rooms) {
            const c = polygonCentroid(r.outline);
            const x = c.x * scale, y = -c.y * scale;
            const name = r.name || "Unnamed room";
            ctx.font = "600 13px 'Work Sans', sans-serif";
            ctx.fillStyle = ink;
            ctx.fillText(name.length > 30 ? `${name.slice(0, 29)}…` : name, x, showArea ? y - 7 : y);
            if (showArea) {
              ctx.font = "12px 'Work Sans', sans-serif";
              ctx.fillStyle = muted;
              ctx.fillText(formatArea(polygonAreaM2(r.outline), unit), x, y + 9);
            }
          }
        }}
      />
      {pins.map((p) => (
        <Group key={p.id} x={p.position.x * scale} y={-p.position.y * scale}>
          <Circle radius={7} stroke={brand} strokeWidth={2.5} fill={panel} />
          <Circle radius={2} fill={brand} />
          <Label x={10} y={-9}>
            <Tag fill={panel} opacity={0.85} cornerRadius={3} />
            <Text text={p.label} fontFamily="Work Sans" fontSize={12} fill={ink} padding={3} />
          </Label>
        </Group>
      ))}
      {notes.map((n) => (
        <Label key={n.id} x={n.position.x * scale} y={-n.position.y * scale}>
          <Tag fill="#fff8e6" stroke="#e5cf9a" strokeWidth={1} cornerRadius={3} pointerDirection="down" pointerWidth={8} pointerHeight={6} />
          <Text text={n.text ? (n.text.length > 40 ? `${n.text.slice(0, 38)}…` : n.text) : "Note"} fontFamily="Work Sans" fontSize={12} fill={ink} padding={5} width={Math.min(200, Math.max(48, (n.text.length || 4) * 6.5 + 10))} />
        </Label>
      ))}
    </Group>
  );
});
