import { Circle, Group, Label, Line, Rect, Tag, Text } from "react-konva";
import type { Plan, Point, Problem } from "@hushmark/floorplan";
import { elementBounds, formatLength, type ToolOverlay } from "@hushmark/editor-core";
import { wallBands, openingSpan } from "../model/wall-geometry";
import { toScreen, type Viewport } from "../model/viewport";
import { brand, danger, focus, ink, panel } from "./colours";

const flatScreen = (v: Viewport, pts: readonly Point[]) => pts.flatMap((p) => { const s = toScreen(v, p.x, p.y); return [s.x, s.y]; });

function Selected({ plan, id, v }: { plan: Plan; id: string; v: Viewport }) {
  const unit = plan.displayUnit;
  const el = plan.elements[id];
  if (!el) {
    const band = wallBands(plan).find((b) => b.id === id);
    if (!band) return null;
    return <Line points={flatScreen(v, [band.start, band.end])} stroke={brand} opacity={0.55} strokeWidth={Math.max(band.thicknessM * v.scale + 6, 8)} lineCap="square" />;
  }
  if (el.type === "room" || el.type === "void") {
    return (
      <Group>
        <Line points={flatScreen(v, el.outline)} closed stroke={brand} strokeWidth={2.5} />
        {el.outline.map((a, i) => {
          // Each wall's length on the selected room, just outside its edge.
          const b = el.outline[(i + 1) % el.outline.length]!;
          const lengthM = Math.hypot(b.x - a.x, b.y - a.y);
          const sa = toScreen(v, a.x, a.y), sb = toScreen(v, b.x, b.y);
          if (Math.hypot(sb.x - sa.x, sb.y - sa.y) < 60) return null;
          return (
            <Label key={`d-${a.id}`} x={(sa.x + sb.x) / 2} y={(sa.y + sb.y) / 2}>
              <Tag fill={panel} stroke={brand} strokeWidth={1} cornerRadius={3} />
              <Text text={formatLength(lengthM, unit)} fontFamily="Work Sans" fontSize={11} fill={ink} padding={3} />
            </Label>
          );
        })}
        {el.outline.map((p) => { const s = toScreen(v, p.x, p.y); return <Rect key={p.id} x={s.x - 5} y={s.y - 5} width={10} height={10} fill={panel} stroke={brand} strokeWidth={2} />; })}
      </Group>
    );
  }
  if (el.type === "door" || el.type === "window" || el.type === "penetration") {
    const span = openingSpan(plan, el);
    if (!span) return null;
    return <Line points={flatScreen(v, [span.start, span.end])} stroke={brand} opacity={0.6} strokeWidth={Math.max(span.thicknessM * v.scale + 10, 12)} lineCap="butt" />;
  }
  if (el.type === "wall") return <Line points={flatScreen(v, [el.start, el.end])} stroke={brand} opacity={0.55} strokeWidth={Math.max(el.thicknessM * v.scale + 6, 8)} lineCap="square" />;
  const b = elementBounds(plan, id);
  if (!b) return null;
  const c = toScreen(v, (b.minX + b.maxX) / 2, (b.minY + b.maxY) / 2);
  return <Circle x={c.x} y={c.y} radius={14} stroke={brand} strokeWidth={2.5} />;
}

/** Problem markers: a red badge at each element with an error, amber for warnings. */
function ProblemMarkers({ plan, problems, v }: { plan: Plan; problems: readonly Problem[]; v: Viewport }) {
  const seen = new Set<string>();
  return (
    <Group>
      {problems.map((p) => {
        if (!p.elementId || seen.has(p.elementId)) return null;
        const b = elementBounds(plan, p.elementId) ?? boundsOfPiece(plan, p.elementId);
        if (!b) return null;
        seen.add(p.elementId);
        // Rooms carry the badge on their top edge; smaller things at their middle, where they are.
        const kind = plan.elements[p.elementId]?.type;
        const s = toScreen(v, (b.minX + b.maxX) / 2, kind === "room" || kind === "void" ? b.maxY : (b.minY + b.maxY) / 2);
        const colour = p.severity === "error" ? danger : focus;
        return (
          <Group key={p.elementId} x={s.x} y={s.y}>
            <Circle radius={9} fill={colour} stroke={panel} strokeWidth={2} />
            <Text text="!" fontFamily="Work Sans" fontStyle="700" fontSize={13} fill={p.severity === "error" ? panel : ink} width={18} offsetX={9} offsetY={6.5} align="center" />
          </Group>
        );
      })}
    </Group>
  );
}

