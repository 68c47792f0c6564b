import { memo } from "react";
import { Arrow, Circle, Group, Label, Line, Rect, Tag, Text } from "react-konva";
import type { AnalysisResult } from "@hushmark/schemas";
import { elementsOfType, placePathTags, polygonCentroid, type LabelBox, type Plan } from "@hushmark/floorplan";
import { levelOf } from "@hushmark/editor-core";
import { openingSpan, wallBands } from "../../editor/model/wall-geometry";
import { toScreen, type Viewport } from "../../editor/model/viewport";
import { shareColour } from "../model/share-scale";
import { overlayTarget } from "../model/overlay-target";
import { ink, panel } from "../../editor/canvas/colours";

type Elements = AnalysisResult["elements"];

/** A rectangle round the segment ab, `half` either side (m), as a flat point list. */
function bandOutline(a: { x: number; y: number }, b: { x: number; y: number }, half: number): number[] {
  const l = Math.hypot(b.x - a.x, b.y - a.y) || 1;
  const nx = (-(b.y - a.y) / l) * half, ny = ((b.x - a.x) / l) * half;
  return [a.x + nx, a.y + ny, b.x + nx, b.y + ny, b.x - nx, b.y - ny, a.x - nx, a.y - ny];
}

/** Each wall part, opening, grille and duct coloured by its share of the energy at the receiver (plan metres). */
export const ShareOverlay = memo(function ShareOverlay({ plan, levelId, elements, scale, dimmed }: { plan: Plan; levelId: string; elements: Elements; scale: number; dimmed: boolean }) {
  const bands = new Map(wallBands(plan).map((b) => [b.id, b]));
  const minW = 7 / scale;
  return (
    <Group listening={false} opacity={dimmed ? 0.35 : 1}>
      {[...elements].sort((a, b) => Number(b.elementId.includes("^")) - Number(a.elementId.includes("^"))).map((r) => {
        const colour = shareColour(r.share);
        const target = overlayTarget(plan, r.elementId);
        if (!target) return null;
        const band = target === "wall" ? bands.get(r.elementId) : undefined;
        if (band) {
          if (band.levelId !== levelId) return null;
          return <Line key={r.elementId} points={bandOutline(band.start, band.end, Math.max(band.thicknessM, minW) / 2)} closed fill={colour} stroke={ink} strokeWidth={1} strokeScaleEnabled={false} />;
        }
        if (r.elementId.includes("^")) {
          // A floor or ceiling: tint the room it belongs to on this level, inset so its walls stay readable.
          const room = r.elementId.split("^").map((id) => plan.elements[id]).find((e) => e?.type === "room" && e.levelId === levelId);
          if (room?.type !== "room") return null;
          return <Line key={r.elementId} points={room.outline.flatMap((p) => [p.x, p.y])} closed fill={colour} opacity={0.4} listening={false} />;
        }
        const el = plan.elements[r.elementId];
        if (!el) return null;
        if (el.type === "door" || el.type === "window" || el.type === "penetration") {
          const span = openingSpan(plan, el);
          if (!span || span.levelId !== levelId) return null;
          return <Line key={r.elementId} points={bandOutline(span.start, span.end, Math.max(span.thicknessM * 0.8, minW * 0.9))} closed fill={colour} stroke={ink} strokeWidth={1.5} strokeScaleEnabled={false} />;
        }
        if (el.type === "vent" && levelOf(plan, el.id) === levelId) {
          return <Rect key={r.elementId} x={el.position.x - 0.2} y={el.position.y - 0.2} width={0.4} height={0.4} fill={colour} stroke={ink} strokeWidth={1} strokeScaleEnabled={false} />;
        }
        if (el.type === "duct") {
          const a = plan.elements[el.fromVentId], b = plan.elements[el.toVentId];
          if (a?.type !== "vent" || b?.type !== "vent") return null;
          return <Line key={r.elementId} points={[a.position.x, a.position.y, b.position.x, b.position.y]} stroke={colour} strokeWidth={Math.max(0.15, minW)} />;
        }
        return null;
      })}
    </Group>
  );
});

