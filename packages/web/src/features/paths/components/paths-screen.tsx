import { useEffect, useMemo, useRef, useState } from "react";
import { useQueryClient } from "@tanstack/react-query";
import { EditorStore, InspectTool, boundsOfMany, planBounds, setLeaks, wallPieceById, type ToolEnv } from "@hushmark/editor-core";
import { levelsByElevation, type Leaks } from "@hushmark/floorplan";
import type { AnalysisRequest, PlanResponse } from "@hushmark/schemas";
import { PlanCanvas } from "../../editor/canvas/plan-canvas";
import { fitBounds, type Viewport } from "../../editor/model/viewport";
import { openPlan } from "../../editor/model/open-plan";
import { useElementSize, useFillHeight } from "../../editor/hooks/use-element-size";
import { usePlan, useSelection } from "../../editor/hooks/use-store-value";
import { savePlan } from "../../editor/api/save-plan";
import { ExportMenu } from "../../editor/components/export-menu";
import { projectKeys } from "../../projects/api/keys";
import { isApiError } from "../../../lib/api-client";
import { analysisDrawing, useAnalysis } from "../api/run-analysis";
import { SHARE_LEGEND, shareColour } from "../model/share-scale";
import { AnalysisInputs, defaultInputs, toAnalysisTarget, type PathInputs } from "./analysis-inputs";
import { ShareOverlay, PathLines, PathTags, pathLayout, type PathLayout } from "./analysis-overlay";
import { ResultSummary, PathsList } from "./result-summary";
import { SpectrumChart } from "./spectrum-chart";
import { WeakLinksList } from "./weak-links-list";
import { LeakQuickEdit } from "./leak-quick-edit";
import { PathCautions } from "./path-cautions";

function toRequest(version: number, i: PathInputs): AnalysisRequest {
  return {
    planVersion: version,
    source: i.sourceKind === "impact" ? { kind: "impact", roomId: i.sourceId } : { kind: "airborne", spaceId: i.sourceId, spectrum: { kind: "library", id: i.spectrumId } },
    receiverId: i.receiverId,
    ...(i.target ? { target: i.target } : {}),
    paths: 5,
  };
}