function boundsOfPiece(plan: Plan, id: string) {
  const band = wallBands(plan).find((b) => b.id === id);
  if (!band) return null;
  return { minX: Math.min(band.start.x, band.end.x), maxX: Math.max(band.start.x, band.end.x), minY: Math.min(band.start.y, band.end.y), maxY: Math.max(band.start.y, band.end.y) };
}

const snapLabels: Record<string, string> = { vertex: "corner", edge: "on wall", perpendicular: "square to wall", parallel: "parallel to wall", grid: "", none: "" };

function Overlay({ overlay, v }: { overlay: ToolOverlay; v: Viewport }) {
  const snap = overlay.snap;
  const s = snap ? toScreen(v, snap.point.x, snap.point.y) : null;
  return (
    <Group>
      {overlay.marquee ? (() => {
        const a = toScreen(v, overlay.marquee.a.x, overlay.marquee.a.y), b = toScreen(v, overlay.marquee.b.x, overlay.marquee.b.y);
        return <Rect x={Math.min(a.x, b.x)} y={Math.min(a.y, b.y)} width={Math.abs(a.x - b.x)} height={Math.abs(a.y - b.y)} stroke={brand} dash={[5, 4]} fill="rgba(31,122,116,0.08)" />;
      })() : null}
      {overlay.path && overlay.path.length > 1 ? <Line points={flatScreen(v, overlay.path)} closed={overlay.closed} stroke={brand} strokeWidth={2} dash={[7, 4]} fill={overlay.closed ? "rgba(31,122,116,0.08)" : undefined} /> : null}
      {overlay.ghost ? <Line points={flatScreen(v, [overlay.ghost.start, overlay.ghost.end])} stroke={brand} strokeWidth={10} opacity={0.5} /> : null}
      {snap?.guide ? <Line points={flatScreen(v, [snap.guide.start, snap.guide.end])} stroke={focus} strokeWidth={2} dash={[3, 3]} /> : null}
      {overlay.dims?.map((d, i) => {
        const a = toScreen(v, d.start.x, d.start.y), b = toScreen(v, d.end.x, d.end.y);
        return (
          <Label key={i} x={(a.x + b.x) / 2} y={(a.y + b.y) / 2}>
            <Tag fill={ink} cornerRadius={3} />
            <Text text={d.text} fontFamily="Work Sans" fontSize={12} fill={panel} padding={4} />
          </Label>
        );
      })}
      {s && snap && snap.kind !== "none" ? (
        <Group x={s.x} y={s.y}>
          {snap.kind === "vertex" ? <Rect x={-6} y={-6} width={12} height={12} stroke={focus} strokeWidth={2.5} /> : snap.kind === "grid" ? <Circle radius={3} fill={brand} /> : <Circle radius={6} stroke={focus} strokeWidth={2.5} />}
          {snapLabels[snap.kind] ? (
            <Label x={10} y={8}>
              <Tag fill={panel} stroke={focus} cornerRadius={3} />
              <Text text={snapLabels[snap.kind]} fontFamily="Work Sans" fontSize={11} fill={ink} padding={3} />
            </Label>
          ) : null}
        </Group>
      ) : null}
      {overlay.typed && s ? (
        <Label x={s.x + 12} y={s.y - 30}>
          <Tag fill={brand} cornerRadius={3} />
          <Text text={`${overlay.typed}▏`} fontFamily="Work Sans" fontSize={14} fill={panel} padding={5} />
        </Label>
      ) : null}
    </Group>
  );
}

/** The top layer, in screen pixels: selection, problems, and what the active tool is drawing. */
export function UiGroup({ plan, selection, problems, overlay, v }: { plan: Plan; selection: readonly string[]; problems: readonly Problem[]; overlay: ToolOverlay; v: Viewport }) {
  return (
    <Group listening={false}>
      {selection.map((id) => <Selected key={id} plan={plan} id={id} v={v} />)}
      <ProblemMarkers plan={plan} problems={problems} v={v} />
      <Overlay overlay={overlay} v={v} />
    </Group>
  );
}
