import { useState } from "react";
import { Badge } from "../../../components/ui/badge";
import { Card, CardHeader } from "../../../components/ui/card";
import { ErrorState } from "../../../components/ui/error-state";
import { Spinner } from "../../../components/ui/spinner";
import { audioUrl, csvUrl, useMeasurement } from "../api/measurements";
import { usePlanPlaces } from "../api/plan-places";
import { MeasurementEdit } from "./measurement-edit";
import { PhotosPanel } from "./photos-panel";
import { ProgressBar } from "./progress-bar";
import { SpectrumChart } from "./spectrum-chart";
import { formatClock, formatDb, formatHz, kindLabels } from "./spectrum-math";
import { TimeHistoryChart } from "./time-history-chart";

/** One measurement: its spectrum with peak hold, single figures, time history, events and photos. */
export function MeasurementDetail({ projectId, id, canEdit, onDelete }: { projectId: string; id: string; canEdit: boolean; onDelete: () => void }) {
  const q = useMeasurement(projectId, id);
  const [playing, setPlaying] = useState<number | null>(null);
  const [editing, setEditing] = useState(false);
  const places = usePlanPlaces(projectId);
  if (q.isPending) return <Card className="p-6"><Spinner label="Loading the measurement" /></Card>;
  if (q.isError) return <ErrorState title="The measurement did not load" error={q.error} onRetry={() => void q.refetch()} />;
  const m = q.data;
  const events = m.events ?? [];
  const clip = playing !== null ? events[playing] : undefined;
  return (
    <Card>
      <CardHeader
        title={m.label}
        description={`${kindLabels[m.kind]} · ${new Date(m.takenAt).toLocaleString("en-GB", { dateStyle: "medium", timeStyle: "short" })}${m.roomId ? ` · ${places.nameOf(m.roomId)}` : ""}${m.device ? ` · ${m.device}` : ""}`}
        actions={
          <div className="flex items-center gap-2">
            {m.status === "ready" ? <a className="inline-flex min-h-11 items-center rounded-md border border-rule px-3 text-sm font-medium hover:border-muted" href={csvUrl(projectId, m.id)} download>Export CSV</a> : null}
            {canEdit && m.status === "ready" && !editing ? <button type="button" className="inline-flex min-h-11 items-center rounded-md border border-rule px-3 text-sm font-medium hover:border-muted" onClick={() => setEditing(true)}>Edit</button> : null}
            {canEdit ? <button type="button" className="inline-flex min-h-11 items-center rounded-md border border-danger/40 px-3 text-sm font-medium text-danger hover:bg-danger/5" onClick={onDelete}>Delete</button> : null}
          </div>
        }
      />
      <div className="flex flex-col gap-5 p-5">
        {editing ? <MeasurementEdit projectId={projectId} measurement={m} onDone={() => setEditing(false)} /> : null}
        {m.status === "processing" ? <ProgressBar value={m.progress} label="Analysing the recording" /> : null}
        {m.status === "failed" ? <p className="text-sm font-medium text-danger">{m.error}</p> : null}
        {m.status === "ready" ? (
          <>
            <SpectrumChart title={`Band levels of ${m.label}`} series={[{ label: "Leq", colour: "#1f7a74", leqDb: m.leqDb, lmaxDb: m.lmaxDb }]} />
            <dl className="grid grid-cols-2 gap-3 text-sm sm:grid-cols-4">
              {m.summary ? (
                <>
                  <div><dt className="text-muted">LAeq</dt><dd className="text-lg font-semibold tabular-nums">{formatDb(m.summary.laeqDb, "dBA")}</dd></div>
                  <div><dt className="text-muted">LAFmax</dt><dd className="text-lg font-semibold tabular-nums">{formatDb(m.summary.lafmaxDb, "dBA")}</dd></div>
                  <div><dt className="text-muted">LA10 / LA90</dt><dd className="text-lg font-semibold tabular-nums">{formatDb(m.summary.la10Db, "")}/ {formatDb(m.summary.la90Db, "dBA")}</dd></div>
                  <div><dt className="text-muted">Length</dt><dd className="text-lg font-semibold tabular-nums">{m.summary.durationS !== null ? formatClock(m.summary.durationS) : "—"}</dd></div>
                </>
              ) : null}
              <div><dt className="text-muted">Calibration offset</dt><dd className="tabular-nums">{m.calibrationDb.toFixed(1)} dB</dd></div>
            </dl>
          </>
        ) : null}
        {m.history ? (
          <section className="flex flex-col gap-3" aria-label="Time history">
            <h3 className="text-base font-semibold">Over time</h3>
            <TimeHistoryChart history={m.history} events={events} onPick={setPlaying} />
            {events.length === 0 ? <p className="text-sm text-muted">No events rose clearly above the background.</p> : (
              <div className="overflow-x-auto">
                <table className="w-full text-sm tabular-nums" data-testid="events-table">
                  <thead className="text-left text-muted"><tr><th className="py-1 pr-3">#</th><th className="pr-3">Starts</th><th className="pr-3">Lasts</th><th className="pr-3">Peak</th><th className="pr-3">Strongest band</th><th /></tr></thead>
                  <tbody>
                    {events.map((e, i) => (
                      <tr key={i} className="border-t border-rule">
                        <td className="py-1 pr-3">{i + 1}</td>
                        <td className="pr-3">{formatClock(e.startS)}</td>
                        <td className="pr-3">{e.durationS} s</td>
                        <td className="pr-3">{e.peakDb.toFixed(1)} dBA</td>
                        <td className="pr-3">{e.dominantBandHz ? `${formatHz(e.dominantBandHz)} Hz` : "—"}</td>
                        <td><button type="button" className="min-h-11 px-2 font-medium text-brand-strong hover:underline" onClick={() => setPlaying(i)}>Play</button></td>
                      </tr>
                    ))}
                  </tbody>
                </table>
              </div>
            )}
            {clip && m.hasRecording ? (
              <div className="flex flex-wrap items-center gap-3 rounded-md bg-paper px-3 py-2">
                <Badge tone="brand">Event {playing! + 1}</Badge>
                <audio controls autoPlay src={audioUrl(projectId, m.id, Math.max(0, clip.startS - 1), Math.min(120, clip.durationS + 2))} className="h-10">
                  Your browser cannot play this excerpt.
                </audio>
              </div>
            ) : null}
          </section>
        ) : null}
        <PhotosPanel projectId={projectId} measurementId={m.id} canEdit={canEdit} places={places} />
      </div>
    </Card>
  );
}
