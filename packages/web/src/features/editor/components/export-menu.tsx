import { useState } from "react";
import type { Plan } from "@hushmark/floorplan";
import { planToSvg, type ExportMarkup } from "../export/plan-svg";
import { downloadBlob, fileSafe, svgToPng } from "../export/download";
import type { Command } from "@hushmark/editor-core";
import { ExchangeMenuItems } from "../../exchange/components/exchange-menu-items";

/** PNG and SVG export of the level shown, with title block, scale bar, optional north arrow and (on Paths) the legend. */
export function ExportMenu({ plan, levelId, title, markup, onCommand, projectId, printPdf }: { plan: Plan; levelId: string; title: string; markup?: ExportMarkup; onCommand?: (cmd: Command) => void; projectId?: string; printPdf?: () => Promise<Blob> }) {
  const [open, setOpen] = useState(false);
  const [north, setNorth] = useState(true);
  const [error, setError] = useState<string | null>(null);
  // While an import dialog from the menu is open the menu steps aside (it stays mounted, since
  // the dialog's state lives in it) and closes when the dialog does.
  const [dialogOpen, setDialogOpen] = useState(false);
  const make = () => {
    const level = plan.elements[levelId];
    return planToSvg(plan, levelId, { title, levelName: level?.type === "level" ? level.name : "", date: new Date().toLocaleDateString(), north, ...(markup ? { markup } : {}) });
  };
  const name = `${fileSafe(title)}${markup ? "-sound-paths" : "-plan"}`;
  return (
    <div className="relative">
      <button type="button" aria-expanded={open && !dialogOpen} onClick={() => setOpen((o) => !o)} className="min-h-10 rounded-md px-2 text-[14px] font-medium hover:bg-ink/5">Export</button>
      {open ? (
        <div className={`absolute right-0 top-11 z-20 ${dialogOpen ? "hidden" : "flex"} w-72 max-w-[calc(100vw-2.5rem)] flex-col gap-0.5 rounded-md border border-rule bg-panel p-2 shadow-lg`}>
          <label className="flex min-h-9 items-center gap-2 px-1 text-[14px]"><input type="checkbox" checked={north} onChange={(e) => setNorth(e.target.checked)} className="h-4 w-4 accent-brand" /> North arrow</label>
          <button type="button" className="min-h-11 rounded px-2 py-1.5 text-left text-[14px] hover:bg-brand-soft" onClick={async () => {
            try { const s = make(); downloadBlob(await svgToPng(s.svg, s.width, s.height, 3), `${name}.png`); setOpen(false); } catch (e) { setError((e as Error).message); }
          }}>Image (PNG, print resolution)</button>
          <button type="button" className="min-h-11 rounded px-2 py-1.5 text-left text-[14px] hover:bg-brand-soft" onClick={() => { const s = make(); downloadBlob(new Blob([s.svg], { type: "image/svg+xml" }), `${name}.svg`); setOpen(false); }}>Drawing (SVG)</button>
          {printPdf ? (
            <button type="button" className="min-h-11 rounded px-2 py-1.5 text-left text-[14px] hover:bg-brand-soft" onClick={async () => {
              try { downloadBlob(await printPdf(), `${name}.pdf`); setOpen(false); } catch (e) { setError((e as Error).message); }
            }}>Drawing for print (PDF)</button>
          ) : null}
          {markup ? null : <ExchangeMenuItems plan={plan} levelId={levelId} title={title} onDone={() => setOpen(false)} onDialogChange={setDialogOpen} {...(onCommand ? { onCommand } : {})} {...(projectId ? { projectId } : {})} />}
          {error ? <p role="alert" className="px-1 text-sm text-danger">{error}</p> : null}
        </div>
      ) : null}
    </div>
  );
}
