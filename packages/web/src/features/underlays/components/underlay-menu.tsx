import { useRef, useState } from "react";
import { addUnderlay, type EditorStore } from "@hushmark/editor-core";
import type { Plan } from "@hushmark/floorplan";
import type { UnderlayFile } from "@hushmark/schemas";
import { useDeleteUnderlayFile, useUnderlayFiles, useUploadUnderlay } from "../api/underlays";
import { dropPlacement, newUnderlayId, type DropView } from "../model/placement";
import { UNDERLAY_ACCEPT } from "../model/prepare-file";
import type { UnderlayUi } from "../model/underlay-ui";
import { useUnderlayFilePicker } from "../model/use-underlay-file";
import { UnderlayRow } from "./underlay-row";

const item = "min-h-11 rounded px-2 text-left text-[14px] hover:bg-brand-soft disabled:opacity-50";

/**
 * The Sketch's "Underlay" menu: bring in a drawing to trace (image, HEIC photo or a PDF page),
 * then scale, square, move, fade, lock, hide or remove it. Every change is a plan command, so it
 * is undone and saved like any other edit.
 */
export function UnderlayMenu({ projectId, plan, levelId, store, ui, view }: { projectId: string; plan: Plan; levelId: string; store: EditorStore; ui: UnderlayUi; view: DropView }) {
  const [open, setOpen] = useState(false);
  const files = useUnderlayFiles(projectId, open);
  const upload = useUploadUnderlay(projectId);
  const remove = useDeleteUnderlayFile(projectId);
  const inputRef = useRef<HTMLInputElement>(null);
  const [confirmDelete, setConfirmDelete] = useState<string | null>(null);
  const [error, setError] = useState<string | null>(null);
  const here = (plan.underlays ?? []).filter((u) => u.levelId === levelId);
  const placedIds = new Set((plan.underlays ?? []).map((u) => u.fileId));

  const place = (f: Pick<UnderlayFile, "id" | "name" | "widthPx" | "heightPx">) => {
    const at = dropPlacement(f.widthPx, f.heightPx, view);
    store.run(addUnderlay({ id: newUnderlayId(store.plan, f.id), fileId: f.id, levelId, name: f.name, widthPx: f.widthPx, heightPx: f.heightPx, ...at }));
  };
  const picker = useUnderlayFilePicker(async (prepared) => {
    const saved = await upload.mutateAsync(prepared);
    place(saved);
  });
  const busy = picker.busy || upload.isPending;
  const shownError = error ?? picker.error;

  return (
    <div className="relative">
      <button type="button" aria-expanded={open} onClick={() => setOpen((o) => !o)} className="min-h-9 rounded-md px-2 text-[14px] font-medium hover:bg-ink/5">Underlay{here.length ? ` (${here.length})` : ""}</button>
      {open ? (
        <div role="dialog" aria-label="Drawings to trace" className="absolute left-0 top-10 z-30 flex max-h-[70vh] w-[22rem] flex-col gap-2 overflow-y-auto rounded-md border border-rule bg-panel p-3 shadow-lg">
          <p className="text-sm text-muted">A plan, a photo of one or a PDF page to draw over. It stays with this project and is not sent anywhere else.</p>
          <input ref={inputRef} type="file" accept={UNDERLAY_ACCEPT} className="sr-only" aria-label="Drawing to trace" data-testid="underlay-file" tabIndex={-1}
            onChange={(e) => { const f = e.target.files?.[0]; e.target.value = ""; setError(null); if (f) void picker.choose(f); }} />
          <button type="button" className={`${item} border border-dashed border-rule`} disabled={busy} onClick={() => inputRef.current?.click()}>
            {busy ? picker.stage ?? "Uploading…" : "Add a drawing (image, HEIC photo or PDF)…"}
          </button>
          {picker.pdf ? (
            <form className="flex flex-wrap items-end gap-2 rounded-md bg-brand-soft p-2" onSubmit={(e) => { e.preventDefault(); void picker.renderChosenPage(); }}>
              <label className="flex flex-col gap-1 text-sm font-medium">
                <span>This PDF has {picker.pdf.pageCount} pages. Page</span>
                <input type="number" min={1} max={picker.pdf.pageCount} value={picker.page} onChange={(e) => picker.setPage(Number(e.target.value))} className="min-h-9 w-20 rounded-md border border-rule bg-panel px-2" />
              </label>
              <button type="submit" className="min-h-9 rounded-md bg-brand px-3 text-[14px] font-medium text-white" disabled={busy}>Use this page</button>
              <button type="button" className="min-h-9 rounded-md px-2 text-[14px]" onClick={picker.reset}>Cancel</button>
            </form>
          ) : null}
          {shownError ? <p role="alert" className="rounded-md bg-danger/10 px-2 py-1.5 text-sm text-danger">{shownError}</p> : null}
          {upload.error ? <p role="alert" className="rounded-md bg-danger/10 px-2 py-1.5 text-sm text-danger">{upload.error.message}</p> : null}
          {here.length ? (
            <ul className="flex flex-col gap-2" aria-label="On this level">
              {here.map((u) => <UnderlayRow key={u.id} underlay={u} store={store} ui={ui} unit={plan.displayUnit} onPick={() => setOpen(false)} />)}
            </ul>
          ) : <p className="text-sm text-muted">No drawing on this level yet.</p>}
          {files.data?.some((f) => !here.some((u) => u.fileId === f.id)) ? (
            <div className="flex flex-col gap-1 border-t border-rule pt-2">
              <h3 className="text-sm font-semibold">Uploaded to this project</h3>
              {files.data.filter((f) => !here.some((u) => u.fileId === f.id)).map((f) => (
                <div key={f.id} className="flex flex-wrap items-center gap-2 text-[14px]">
                  <span className="min-w-0 flex-1 truncate" title={f.name}>{f.name || "Drawing"}{f.page ? `, page ${f.page}` : ""}</span>
                  <button type="button" className="min-h-9 rounded-md px-2 text-[13px] hover:bg-brand-soft" onClick={() => place(f)}>Place here</button>
                  {placedIds.has(f.id) ? null : confirmDelete === f.id ? (
                    <button type="button" className="min-h-9 rounded-md px-2 text-[13px] font-medium text-danger hover:bg-danger/5" onClick={() => { setConfirmDelete(null); remove.mutate(f.id, { onError: (e) => setError(e.message) }); }}>Delete for good</button>
                  ) : (
                    <button type="button" className="min-h-9 rounded-md px-2 text-[13px] text-danger hover:bg-danger/5" onClick={() => setConfirmDelete(f.id)}>Delete…</button>
                  )}
                </div>
              ))}
            </div>
          ) : null}
        </div>
      ) : null}
    </div>
  );
}
