import { memo } from "react";
import { Circle, Group, Label, Tag, Text } from "react-konva";
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
      {rooms.map((r) => {
        const c = polygonCentroid(r.outline);
        const area = formatArea(polygonAreaM2(r.outline), unit);
        return (
          <Group key={r.id} x={c.x * scale} y={-c.y * scale}>
            <Text text={r.name || "Unnamed room"} fontFamily="Work Sans" fontSize={13} fontStyle="600" fill={ink} width={200} offsetX={100} offsetY={showArea ? 14 : 7} wrap="none" ellipsis align="center" />
            {showArea ? <Text text={area} fontFamily="Work Sans" fontSize={12} fill={muted} width={200} offsetX={100} offsetY={-3} align="center" /> : null}
          </Group>
        );
      })}
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
