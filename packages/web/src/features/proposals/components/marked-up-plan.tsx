import { useEffect, useMemo, useRef, useState } from "react";
import { Circle, Group, Text } from "react-konva";
import { EditorStore, InspectTool, planBounds, type ToolEnv } from "@hushmark/editor-core";
import { levelsByElevation, type Plan } from "@hushmark/floorplan";
import type { AnalysisResult } from "@hushmark/schemas";
import { PlanCanvas } from "../../editor/canvas/plan-canvas";
import { brand, panel } from "../../editor/canvas/colours";
import { useElementSize } from "../../editor/hooks/use-element-size";
import { useSelection } from "../../editor/hooks/use-store-value";
import { fitBounds, toScreen, type Viewport } from "../../editor/model/viewport";
import { ShareOverlay } from "../../paths/components/analysis-overlay";
import { SHARE_LEGEND } from "../../paths/model/share-scale";
import { elementAnchor } from "../model/element-anchor";

export interface ElementShare {
  elementId: string;
  share: number;
}

/**
 * The editor's plan drawing, read-only: elements coloured by their share of the sound at the
 * receiver, numbered markers, a legend. A click selects (reported through `onPick` when given,
 * for picking an element to upgrade); a drag pans. Nothing on it edits the plan.
 */
export function MarkedUpPlan({ plan, shares, levelId: startLevel, markers, label, legendTitle, legendLabels, onPick, picked, heightPx = 420 }: {
  plan: Plan;
  shares: readonly ElementShare[] | null;
  levelId: string;
  /** Numbered markers (1, 2, …) on these elements. */
  markers?: readonly string[];
  label: string;
  legendTitle: string;
  /** Words for each colour of the legend, low share to high; the percentages are added. */
  legendLabels?: readonly string[];
  onPick?: (id: string | null) => void;
  picked?: string | null;
  heightPx?: number;
}) {
  const [store] = useState(() => new EditorStore(plan));
  useEffect(() => {
    if (store.plan !== plan) store.load(plan);
  }, [plan, store]);
  const selection = useSelection(store);
  const levels = levelsByElevation(plan);
  const [levelId, setLevelId] = useState(startLevel);
  const [viewport, setViewport] = useState<Viewport>({ scale: 40, ox: 100, oy: 400 });
  const canvas = useElementSize<HTMLDivElement>();
  const fitted = useRef(false);
  useEffect(() => {
    if (!fitted.current && canvas.width > 0 && canvas.height > 0) setViewport(fitBounds(planBounds(store.plan, levelId), canvas.width, canvas.height));
  }, [canvas.width, canvas.height, store, levelId]);
  const moveView = (update: (v: Viewport) => Viewport) => {
    fitted.current = true;
    setViewport(update);
  };
  const envRef = useRef<ToolEnv>({ store, levelId, unit: plan.displayUnit, gridM: 0, toleranceM: 0.2 });
  Object.assign(envRef.current, { levelId, toleranceM: 12 / viewport.scale, pan: (d: { x: number; y: number }) => moveView((v) => ({ ...v, ox: v.ox + d.x * v.scale, oy: v.oy - d.y * v.scale })) });
  const [tool] = useState(() => new InspectTool(envRef.current));

  const onPickRef = useRef(onPick);
  onPickRef.current = onPick;
  const selected = selection[0] ?? null;
  useEffect(() => onPickRef.current?.(selected), [selected]);
  // The parent may clear or set the pick (from the list); the drawing follows.
  useEffect(() => {
    if (picked !== undefined && picked !== (store.selection[0] ?? null)) store.select(picked ? [picked] : []);
  }, [picked, store]);

  const anchors = useMemo(() => (markers ?? []).map((id, i) => ({ n: i + 1, at: elementAnchor(plan, id) })), [markers, plan]);
  const markerPoints = useMemo(() => anchors.flatMap(({ at }) => (at && (at.levelId === null || at.levelId === levelId) ? [{ x: at.x, y: at.y }] : [])), [anchors, levelId]);
  const overlay = shares ? <ShareOverlay plan={plan} levelId={levelId} elements={shares as AnalysisResult["elements"]} scale={viewport.scale} dimmed={false} /> : null;
  const labels = anchors.length
    ? (v: Viewport) => (
        <Group listening={false}>
          {anchors.map(({ n, at }) => {
            if (!at || (at.levelId !== null && at.levelId !== levelId)) return null;
            const p = toScreen(v, at.x, at.y);
            return (
              <Group key={n} x={p.x} y={p.y}>
                <Circle radius={11} fill={brand} stroke={panel} strokeWidth={2} />
                <Text text={String(n)} x={-11} y={-7} width={22} align="center" fontFamily="Work Sans" fontSize={13} fontStyle="600" fill={panel} />
              </Group>
            );
          })}
        </Group>
      )
    : undefined;

  return (
    <div className="flex flex-col overflow-hidden rounded-md border border-rule bg-panel">
      <div className="flex items-center gap-2 border-b border-rule px-2 py-1">
        {levels.length > 1 ? (
          <>
            <label className="sr-only" htmlFor={`level-${label.length}`}>Level</label>
            <select id={`level-${label.length}`} value={levelId} onChange={(e) => setLevelId(e.target.value)} className="min-h-9 rounded-md border border-rule bg-panel px-2 text-[14px]">
              {levels.map((l) => <option key={l.id} value={l.id}>{l.name}</option>)}
            </select>
          </>
        ) : null}
        <button type="button" className="min-h-9 rounded-md px-2 text-[14px] hover:bg-ink/5" onClick={() => { fitted.current = false; setViewport(fitBounds(planBounds(store.plan, levelId), canvas.width, canvas.height)); }}>Fit to plan</button>
        <span className="ml-auto hidden text-[12px] text-muted sm:inline">{onPick ? "Click an element to pick it · drag to move the view" : "Drag to move the view"}</span>
      </div>
      <div ref={canvas.ref} className="relative" style={{ height: heightPx }}>
        <PlanCanvas
          plan={plan}
          levelId={levelId}
          selection={onPick ? selection : []}
          problems={[]}
          viewport={viewport}
          setViewport={moveView}
          width={canvas.width}
          height={canvas.height}
          tool={tool}
          label={label}
          cursor={onPick ? "pointer" : "grab"}
          overlay={overlay}
          overlayLabels={labels}
          roomNamesFirst
          keepClear={markerPoints}
        />
      </div>
      {shares ? (
        <div className="flex flex-wrap items-center gap-x-3 gap-y-1 border-t border-rule px-2 py-1.5 text-[12px]" aria-label="Colour legend">
          <p className="font-semibold">{legendTitle}</p>
          <ul className="flex flex-wrap gap-x-3 gap-y-0.5">
            {SHARE_LEGEND.map((l, i) => (
              <li key={l.label} className="flex items-center gap-1.5">
                <span className="inline-block h-3 w-4 rounded-sm border border-rule" style={{ background: l.colour }} aria-hidden="true" />
                {legendLabels?.[i] ? `${legendLabels[i]} (${l.label})` : l.label}
              </li>
            ))}
          </ul>
        </div>
      ) : null}
    </div>
  );
}
