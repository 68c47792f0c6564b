import { forwardRef, useEffect, useImperativeHandle, useRef, useState, type ReactNode } from "react";
import { Group, Layer, Stage } from "react-konva";
import type Konva from "konva";
import type { Plan, Problem } from "@hushmark/floorplan";
import type { Tool } from "@hushmark/editor-core";
import type { Viewport } from "../model/viewport";
import { ElementsGroup, MovingGroup, changedIds } from "./elements-group";
import { LabelsGroup } from "./labels-group";
import type { LabelBox } from "./label-layout";
import { GridLayer } from "./grid-layer";
import { UnderlayLayer } from "./underlay-layer";
import { UiGroup } from "./ui-group";
import { usePointerGestures } from "./use-pointer-gestures";
import { useCompositedView } from "./use-composited-view";

export interface PlanCanvasProps {
  plan: Plan;
  /** The plan at pointer-down while a drag is previewing; the drawing stays on it except for what moves. */
  basePlan?: Plan | null;
  levelId: string;
  /** The level below, drawn faintly so rooms can be stacked over it. */
  ghostLevelId?: string | null;
  selection: readonly string[];
  problems: readonly Problem[];
  viewport: Viewport;
  setViewport: (update: (v: Viewport) => Viewport) => void;
  width: number;
  height: number;
  tool: Tool | null;
  /** The analysis overlay, drawn in plan metres above the elements. */
  overlay?: ReactNode;
  /** Image URL of an underlay file; without it no underlays are drawn. */
  underlaySrc?: (fileId: string) => string;
  /** The latest reading beside each measurement pin, by pin id. */
  pinReadings?: ReadonlyMap<string, string>;
  /** Labels for the overlay, in screen pixels for the view it is drawn at. */
  overlayLabels?: (drawnView: Viewport) => ReactNode;
  /** Drawn in screen pixels under the names (Paths' lines), which get a halo to stay readable. */
  overlayUnderLabels?: (drawnView: Viewport) => ReactNode;
  /** Canvas boxes (px) that `overlayLabels` covers at a drawn view; names move out of them. Answer the same array for the same view. */
  keepClearPx?: (drawnView: Viewport) => readonly LabelBox[];
  /** A read-only view: room names come before the text of pins and notes (see LabelsGroup). */
  roomNamesFirst?: boolean;
  /** Plan points the overlay labels draw markers on, kept clear of names (memoise the array). */
  keepClear?: readonly { x: number; y: number }[];
  onKeyDown?: (e: React.KeyboardEvent<HTMLDivElement>) => void;
  label: string;
  cursor?: string;
}

const NO_PROBLEMS: readonly Problem[] = [];

/**
 * False until the browser has shown one frame: names, pins and problem badges wait for it, so
 * opening a large plan puts its walls on screen first and the text a frame later.
 */
function useAfterFirstPaint(): boolean {
  const [done, setDone] = useState(false);
  useEffect(() => {
    performance.mark("hushmark:plan-drawn");
    let timer = 0;
    const frame = requestAnimationFrame(() => { timer = window.setTimeout(() => setDone(true), 0); });
    return () => { cancelAnimationFrame(frame); window.clearTimeout(timer); };
  }, []);
  return done;
}

export interface PlanCanvasHandle {
  stage: () => Konva.Stage | null;
}

/**
 * The plan drawing: four Konva layers — grid (static), elements (plan metres, redrawn only for
 * what changed), analysis overlay, and UI (selection, problems, the tool's rubber band). Hit-testing
 * is editor-core's, so no Konva node listens for events; the wrapper div takes the pointer.
 */
