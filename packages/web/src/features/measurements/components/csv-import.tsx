import type { CsvPreview } from "@hushmark/schemas";
import { useState } from "react";
import { Button } from "../../../components/ui/button";
import { Card, CardHeader } from "../../../components/ui/card";
import { isApiError } from "../../../lib/api-client";
import { createMeasurement, previewCsv } from "../api/measurements";
import { usePlanPlaces } from "../api/plan-places";
import { emptyMeta, isoOf, MeasurementMetaFields, pointOf, type MetaValues } from "./measurement-meta-fields";
import { formatHz } from "./spectrum-math";

/** A spectrum file: read it, show what could and could not be read, save only on confirmation. */
export function CsvImport({ projectId, onSaved, onClose }: { projectId: string; onSaved: (id: string) => void; onClose: () => void }) {
  const places = usePlanPlaces(projectId);
  const [preview, setPreview] = useState<CsvPreview | null>(null);
  const [meta, setMeta] = useState<MetaValues>(emptyMeta("Spectrum from a file"));
  const [error, setError] = useState<string | null>(null);
  const [fieldErrors, setFieldErrors] = useState<Record<string, string>>({});
  const [busy, setBusy] = useState(false);

  async function read(file: File) {
    setError(null);
    setPreview(null);
    if (file.size > 200_000) return setError("A spectrum file is at most 200 kB; this looks like something else.");
    setMeta((m) => ({ ...m, label: file.name.replace(/\.[^.]+$/, "").slice(0, 120) || m.label }));
    setBusy(true);
    try {
      setPreview(await previewCsv(projectId, await file.text()));
    } catch (e) {
      setError(e instanceof Error ? e.message : "The file could not be read.");
    } finally {
      setBusy(false);
    }
  }

  async function save() {
    if (!preview) return;
    setBusy(true);
    setFieldErrors({});
    try {
      const m = await createMeasurement(projectId, {
        label: meta.label, kind: meta.kind, takenAt: isoOf(meta.takenAt), roomId: meta.roomId || null, point: meta.roomId ? pointOf(places, meta.roomId) : null, device: meta.device, source: "csv", leqDb: preview.leqDb, lmaxDb: preview.lmaxDb,
      });
      onSaved(m.id);
    } catch (e) {
      if (isApiError(e) && e.fieldIssues.length) setFieldErrors(Object.fromEntries(e.fieldIssues.map((i) => [i.path, i.message])));
      setError(e instanceof Error ? e.message : "The measurement was not saved.");
    } finally {
      setBusy(false);
    }
  }

  return (
    <Card>
      <CardHeader title="Add a spectrum from a file" description="A CSV with a header row: a frequency column and a level column in any order, optionally a maximum. Commas or semicolons; decimal commas are fine." actions={<Button variant="ghost" onClick={onClose}>Close</Button>} />
      <div className="flex flex-col gap-4 p-5">
        <label className="flex flex-col gap-1.5 text-sm font-medium">
          Spectrum file
          <input type="file" accept=".csv,.txt,text/csv,text/plain" className="min-h-11 text-[15px]" data-testid="csv-file" onChange={(e) => e.target.files?.[0] && void read(e.target.files[0])} />
        </label>
        {error ? <p className="text-sm font-medium text-danger" role="alert">{error}</p> : null}
        {preview ? (
          <div className="flex flex-col gap-4" data-testid="csv-preview">
            <div className="grid gap-4 md:grid-cols-2">
              <div>
                <h3 className="mb-2 text-sm font-semibold">Readable rows ({preview.rows.length})</h3>
                <div className="max-h-64 overflow-auto rounded-md border border-rule">
                  <table className="w-full text-sm tabular-nums">
                    <thead className="sticky top-0 bg-paper text-left">
                      <tr><th className="px-2 py-1">Line</th><th className="px-2 py-1">Band</th><th className="px-2 py-1">Leq</th><th className="px-2 py-1">Lmax</th></tr>
                    </thead>
                    <tbody>
                      {preview.rows.map((r) => (
                        <tr key={r.line} className="border-t border-rule"><td className="px-2 py-1 text-muted">{r.line}</td><td className="px-2 py-1">{formatHz(r.bandHz)} Hz</td><td className="px-2 py-1">{r.levelDb.toFixed(1)}</td><td className="px-2 py-1">{r.maxDb?.toFixed(1) ?? "—"}</td></tr>
                      ))}
                    </tbody>
                  </table>
                </div>
                {preview.missingBandsHz.length ? <p className="mt-2 text-sm text-muted">No level for {preview.missingBandsHz.map(formatHz).join(", ")} Hz; those bands stay empty.</p> : null}
                {preview.notes.map((n) => <p key={n} className="mt-2 text-sm text-muted">{n}</p>)}
              </div>
              <div>
                <h3 className="mb-2 text-sm font-semibold">Rows that could not be read ({preview.problems.length})</h3>
                {preview.problems.length === 0 ? <p className="text-sm text-good">Every row was read.</p> : (
                  <ul className="max-h-64 overflow-auto rounded-md border border-danger/30 text-sm" data-testid="csv-problems">
                    {preview.problems.map((p, i) => (
                      <li key={i} className="border-b border-rule px-2 py-1.5 last:border-0"><span className="font-semibold">Line {p.line}:</span> {p.reason} <code className="ml-1 text-muted">{p.text}</code></li>
                    ))}
                  </ul>
                )}
              </div>
            </div>
            {preview.ok ? (
              <>
                <MeasurementMetaFields value={meta} onChange={setMeta} places={places} errors={fieldErrors} />
                <div className="flex gap-3">
                  <Button onClick={() => void save()} pending={busy}>Save {preview.rows.length} bands as a measurement</Button>
                  <Button variant="secondary" onClick={() => setPreview(null)}>Discard</Button>
                </div>
              </>
            ) : <p className="text-sm font-medium text-danger">Nothing in this file can be saved. Fix the rows listed and choose it again.</p>}
          </div>
        ) : null}
      </div>
    </Card>
  );
}
