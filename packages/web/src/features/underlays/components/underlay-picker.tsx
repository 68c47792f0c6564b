import { useEffect, useRef, useState } from "react";
import { calibrateUnderlayTyped, rotateUnderlayAbout, setUnderlayPlacement, squaringTurnDeg, type EditorStore } from "@hushmark/editor-core";
import type { Plan, Point } from "@hushmark/floorplan";
import { toPlan, toScreen, type Viewport } from "../../editor/model/viewport";
import { usePick, type PickKind, type UnderlayUi } from "../model/underlay-ui";

const HINTS: Record<PickKind, [string, string]> = {
  calibrate: ["Set scale: click one end of a length you know on the drawing (a long wall, a dimension line).", "Now click the other end."],
  square: ["Square to a line: click one end of a line on the drawing that should run straight across or straight up.", "Now click the other end."],
  move: ["Move: click a point on the drawing.", "Now click where that point should be."],
};

/**
 * Takes the two clicks of an underlay step over the canvas: the clicks are caught before the
 * drawing tools see them, while the wheel still zooms. Escape or Cancel stops without a change.
 */
export function UnderlayPicker({ ui, plan, store, viewport }: { ui: UnderlayUi; plan: Plan; store: EditorStore; viewport: Viewport }) {
  const pick = usePick(ui);
  const hostRef = useRef<HTMLDivElement>(null);
  const [hover, setHover] = useState<Point | null>(null);
  const [typed, setTyped] = useState("");
  const [error, setError] = useState<string | null>(null);
  const view = useRef(viewport);
  view.current = viewport;
  const underlay = pick ? plan.underlays?.find((u) => u.id === pick.underlayId) : undefined;

  useEffect(() => {
    if (!pick) return;
    setTyped("");
    setError(null);
    const parent = hostRef.current?.parentElement;
    if (!parent) return;
    const local = (e: PointerEvent) => {
      const r = parent.getBoundingClientRect();
      return toPlan(view.current, e.clientX - r.left, e.clientY - r.top);
    };
    const inBanner = (e: Event) => e.target instanceof Node && hostRef.current?.querySelector("[data-banner]")?.contains(e.target);
    const down = (e: PointerEvent) => {
      if (inBanner(e) || e.button !== 0) return;
      e.stopPropagation();
      e.preventDefault();
      ui.add(local(e));
    };
    const swallow = (e: PointerEvent) => {
      if (inBanner(e)) return;
      e.stopPropagation();
      if (e.type === "pointermove") setHover(local(e));
    };
    const key = (e: KeyboardEvent) => { if (e.key === "Escape") ui.cancel(); };
    parent.addEventListener("pointerdown", down, true);
    parent.addEventListener("pointermove", swallow, true);
    parent.addEventListener("pointerup", swallow, true);
    window.addEventListener("keydown", key);
    return () => {
      parent.removeEventListener("pointerdown", down, true);
      parent.removeEventListener("pointermove", swallow, true);
      parent.removeEventListener("pointerup", swallow, true);
      window.removeEventListener("keydown", key);
    };
    // A new step (kind or underlay) sets the listeners up again; added points do not.
  }, [pick?.kind, pick?.underlayId, ui]);

  // Squaring and moving finish on the second click; scaling waits for the typed distance.
  useEffect(() => {
    if (!pick || !underlay || pick.points.length < 2) return;
    const [a, b] = pick.points as [Point, Point];
    if (pick.kind === "square") {
      store.run(setUnderlayPlacement(underlay.id, rotateUnderlayAbout(underlay, a, squaringTurnDeg(a, b)), "square underlay"));
      ui.cancel();
    } else if (pick.kind === "move") {
      store.run(setUnderlayPlacement(underlay.id, { origin: { x: underlay.origin.x + b.x - a.x, y: underlay.origin.y + b.y - a.y } }, "move underlay"));
      ui.cancel();
    }
  }, [pick, underlay, store, ui]);

  if (!pick) return null;
  if (!underlay) return null;
  const pts = pick.points.map((p) => toScreen(viewport, p.x, p.y));
  const cursor = hover && pick.points.length === 1 ? toScreen(viewport, hover.x, hover.y) : null;
  const asking = pick.kind === "calibrate" && pick.points.length === 2;

  const submit = () => {
    const [a, b] = pick.points as [Point, Point];
    const result = calibrateUnderlayTyped(underlay, a, b, typed, plan.displayUnit);
    if (!result.ok) return setError(result.message);
    store.run(setUnderlayPlacement(underlay.id, result.placement, "set underlay scale", { calibrated: true }));
    ui.cancel();
  };

  return (
    <div ref={hostRef} className="pointer-events-none absolute inset-0 z-10" data-testid="underlay-picker" data-step={pick.kind} data-points={pick.points.length}>
      <svg className="absolute inset-0 h-full w-full" aria-hidden="true">
        {pts[0] && (pts[1] ?? cursor) ? <line x1={pts[0].x} y1={pts[0].y} x2={(pts[1] ?? cursor)!.x} y2={(pts[1] ?? cursor)!.y} stroke="#c98a12" strokeWidth={2} strokeDasharray="6 4" /> : null}
        {pts.map((p, i) => <circle key={i} cx={p.x} cy={p.y} r={6} fill="none" stroke="#c98a12" strokeWidth={2.5} />)}
      </svg>
      <div data-banner role="status" className="pointer-events-auto absolute left-1/2 top-2 flex w-max max-w-[min(36rem,calc(100%-1rem))] -translate-x-1/2 flex-wrap items-center gap-2 rounded-md border border-rule bg-panel px-3 py-2 text-[14px] shadow-lg">
        {asking ? (
          <form className="flex flex-wrap items-end gap-2" onSubmit={(e) => { e.preventDefault(); submit(); }}>
            <label className="flex flex-col gap-1 font-medium">
              <span>Real distance between the two points</span>
              <input autoFocus value={typed} onChange={(e) => { setTyped(e.target.value); setError(null); }} placeholder={plan.displayUnit === "metric" ? "e.g. 4.2 or 420 cm" : `e.g. 13' 9"`}
                className="min-h-9 w-44 rounded-md border border-rule bg-panel px-2 font-normal" aria-invalid={error ? true : undefined} />
            </label>
            <button type="submit" className="min-h-9 rounded-md bg-brand px-3 font-medium text-white">Set scale</button>
            <button type="button" className="min-h-9 rounded-md px-2 hover:bg-ink/5" onClick={() => ui.cancel()}>Cancel</button>
            {error ? <p role="alert" className="basis-full text-sm text-danger">{error}</p> : null}
          </form>
        ) : (
          <>
            <span>{HINTS[pick.kind][pick.points.length === 0 ? 0 : 1]}</span>
            <button type="button" className="min-h-9 rounded-md px-2 hover:bg-ink/5" onClick={() => ui.cancel()}>Cancel</button>
          </>
        )}
      </div>
    </div>
  );
}
