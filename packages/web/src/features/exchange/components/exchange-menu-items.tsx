import { useState } from "react";
import type { Command } from "@hushmark/editor-core";
import type { Plan } from "@hushmark/floorplan";
import { downloadFile } from "../model/download-file";
import { dxfFile, geoJsonFile, planDocumentFile, scheduleFile } from "../model/exchange-files";
import { DxfImportDialog } from "./dxf-import-dialog";

const item = "min-h-11 rounded px-2 text-left text-[14px] hover:bg-brand-soft";

/**
 * Export menu entries for other programs: the shown level as DXF and GeoJSON, the element
 * schedule as CSV, the plan document; and, where the editor lets it edit, a DXF import.
 */
export function ExchangeMenuItems({ plan, levelId, title, onCommand, onDone }: { plan: Plan; levelId: string; title: string; onCommand?: (cmd: Command) => void; onDone?: () => void }) {
  const [note, setNote] = useState<string | null>(null);
  const [importing, setImporting] = useState(false);
  const done = () => onDone?.();
  return (
    <>
      <button type="button" className={item} onClick={() => { downloadFile(dxfFile(plan, levelId, title)); done(); }}>CAD drawing of this level (DXF)</button>
      <button type="button" className={item} onClick={() => {
        const f = geoJsonFile(plan, levelId, title);
        downloadFile(f);
        setNote(f.frame === "local" ? "No site location is set, so the map file uses Hushmark's local frame: lengths and areas hold, positions are not real places." : null);
      }}>Map data of this level (GeoJSON)</button>
      <button type="button" className={item} onClick={() => { downloadFile(scheduleFile(plan, title)); done(); }}>Element schedule (CSV)</button>
      <button type="button" className={item} onClick={() => { downloadFile(planDocumentFile(plan, title)); done(); }}>Plan document (JSON)</button>
      {onCommand ? <button type="button" className={item} onClick={() => setImporting(true)}>Bring in a CAD drawing (DXF)…</button> : null}
      {note ? <p className="px-1 text-xs text-muted">{note}</p> : null}
      {onCommand ? <DxfImportDialog open={importing} onClose={() => setImporting(false)} plan={plan} levelId={levelId} onCommand={onCommand} /> : null}
    </>
  );
}
