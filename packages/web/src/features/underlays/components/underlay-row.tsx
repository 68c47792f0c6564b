import { useEffect, useState } from "react";
import { removeUnderlay, rotateUnderlayAbout, setUnderlayLook, setUnderlayPlacement, underlayPixelToPlan, type EditorStore } from "@hushmark/editor-core";
import type { Underlay } from "@hushmark/floorplan";
import { CommitInput } from "../../editor/panels/commit-input";
import { scaleText } from "../model/placement";
import type { PickKind, UnderlayUi } from "../model/underlay-ui";

const small = "min-h-9 rounded-md border border-rule px-2 text-[13px] hover:border-muted disabled:cursor-not-allowed disabled:opacity-50";

/** One underlay on the level: its scale, the steps that place it, and how it looks. */
export function UnderlayRow({ underlay: u, store, ui, unit, onPick }: { underlay: Underlay; store: EditorStore; ui: UnderlayUi; unit: "metric" | "imperial"; onPick: () => void }) {
  const [opacity, setOpacity] = useState(Math.round(u.opacity * 100));
  useEffect(() => setOpacity(Math.round(u.opacity * 100)), [u.opacity]);
  const commitOpacity = () => { if (opacity !== Math.round(u.opacity * 100)) store.run(setUnderlayLook(u.id, { opacity: opacity / 100 })); };
  const pick = (kind: PickKind) => { ui.start(kind, u.id); onPick(); };
  const locked = u.locked;
  const lockedTitle = locked ? "Unlock it to change this" : undefined;
  const name = u.name || "Drawing";
  return (
    <li className="flex flex-col gap-2 rounded-md border border-rule p-2" aria-label={`Underlay ${name}`}>
      <div className="flex items-baseline justify-between gap-2">
        <span className="truncate text-[14px] font-medium" title={name}>{name}</span>
        <span className={`shrink-0 text-xs ${u.calibrated ? "text-muted" : "text-caution"}`} data-testid="underlay-scale">{u.calibrated ? scaleText(u.scaleMPerPx, unit) : "Scale not set yet"}</span>
      </div>
      <div className="flex flex-wrap gap-1">
        <button type="button" className={small} disabled={locked} title={lockedTitle ?? "Pick two points a known distance apart, then type that distance"} onClick={() => pick("calibrate")}>Set scale…</button>
        <button type="button" className={small} disabled={locked} title={lockedTitle ?? "Pick two points on a line that should run straight across or up the plan"} onClick={() => pick("square")}>Square to a line</button>
        <button type="button" className={small} disabled={locked} title={lockedTitle ?? "Pick a point on the drawing, then where it should go"} onClick={() => pick("move")}>Move</button>
      </div>
      <div className="grid grid-cols-2 gap-2">
        <div className={locked ? "pointer-events-none opacity-50" : ""}>
          <CommitInput label="Turn" suffix="°" type="number" step="any" value={String(Math.round(u.rotationDeg * 100) / 100)} onCommit={(text) => {
            const deg = Number(text);
            if (!Number.isFinite(deg) || locked) return;
            const centre = underlayPixelToPlan(u, u.widthPx / 2, u.heightPx / 2);
            store.run(setUnderlayPlacement(u.id, rotateUnderlayAbout(u, centre, deg - u.rotationDeg), "turn underlay"));
          }} />
        </div>
        <label className="flex flex-col gap-1 text-sm font-medium">
          <span>Strength {opacity} %</span>
          <input type="range" min={10} max={100} step={5} value={opacity} className="accent-brand" aria-label="Strength of the drawing"
            onChange={(e) => setOpacity(Number(e.target.value))} onPointerUp={commitOpacity} onKeyUp={commitOpacity} onBlur={commitOpacity} />
        </label>
      </div>
      <div className="flex flex-wrap items-center gap-3 text-[14px]">
        <label className="flex min-h-9 items-center gap-2"><input type="checkbox" className="h-4 w-4 accent-brand" checked={u.visible} onChange={(e) => store.run(setUnderlayLook(u.id, { visible: e.target.checked }))} /> Show</label>
        <label className="flex min-h-9 items-center gap-2"><input type="checkbox" className="h-4 w-4 accent-brand" checked={u.locked} onChange={(e) => store.run(setUnderlayLook(u.id, { locked: e.target.checked }))} /> Lock</label>
        <button type="button" className="ml-auto min-h-9 rounded-md px-2 text-[13px] text-danger hover:bg-danger/5" onClick={() => store.run(removeUnderlay(u.id))}>Remove from plan</button>
      </div>
    </li>
  );
}