/** The Paths section: pick source and receiver, see the plan marked up by where the sound gets through. */
export function PathsScreen({ projectId, response, title, plain, canEdit }: { projectId: string; response: PlanResponse; title: string; plain: boolean; canEdit: boolean }) {
  const queryClient = useQueryClient();
  const [store] = useState(() => new EditorStore(openPlan(response.document, projectId, title).plan));
  const [version, setVersion] = useState(response.version);
  const plan = usePlan(store);
  const selection = useSelection(store);
  const [inputs, setInputs] = useState<PathInputs | null>(() => defaultInputs(store.plan));
  const levels = levelsByElevation(plan);
  const [levelId, setLevelId] = useState(() => levels.find((l) => l.elevationM >= 0)?.id ?? levels[0]?.id ?? "ground");
  const [viewport, setViewport] = useState<Viewport>({ scale: 40, ox: 100, oy: 400 });
  const [highlight, setHighlight] = useState<number | null>(null);
  const [saving, setSaving] = useState(false);
  const [saveError, setSaveError] = useState<string | null>(null);
  const canvas = useElementSize<HTMLDivElement>();
  const frame = useFillHeight<HTMLDivElement>(480);
  const fitted = useRef(false);
  // Until the person moves the view, it follows the canvas size (the layout settles after the first measure).
  useEffect(() => {
    if (!fitted.current && canvas.width > 0 && canvas.height > 0) setViewport(fitBounds(planBounds(store.plan, levelId), canvas.width, canvas.height));
  }, [canvas.width, canvas.height, store, levelId]);
  const moveView = (update: (v: Viewport) => Viewport) => {
    fitted.current = true;
    setViewport(update);
  };

  // A newer saved plan (from Sketch, or someone else) replaces the one shown; the analysis follows its version.
  useEffect(() => {
    if (response.version > version && !saving) {
      store.load(openPlan(response.document, projectId, title).plan);
      setVersion(response.version);
    }
  }, [response, version, saving, store, projectId, title]);

  const request = useMemo(() => (inputs ? toRequest(version, inputs) : null), [inputs, version]);
  const analysis = useAnalysis(projectId, request);
  const result = analysis.data;
  const recomputing = analysis.isFetching;
  const stale = analysis.isPlaceholderData || recomputing;
  // The paths' lines and tags at the view the canvas draws, worked out once per view.
  const layoutAt = useMemo(() => {
    if (!result) return undefined;
    let last: { view: Viewport; layout: PathLayout } | undefined;
    return (view: Viewport) => {
      if (last?.view !== view) last = { view, layout: pathLayout(plan, result, levelId, view) };
      return last.layout;
    };
  }, [plan, result, levelId]);

  const envRef = useRef<ToolEnv>({ store, levelId, unit: plan.displayUnit, gridM: 0, toleranceM: 0.2 });
  Object.assign(envRef.current, { levelId, toleranceM: 12 / viewport.scale, pan: (d: { x: number; y: number }) => moveView((v) => ({ ...v, ox: v.ox + d.x * v.scale, oy: v.oy - d.y * v.scale })) });
  const [tool] = useState(() => new InspectTool(envRef.current));

  const selected = selection[0] ?? null;
  const selectedEl = selected ? plan.elements[selected] : undefined;

  const zoomTo = (id: string) => {
    store.select([id]);
    const piece = wallPieceById(store.plan, id);
    const b = piece ? { minX: Math.min(piece.start.x, piece.end.x), maxX: Math.max(piece.start.x, piece.end.x), minY: Math.min(piece.start.y, piece.end.y), maxY: Math.max(piece.start.y, piece.end.y) } : boundsOfMany(store.plan, [id]);
    const lvl = piece?.levelId ?? (selectedEl && "levelId" in selectedEl ? selectedEl.levelId : undefined);
    if (lvl && lvl !== levelId) setLevelId(lvl);
    if (b) setViewport(fitBounds({ minX: b.minX - 2, maxX: b.maxX + 2, minY: b.minY - 2, maxY: b.maxY + 2 }, canvas.width, canvas.height, 60));
  };

  const changeLeaks = async (id: string, leaks: Partial<Leaks>) => {
    setSaving(true);
    setSaveError(null);
    const before = store.plan;
    store.run(setLeaks(id, leaks));
    try {
      const saved = await savePlan(projectId, store.plan, version, "Leak changed in the Paths view");
      queryClient.setQueryData(projectKeys.plan(projectId), saved);
      setVersion(saved.version);
    } catch (e) {
      store.load(before, { keepHistory: true });
      setSaveError(isApiError(e) && e.status === 409 ? "The plan was changed elsewhere; reload the page to see the latest version." : isApiError(e) ? e.message : "The change was not saved.");
    } finally {
      setSaving(false);
    }
  };

  const problems = isApiError(analysis.error) && analysis.error.status === 422 ? (analysis.error.details as Array<{ message: string; elementId?: string | null }> | undefined) ?? [] : null;
  const markup = result ? { colours: Object.fromEntries(result.elements.map((e) => [e.elementId, shareColour(e.share)])), legend: SHARE_LEGEND, subtitle: `${result.source.name} → ${result.receiver.name}: ${result.receiver.dba.toFixed(0)} dBA`, paths: result.paths.slice(0, 3) } : undefined;

  if (!inputs) return <p className="rounded-lg border border-rule bg-panel p-6 text-[15px]">Draw at least two rooms in Sketch to see where the sound gets through.</p>;

  return (
    // On a phone the inputs, the drawing and the results stack and the page scrolls: squeezed
    // into one window's height the drawing would be a strip. From tablet width up it fills the window.
    <div ref={frame.ref} className="flex flex-col overflow-hidden rounded-lg border border-rule bg-panel md:h-[var(--frame-h)]" style={{ "--frame-h": `${frame.height}px` } as React.CSSProperties}>
      <div className="border-b border-rule p-2">
        <AnalysisInputs plan={plan} inputs={inputs} onChange={setInputs} plain={plain} />
      </div>
      <div className="flex min-h-0 flex-1 flex-col lg:flex-row">
        <div className="relative flex min-h-0 min-w-0 flex-1 flex-col">
          <div className="flex items-center gap-2 border-b border-rule px-2 py-1">
            <label className="sr-only" htmlFor="paths-level">Level</label>
            <select id="paths-level" value={levelId} onChange={(e) => setLevelId(e.target.value)} className="min-h-9 rounded-md border border-rule bg-panel px-2 text-[14px]">
              {levels.map((l) => <option key={l.id} value={l.id}>{l.name}</option>)}
            </select>
            <button type="button" className="min-h-9 rounded-md px-2 text-[14px] hover:bg-ink/5" onClick={() => setViewport(fitBounds(planBounds(store.plan, levelId), canvas.width, canvas.height))}>Fit to plan</button>
            {recomputing ? <span role="status" className="inline-flex items-center gap-1.5 text-[13px] font-medium text-caution" data-testid="recomputing"><span className="h-2 w-2 animate-pulse rounded-full bg-caution" aria-hidden="true" /> Recomputing…</span> : null}
            <div className="ml-auto"><ExportMenu plan={plan} levelId={levelId} title={title} {...(markup ? { markup } : {})} {...(request && analysis.data ? { printPdf: () => analysisDrawing(projectId, request) } : {})} /></div>
          </div>
          <div ref={canvas.ref} className="relative h-[360px] flex-none md:h-auto md:min-h-0 md:flex-1">
            <PlanCanvas
              plan={plan}
              levelId={levelId}
              selection={selection}
              problems={[]}
              viewport={viewport}
              setViewport={moveView}
              width={canvas.width}
              height={canvas.height}
              tool={tool}
              label={`Marked-up plan of ${title}: elements coloured by their share of the sound reaching ${result?.receiver.name ?? "the room"}. The list beside it gives the same information.`}
              cursor="grab"
              roomNamesFirst
              overlay={result ? <ShareOverlay plan={plan} levelId={levelId} elements={result.elements} scale={viewport.scale} dimmed={stale} /> : null}
              overlayUnderLabels={layoutAt ? (drawnView) => <PathLines layout={layoutAt(drawnView)} dimmed={stale} highlight={highlight} /> : undefined}
              overlayLabels={layoutAt ? (drawnView) => <PathTags layout={layoutAt(drawnView)} dimmed={stale} highlight={highlight} /> : undefined}
              {...(layoutAt ? { keepClearPx: (drawnView: Viewport) => layoutAt(drawnView).tagBoxes } : {})}
            />
          </div>
          <div className="flex shrink-0 flex-wrap items-center gap-x-3 gap-y-1 border-t border-rule bg-panel px-2 py-1 text-[12px]" aria-label="Colour legend">
            <p className="font-semibold">{plain ? "Share of what you hear" : "Share of the sound reaching the room"}</p>
            <ul className="flex flex-wrap gap-x-3 gap-y-0.5">
              {SHARE_LEGEND.map((l) => <li key={l.label} className="flex items-center gap-1.5"><span className="inline-block h-3 w-4 rounded-sm border border-rule" style={{ background: l.colour }} aria-hidden="true" />{l.label}</li>)}
            </ul>
          </div>
        </div>
        <aside aria-label="Results" className="flex min-h-0 shrink-0 flex-col gap-4 border-t border-rule p-3 md:h-[40%] md:overflow-y-auto lg:h-auto lg:w-[360px] lg:border-l lg:border-t-0">
          {analysis.isPending && !result ? <p role="status" className="text-sm text-muted">Working out where the sound gets through…</p> : null}
          {problems ? (
            <div role="alert" className="rounded-md border border-danger/40 bg-danger/5 p-3 text-sm">
              <p className="font-semibold text-danger">The plan needs fixing before it can be analysed.</p>
              <ul className="mt-1 list-disc pl-5">{problems.slice(0, 6).map((p, i) => <li key={i}>{p.message}</li>)}</ul>
            </div>
          ) : analysis.isError ? <p role="alert" className="text-sm text-danger">{isApiError(analysis.error) ? analysis.error.message : "The analysis did not run."}</p> : null}
          {result ? (
            <>
              {selectedEl?.type === "room" && inputs ? (
                <div className="flex flex-wrap items-center gap-2 rounded-md border border-rule p-2 text-[14px]" aria-label="Picked on the plan">
                  <span className="font-medium">{selectedEl.name}</span>
                  <button type="button" className="min-h-11 rounded-md px-3 font-medium text-brand-strong hover:bg-brand-soft disabled:opacity-50" disabled={inputs.sourceId === selectedEl.id && inputs.sourceKind === "airborne"} onClick={() => setInputs({ ...inputs, sourceKind: "airborne", sourceId: selectedEl.id, ...(inputs.receiverId === selectedEl.id ? { receiverId: inputs.sourceId } : {}) })}>{plain ? "Noise is here" : "Make it the source"}</button>
                  <button type="button" className="min-h-11 rounded-md px-3 font-medium text-brand-strong hover:bg-brand-soft disabled:opacity-50" disabled={inputs.receiverId === selectedEl.id} onClick={() => setInputs({ ...inputs, receiverId: selectedEl.id, ...(inputs.sourceId === selectedEl.id ? { sourceId: inputs.receiverId } : {}), ...(selectedEl.target ? { target: toAnalysisTarget(selectedEl.target) } : {}) })}>{plain ? "Should be quiet" : "Make it the receiver"}</button>
                </div>
              ) : null}
              <ResultSummary result={result} plain={plain} />
              <SpectrumChart result={result} dimmed={stale} />
              <WeakLinksList result={result} selected={selected} onPick={zoomTo} plain={plain} dimmed={stale} />
              {canEdit && (selectedEl?.type === "door" || selectedEl?.type === "window") ? <LeakQuickEdit el={selectedEl} busy={saving} onLeaks={(l) => void changeLeaks(selectedEl.id, l)} /> : null}
              {saveError ? <p role="alert" className="text-sm text-danger">{saveError}</p> : null}
              <PathsList result={result} highlight={highlight} onHighlight={setHighlight} />
              <PathCautions plan={plan} result={result} />
              {result.assumptions.length && !plain ? (
                <details className="text-[13px]">
                  <summary className="cursor-pointer font-medium">Assumptions ({result.assumptions.length})</summary>
                  <ul className="mt-1 list-disc pl-5 text-muted">{result.assumptions.map((a, i) => <li key={i}>{a.message}</li>)}</ul>
                </details>
              ) : null}
            </>
          ) : null}
        </aside>
      </div>
    </div>
  );
}
