import { useQueryClient } from "@tanstack/react-query";
import { useState } from "react";
import { useSearchParams } from "react-router-dom";
import { Badge } from "../../components/ui/badge";
import { Button } from "../../components/ui/button";
import { Card, CardHeader } from "../../components/ui/card";
import { ErrorState } from "../../components/ui/error-state";
import { PageLoading } from "../../components/ui/spinner";
import { useCurrentMe } from "../auth/components/use-current-me";
import { deleteMeasurement, measurementKeys, useMeasurements } from "./api/measurements";
import { usePlanPlaces } from "./api/plan-places";
import { PinsMap } from "./components/pins-map";
import { Comparison } from "./components/comparison";
import { CsvImport } from "./components/csv-import";
import { LiveAnalyzer } from "./components/live-analyzer";
import { MeasurementDetail } from "./components/measurement-detail";
import { RecordingUpload } from "./components/recording-upload";
import { aWeightedTotal, kindLabels } from "./components/spectrum-math";

type Panel = "csv" | "recording" | "live" | null;

/** The Measure section: the project's measurements, the ways to add one, and the views. */
export default function MeasureSection({ projectId }: { projectId: string }) {
  const me = useCurrentMe();
  const canEdit = me.membership.role === "owner" || me.membership.role === "surveyor";
  const list = useMeasurements(projectId);
  const queryClient = useQueryClient();
  const [panel, setPanel] = useState<Panel>(null);
  // A link from a pin on the Sketch opens its measurement (?measurement=<id>).
  const [searchParams] = useSearchParams();
  const [selected, setSelected] = useState<string | null>(() => searchParams.get("measurement"));
  const [compare, setCompare] = useState<string[]>([]);
  const places = usePlanPlaces(projectId);

  if (list.isPending) return <PageLoading label="Opening the measurements" />;
  if (list.isError) return <ErrorState title="The measurements did not load" error={list.error} onRetry={() => void list.refetch()} />;
  const measurements = list.data;
  const current = (selected && measurements.some((m) => m.id === selected) ? selected : null) ?? measurements[measurements.length - 1]?.id ?? null;
  const refresh = () => queryClient.invalidateQueries({ queryKey: measurementKeys.all });
  const added = (id: string) => {
    void refresh();
    setSelected(id);
    setPanel(null);
  };
  const compared = measurements.filter((m) => compare.includes(m.id) && m.status === "ready");

  return (
    <div className="flex flex-col gap-4">
      {canEdit ? (
        <div className="flex flex-wrap gap-2" role="toolbar" aria-label="Add a measurement">
          <Button variant={panel === "csv" ? "primary" : "secondary"} onClick={() => setPanel(panel === "csv" ? null : "csv")}>Add a spectrum file</Button>
          <Button variant={panel === "recording" ? "primary" : "secondary"} onClick={() => setPanel(panel === "recording" ? null : "recording")}>Upload a recording</Button>
          <Button variant={panel === "live" ? "primary" : "secondary"} onClick={() => setPanel(panel === "live" ? null : "live")}>Live analyzer</Button>
        </div>
      ) : null}
      {panel === "csv" ? <CsvImport projectId={projectId} onSaved={added} onClose={() => setPanel(null)} /> : null}
      {panel === "recording" ? <RecordingUpload projectId={projectId} onDone={added} onClose={() => { setPanel(null); void refresh(); }} /> : null}
      {panel === "live" ? <LiveAnalyzer projectId={projectId} onSaved={added} onClose={() => setPanel(null)} /> : null}

      <div className="grid gap-4 lg:grid-cols-[20rem_1fr]">
        <Card className="self-start">
          <CardHeader title="Measurements" description={measurements.length ? "Tick two or more to compare." : undefined} />
          {measurements.length === 0 ? (
            <p className="p-5 text-[15px] text-muted">Nothing measured yet. Add a spectrum file, upload a recording or use the live analyzer.</p>
          ) : (
            <ul className="divide-y divide-rule" data-testid="measurement-list">
              {measurements.map((m) => (
                <li key={m.id} className={`flex items-start gap-3 px-4 py-3 ${m.id === current ? "bg-brand-soft" : ""}`}>
                  <input type="checkbox" className="mt-1 size-5" aria-label={`Compare ${m.label}`} checked={compare.includes(m.id)} disabled={m.status !== "ready"} onChange={(e) => setCompare(e.target.checked ? [...compare, m.id] : compare.filter((c) => c !== m.id))} />
                  <button type="button" className="flex min-h-11 flex-1 flex-col items-start text-left" onClick={() => setSelected(m.id)} aria-current={m.id === current || undefined}>
                    <span className="font-medium">{m.label}</span>
                    <span className="flex flex-wrap items-center gap-2 text-sm text-muted">
                      {kindLabels[m.kind]} · {new Date(m.takenAt).toLocaleDateString("en-GB", { day: "numeric", month: "short" })}
                      {m.status === "processing" ? <Badge tone="caution">Analysing {Math.round(m.progress * 100)} %</Badge> : null}
                      {m.status === "failed" ? <Badge tone="danger">Failed</Badge> : null}
                      {m.status === "ready" ? <span className="tabular-nums text-ink">{(m.summary?.laeqDb ?? aWeightedTotal(m.leqDb))?.toFixed(1) ?? "—"} dBA</span> : null}
                    </span>
                  </button>
                </li>
              ))}
            </ul>
          )}
        </Card>
        <div className="flex min-w-0 flex-col gap-4">
          {measurements.some((m) => m.point) ? <PinsMap places={places} measurements={measurements} selected={current} onSelect={setSelected} /> : null}
          {compared.length >= 2 ? <Comparison projectId={projectId} measurements={compared} /> : null}
          {current ? (
            <MeasurementDetail
              key={current}
              projectId={projectId}
              id={current}
              canEdit={canEdit}
              onDelete={() => {
                if (!window.confirm("Delete this measurement and its recording and photos?")) return;
                void deleteMeasurement(projectId, current).then(() => {
                  setSelected(null);
                  setCompare(compare.filter((c) => c !== current));
                  return refresh();
                });
              }}
            />
          ) : null}
        </div>
      </div>
    </div>
  );
}