export const PlanCanvas = forwardRef<PlanCanvasHandle, PlanCanvasProps>(function PlanCanvas(props, ref) {
  const { plan, basePlan, levelId, ghostLevelId, selection, problems, viewport: v, setViewport, width, height, tool, overlay, overlayLabels, overlayUnderLabels, onKeyDown, label, cursor, pinReadings } = props;
  const stageRef = useRef<Konva.Stage>(null);
  const underlayRef = useRef<Konva.Layer>(null);
  const gridRef = useRef<Konva.Layer>(null);
  const elementsRef = useRef<Konva.Layer>(null);
  const overlayRef = useRef<Konva.Layer>(null);
  // The heavy layers draw at `d` and are moved by the compositor until the view settles at `v`.
  const d = useCompositedView(v, [underlayRef, gridRef, elementsRef, overlayRef]);
  const keepClearPx = props.keepClearPx?.(d);
  const [, setTick] = useState(0);
  const painted = useAfterFirstPaint();
  const movingRef = useRef<{ key: string; ids: ReadonlySet<string> }>({ key: "", ids: new Set() });
  if (basePlan) {
    const ids = changedIds(basePlan, plan);
    const key = [...ids].sort().join(",");
    // Same set, same object: the static group's props stay equal, so its layer is not redrawn.
    if (key !== movingRef.current.key) movingRef.current = { key, ids };
  } else if (movingRef.current.key) {
    movingRef.current = { key: "", ids: new Set() };
  }
  const moving = movingRef.current.ids;
  const drawnPlan = basePlan && moving.size ? basePlan : plan;
  // Only where an underlay is actually drawn (the Sketch passes its images) do rooms let it show through.
  const overUnderlay = props.underlaySrc !== undefined && (plan.underlays ?? []).some((u) => u.levelId === levelId && u.visible);
  useImperativeHandle(ref, () => ({ stage: () => stageRef.current }), []);
  const gestures = usePointerGestures({ viewport: v, setViewport, tool, onToolEvent: () => setTick((t) => t + 1) });

  useEffect(() => {
    const up = (e: KeyboardEvent) => { if (e.key === " ") gestures.spaceHeld.current = false; };
    window.addEventListener("keyup", up);
    return () => window.removeEventListener("keyup", up);
  }, [gestures.spaceHeld]);

  return (
    <div
      role="application"
      aria-label={label}
      aria-roledescription="plan drawing"
      tabIndex={0}
      className="relative h-full w-full touch-none select-none overflow-hidden bg-paper outline-none focus-visible:ring-2 focus-visible:ring-focus"
      style={{ cursor: cursor ?? "default" }}
      data-testid="plan-canvas"
      // The view transform, for browser tests and tools that need to aim at plan coordinates.
      data-scale={v.scale}
      data-ox={v.ox}
      data-oy={v.oy}
      data-level={levelId}
      onPointerDown={gestures.onPointerDown}
      onPointerMove={gestures.onPointerMove}
      onPointerUp={gestures.onPointerUp}
      onPointerCancel={gestures.onPointerCancel}
      onWheel={gestures.onWheel}
      onKeyDown={(e) => {
        if (e.key === " ") gestures.spaceHeld.current = true;
        onKeyDown?.(e);
        setTick((t) => t + 1);
      }}
    >
      <Stage ref={stageRef} width={width} height={height} listening={false}>
        <UnderlayLayer ref={underlayRef} underlays={plan.underlays} levelId={levelId} v={d} src={props.underlaySrc} />
        <GridLayer ref={gridRef} v={d} width={width} height={height} />
        <Layer ref={elementsRef} listening={false}>
          <Group x={d.ox} y={d.oy} scaleX={d.scale} scaleY={-d.scale}>
            {ghostLevelId ? <ElementsGroup plan={drawnPlan} levelId={ghostLevelId} scale={d.scale} ghost /> : null}
            <ElementsGroup plan={drawnPlan} levelId={levelId} exclude={moving} scale={d.scale} overUnderlay={overUnderlay} />
          </Group>
        </Layer>
        <Layer ref={overlayRef} listening={false}>
          <Group x={d.ox} y={d.oy} scaleX={d.scale} scaleY={-d.scale}>{overlay}</Group>
          {overlayUnderLabels?.(d)}
          {/* Names stay above the analysis colours so they can always be read. */}
          <Group x={d.ox} y={d.oy}>
            {painted ? <LabelsGroup plan={drawnPlan} levelId={levelId} scale={d.scale} unit={plan.displayUnit} exclude={moving} width={width} height={height} ox={d.ox} oy={d.oy} roomNamesFirst={props.roomNamesFirst ?? false} {...(pinReadings ? { pinReadings } : {})} {...(props.keepClear ? { keepClear: props.keepClear } : {})} {...(keepClearPx ? { keepClearPx } : {})} /> : null}
          </Group>
          {overlayLabels?.(d)}
        </Layer>
        <Layer listening={false}>
          <Group x={v.ox} y={v.oy} scaleX={v.scale} scaleY={-v.scale}>
            <MovingGroup plan={plan} levelId={levelId} ids={moving} scale={v.scale} overUnderlay={overUnderlay} />
          </Group>
          {moving.size ? (
            <Group x={v.ox} y={v.oy}>
              <LabelsGroup plan={plan} levelId={levelId} scale={v.scale} unit={plan.displayUnit} only={moving} {...(pinReadings ? { pinReadings } : {})} />
            </Group>
          ) : null}
          <UiGroup plan={plan} selection={selection} problems={painted ? problems : NO_PROBLEMS} overlay={tool?.overlay ?? {}} v={v} />
        </Layer>
      </Stage>
    </div>
  );
});
