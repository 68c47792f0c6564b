import { useCallback, useEffect, useLayoutEffect, useMemo, useRef, useState } from "react";
import { createTool, planBounds, boundsOfMany, setPlanUnit, type Clip, type ToolEnv, type ToolId } from "@hushmark/editor-core";
import { levelsByElevation } from "@hushmark/floorplan";
import type { PlanResponse } from "@hushmark/schemas";
import { PlanCanvas, type PlanCanvasHandle } from "../canvas/plan-canvas";
import { fitBounds, type Viewport } from "../model/viewport";
import { useEditorSession, useSaveStatus } from "../hooks/use-editor-session";
import { useElementSize, useFillHeight } from "../hooks/use-element-size";
import { useHistoryLabels, usePlan, useSelection } from "../hooks/use-store-value";
import { editorKeyHandler } from "../hooks/use-editor-keys";
import { useConflict } from "../hooks/use-conflict";
import { useProblems } from "../hooks/use-problems";
import { usePinReadings } from "../hooks/use-pin-readings";
import { NARROW, useMediaQuery } from "../../../lib/use-media-query";
import { ToolRail } from "./tool-rail";
import { StatusLine } from "./status-line";
import { DetailsPanel } from "../panels/details-panel";
import { ElementTable } from "./element-table";
import { AddRoomForm } from "./add-room-form";
import { ProblemsList } from "./problems-list";
import { ConflictDialog } from "./conflict-dialog";
import { LevelBar, levelBelow } from "./level-bar";
import { ExportMenu } from "./export-menu";
import { UnderlayMenu, UnderlayPicker, useUnderlaySrc, useUnderlayUi } from "../../underlays";

type SideTab = "details" | "elements" | "problems";

const cursors: Partial<Record<ToolId, string>> = { select: "default", pan: "grab", tape: "crosshair" };