/** A path's screen points on the level shown, and its tag's place (see `pathLayout`). */
export interface PathLayout {
  lines: { rank: number; points: { x: number; y: number }[]; text: string }[];
  tags: Map<number, LabelBox>;
  /** The same boxes as a list, for the names to keep clear of. */
  tagBoxes: LabelBox[];
}

const TAG_FONT = "600 12px 'Work Sans', sans-serif";
const TAG_H = 22;
let measureCtx: CanvasRenderingContext2D | null | undefined;
/** The tag text's width, px, from a canvas of our own (an estimate where there is none, as in tests). */
function tagWidth(text: string): number {
  if (measureCtx === undefined) measureCtx = typeof document === "undefined" ? null : document.createElement("canvas").getContext("2d");
  if (!measureCtx) return text.length * 7.4;
  measureCtx.font = TAG_FONT;
  return measureCtx.measureText(text).width;
}

/**
 * The three weakest paths on the level shown, in screen pixels at view `v`, with each path's
 * tag placed off the room names and the other tags. Room names are judged by a box of the name's
 * width (within its room) and two lines' height at the room's centre, where the labels put them.
 */
export function pathLayout(plan: Plan, result: AnalysisResult, levelId: string, v: Viewport): PathLayout {
  const lines = result.paths.slice(0, 3).flatMap((p) => {
    const points = p.polyline.filter((q) => q.levelId === levelId || q.levelId === null).map((q) => toScreen(v, q.x, q.y));
    return points.length < 2 ? [] : [{ rank: p.rank, points, text: `${p.rank}  ${p.dba.toFixed(0)} dBA` }];
  });
  const names: LabelBox[] = [];
  for (const r of elementsOfType(plan, "room")) {
    if (r.levelId !== levelId || r.outline.length < 3) continue;
    const centre = polygonCentroid(r.outline);
    const c = toScreen(v, centre.x, centre.y);
    const xs = r.outline.map((q) => q.x);
    const roomW = (Math.max(...xs) - Math.min(...xs)) * v.scale;
    const w = Math.min(roomW, tagWidth(r.name || "Unnamed room") + 8);
    names.push({ x: c.x - w / 2, y: c.y - 17, w, h: 34 });
  }
  const tags = placePathTags(lines.map((l) => ({ rank: l.rank, points: l.points, w: tagWidth(l.text) + 10, h: TAG_H })), names);
  return { lines, tags, tagBoxes: [...tags.values()] };
}

/** The weakest paths' lines, numbered by rank (drawn under the room names; the strongest on top where they share a stretch). */
export function PathLines({ layout, dimmed, highlight }: { layout: PathLayout; dimmed: boolean; highlight: number | null }) {
  return (
    <Group listening={false} opacity={dimmed ? 0.35 : 1}>
      {[...layout.lines].reverse().map((p) => {
        const flat = p.points.flatMap((q) => [q.x, q.y]);
        const strong = highlight === null || highlight === p.rank;
        return (
          <Group key={p.rank} opacity={strong ? 1 : 0.3}>
            <Arrow points={flat} stroke={panel} strokeWidth={6} pointerLength={10} pointerWidth={10} fill={panel} tension={0.2} />
            <Arrow points={flat} stroke={ink} strokeWidth={2.5} dash={p.rank === 1 ? undefined : [8, 5]} pointerLength={9} pointerWidth={9} fill={ink} tension={0.2} />
            <Circle x={p.points[0]!.x} y={p.points[0]!.y} radius={4} fill={ink} />
          </Group>
        );
      })}
    </Group>
  );
}

/** Each path's rank and level on a tag beside its line (drawn above the names, which keep clear of them). */
export function PathTags({ layout, dimmed, highlight }: { layout: PathLayout; dimmed: boolean; highlight: number | null }) {
  return (
    <Group listening={false} opacity={dimmed ? 0.35 : 1}>
      {layout.lines.map((p) => {
        const box = layout.tags.get(p.rank);
        if (!box) return null;
        const strong = highlight === null || highlight === p.rank;
        return (
          <Label key={p.rank} x={box.x} y={box.y} opacity={strong ? 1 : 0.3}>
            <Tag fill={ink} cornerRadius={10} />
            <Text text={p.text} fontFamily="Work Sans" fontSize={12} fontStyle="600" fill={panel} padding={5} />
          </Label>
        );
      })}
    </Group>
  );
}