/** The Sketch section: tools on the left, the plan, the selection's details on the right, the status line below. */
export function SketchScreen({ projectId, response, title, readOnly }: { projectId: string; response: PlanResponse; title: string; readOnly: boolean }) {
  const session = useEditorSession(projectId, response, title, readOnly);
  const { store, autosave } = session;
  const plan = usePlan(store);
  const selection = useSelection(store);
  const history = useHistoryLabels(store);
  const status = useSaveStatus(autosave);
  const conflict = useConflict(projectId, session);
  const underlayUi = useUnderlayUi();
  const underlaySrc = useUnderlaySrc(projectId);
  const pins = usePinReadings(projectId, plan);
  const narrow = useMediaQuery(NARROW);
  const [toolId, setToolId] = useState<ToolId>("select");
  const [levelId, setLevelId] = useState(() => levelsByElevation(store.plan).find((l) => l.elevationM >= 0)?.id ?? levelsByElevation(store.plan)[0]?.id ?? "ground");
  const [side, setSide] = useState<SideTab>("details");
  const [viewport, setViewport] = useState<Viewport>({ scale: 50, ox: 200, oy: 400 });
  const [conflictOpen, setConflictOpen] = useState(true);
  // On a phone the editor takes the whole window below the top bar (the project's title scrolls
  // away) rather than the strip left under the title, where the plan would be a few rows high.
  const frame = useFillHeight<HTMLDivElement>(narrow ? Math.max(480, window.innerHeight - 72) : 480);
  const canvas = useElementSize<HTMLDivElement>(frame.height);
  const canvasRef = useRef<PlanCanvasHandle>(null);
  const clipboard = useRef<Clip | null>(null);
  const fitted = useRef(false);

  const fit = useCallback(() => setViewport(fitBounds(planBounds(store.plan, levelId), canvas.width, canvas.height)), [store, levelId, canvas.width, canvas.height]);
  // The canvas mounts once the view is fitted to its settled size (measured under the frame's final
  // height, before the first paint), so a large plan is drawn once, where it belongs.
  const [viewReady, setViewReady] = useState(false);
  const sized = canvas.width > 0 && canvas.height > 0 && frame.measured && canvas.key === frame.height;
  // Until the person moves the view, it follows the canvas size.
  useLayoutEffect(() => {
    if (!fitted.current && sized) { fit(); setViewReady(true); }
  }, [sized, fit]);
  const moveView = useCallback((update: (v: Viewport) => Viewport) => {
    fitted.current = true;
    setViewport(update);
  }, []);

  const envRef = useRef<ToolEnv>({ store, levelId, unit: plan.displayUnit, gridM: 0.05, toleranceM: 0.2 });
  Object.assign(envRef.current, {
    levelId, unit: plan.displayUnit, toleranceM: 12 / viewport.scale,
    gridM: viewport.scale >= 80 ? 0.05 : viewport.scale >= 30 ? 0.1 : 0.25,
    pan: (d: { x: number; y: number }) => moveView((v) => ({ ...v, ox: v.ox + d.x * v.scale, oy: v.oy - d.y * v.scale })),
    done: () => setToolId("select"),
  });
  const tool = useMemo(() => (readOnly ? null : createTool(toolId, envRef.current)), [toolId, readOnly]);
  useEffect(() => () => tool?.cancel(), [tool]);

  // A drag's previews are not checked: the plan at pointer-down stands until the drag is released.
  const basePlan = store.transactionBase;
  const problems = useProblems(basePlan ?? plan);
  const counts = { errors: problems.filter((p) => p.severity === "error").length, warnings: problems.filter((p) => p.severity === "warning").length };

  const zoomTo = (id: string) => {
    store.select([id]);
    setSide("details");
    const b = boundsOfMany(store.plan, [id]);
    if (b) setViewport((v) => { const f = fitBounds(b, canvas.width, canvas.height, 120); return f.scale < v.scale ? f : { ...v, ox: canvas.width / 2 - ((b.minX + b.maxX) / 2) * v.scale, oy: canvas.height / 2 + ((b.minY + b.maxY) / 2) * v.scale }; });
  };

  const onKeyDown = editorKeyHandler({ store, tool, levelId, setTool: setToolId, setViewport: moveView, fit, size: canvas, clipboard, readOnly });
  const hint = tool?.overlay.hint;

  return (
    <div ref={frame.ref} className="flex flex-col overflow-hidden rounded-lg border border-rule bg-panel" style={{ height: frame.height }}>
      <div className="flex flex-wrap items-center gap-1 border-b border-rule px-2 py-1 sm:gap-2">
        <LevelBar plan={plan} levelId={levelId} onLevel={setLevelId} store={store} readOnly={readOnly} />
        <span className="mx-1 hidden h-6 w-px bg-rule sm:block" aria-hidden="true" />
        {!readOnly ? (
          <>
            <button type="button" className="min-h-10 rounded-md px-2 text-[14px] hover:bg-ink/5 disabled:opacity-40" disabled={!history.undo} onClick={() => store.undo()} aria-keyshortcuts="Control+Z" title={history.undo ? `Undo ${history.undo}` : "Nothing to undo"}>Undo</button>
            <button type="button" className="min-h-10 rounded-md px-2 text-[14px] hover:bg-ink/5 disabled:opacity-40" disabled={!history.redo} onClick={() => store.redo()} aria-keyshortcuts="Control+Shift+Z" title={history.redo ? `Redo ${history.redo}` : "Nothing to redo"}>Redo</button>
          </>
        ) : null}
        <button type="button" className="min-h-10 rounded-md px-2 text-[14px] hover:bg-ink/5" onClick={fit}>Fit to plan</button>
        {!readOnly ? <UnderlayMenu projectId={projectId} plan={plan} levelId={levelId} store={store} ui={underlayUi} view={{ ...viewport, width: canvas.width, height: canvas.height }} /> : null}
        <div className="ml-auto"><ExportMenu plan={plan} levelId={levelId} title={title} projectId={projectId} onCommand={readOnly ? undefined : (c) => store.run(c)} /></div>
      </div>
      {session.loadProblem ? <p role="alert" className="bg-danger/10 px-3 py-2 text-sm text-danger">The stored plan could not be read ({session.loadProblem}); a blank plan is open. Nothing is saved until you draw.</p> : null}
      {session.restoredPending ? <p className="bg-caution/10 px-3 py-1.5 text-sm">Edits made on this device earlier and not yet saved were put back; they are being saved now.</p> : null}
      <div className="flex min-h-0 flex-1 flex-col lg:flex-row">
        <div className={`flex min-h-0 flex-1 ${narrow ? "flex-col" : ""}`}>
          {!readOnly ? <ToolRail active={toolId} onPick={setToolId} orientation={narrow ? "horizontal" : "vertical"} /> : null}
          <div className="flex min-h-0 min-w-0 flex-1 flex-col">
            <div ref={canvas.ref} className="relative min-h-0 flex-1" onPointerDownCapture={() => { fitted.current = true; }}>
              {viewReady ? <PlanCanvas
                ref={canvasRef}
                plan={plan}
                basePlan={basePlan}
                levelId={levelId}
                ghostLevelId={levelBelow(plan, levelId)}
                selection={selection}
                problems={problems}
                viewport={viewport}
                setViewport={moveView}
                width={canvas.width}
                height={canvas.height}
                tool={tool}
                underlaySrc={underlaySrc}
                pinReadings={pins.texts}
                onKeyDown={onKeyDown}
                label={`Plan of ${title}. Use the tools on the left; the list of elements offers the same edits by keyboard.`}
                cursor={readOnly ? "grab" : cursors[toolId] ?? "crosshair"}
              /> : null}
              <UnderlayPicker ui={underlayUi} plan={plan} store={store} viewport={viewport} />
            </div>
            <StatusLine status={readOnly ? null : status} unit={plan.displayUnit} onUnit={readOnly ? undefined : (u) => store.run(setPlanUnit(u))} scale={viewport.scale} problems={counts} onProblems={() => setSide("problems")} hint={hint} onConflict={() => setConflictOpen(true)} />
          </div>
        </div>
        <aside aria-label="Selection and lists" className="flex h-[36%] min-h-0 shrink-0 flex-col border-t border-rule sm:h-[40%] lg:h-auto lg:w-[340px] lg:border-l lg:border-t-0">
          <div role="tablist" aria-label="Side panel" className="flex border-b border-rule">
            {(["details", "elements", "problems"] as const).map((t) => (
              <button key={t} role="tab" type="button" aria-selected={side === t} onClick={() => setSide(t)} className={`min-h-11 flex-1 border-b-[3px] text-[14px] font-medium ${side === t ? "border-brand text-brand-strong" : "border-transparent text-muted hover:text-ink"}`}>
                {t === "details" ? "Details" : t === "elements" ? "Elements" : `Problems${counts.errors + counts.warnings ? ` (${counts.errors + counts.warnings})` : ""}`}
              </button>
            ))}
          </div>
          <div role="tabpanel" key={side} className="min-h-0 flex-1 overflow-y-auto">
            {side === "details" ? (readOnly ? <p className="p-4 text-sm text-muted">This plan is shared with you to read. Select the Paths tab to see where the sound gets through.</p> : <DetailsPanel plan={plan} selection={selection} store={store} problems={problems} pins={{ projectId, readings: pins.byPin }} />) : null}
            {side === "elements" ? (
              <>
                {!readOnly ? <AddRoomForm plan={plan} levelId={levelId} store={store} /> : null}
                <ElementTable plan={plan} levelId={levelId} selection={selection} store={store} readOnly={readOnly} />
              </>
            ) : null}
            {side === "problems" ? <ProblemsList plan={plan} problems={problems} onPick={zoomTo} /> : null}
          </div>
        </aside>
      </div>
      {status.kind === "conflict" && !readOnly ? (
        <ConflictDialog
          open={conflictOpen}
          currentVersion={status.currentVersion}
          busy={conflict.busy}
          onKeepMine={() => conflict.keepMine(status.currentVersion)}
          onTakeTheirs={() => void conflict.takeTheirs()}
          onClose={() => setConflictOpen(false)}
        />
      ) : null}
      {conflict.error ? <p role="alert" className="bg-danger/10 px-3 py-2 text-sm text-danger">{conflict.error}</p> : null}
    </div>
  );
}
