import { useState } from "react";
import { Button } from "../../../components/ui/button";
import { Card, CardHeader } from "../../../components/ui/card";
import { isApiError } from "../../../lib/api-client";
import { uploadRecording, useMeasurement } from "../api/measurements";
import { usePlanPlaces } from "../api/plan-places";
import { emptyMeta, isoOf, MeasurementMetaFields, pointOf, type MetaValues } from "./measurement-meta-fields";
import { ProgressBar } from "./progress-bar";

const pinFields = (p: { x: number; y: number } | null): Record<string, string> => (p ? { pointX: String(p.x), pointY: String(p.y) } : {});

/** A WAV recording: upload with a progress bar, then the analysis job's progress until it is ready. */
export function RecordingUpload({ projectId, onDone, onClose }: { projectId: string; onDone: (id: string) => void; onClose: () => void }) {
  const places = usePlanPlaces(projectId);
  const [file, setFile] = useState<File | null>(null);
  const [meta, setMeta] = useState<MetaValues>(emptyMeta("Recording", "100"));
  const [sent, setSent] = useState<number | null>(null);
  const [measurementId, setMeasurementId] = useState<string | null>(null);
  const [error, setError] = useState<string | null>(null);
  const [fieldErrors, setFieldErrors] = useState<Record<string, string>>({});
  const job = useMeasurement(projectId, measurementId);

  async function start() {
    if (!file) return setError("Choose a WAV file first.");
    setError(null);
    setFieldErrors({});
    setSent(0);
    try {
      const m = await uploadRecording(projectId, file, { label: meta.label, kind: meta.kind, takenAt: isoOf(meta.takenAt), roomId: meta.roomId, device: meta.device, calibrationDb: meta.calibrationDb || "0", ...pinFields(pointOf(places, meta.roomId)) }, setSent);
      setMeasurementId(m.id);
    } catch (e) {
      setSent(null);
      if (isApiError(e) && e.fieldIssues.length) setFieldErrors(Object.fromEntries(e.fieldIssues.map((i) => [i.path, i.message])));
      setError(e instanceof Error ? e.message : "The upload failed. Nothing was saved.");
    }
  }

  const status = job.data?.status;
  return (
    <Card>
      <CardHeader title="Upload a recording" description="A WAV file (16 or 24-bit, or 32-bit float; mono or stereo; hours long is fine). It is analysed on the server into band levels, a 1 s history and the events above the background." actions={<Button variant="ghost" onClick={onClose}>Close</Button>} />
      <div className="flex flex-col gap-4 p-5">
        <label className="flex flex-col gap-1.5 text-sm font-medium">
          Recording
          <input type="file" accept=".wav,audio/wav,audio/x-wav" className="min-h-11 text-[15px]" data-testid="wav-file" disabled={sent !== null && !error} onChange={(e) => { const f = e.target.files?.[0] ?? null; setFile(f); if (f) setMeta((m) => ({ ...m, label: f.name.replace(/\.[^.]+$/, "").slice(0, 120) || m.label })); }} />
        </label>
        {sent === null ? (
          <>
            <MeasurementMetaFields value={meta} onChange={setMeta} places={places} errors={fieldErrors} showCalibration calibrationHint="Added to the file's level (dB re full scale). Use the value from a calibrator tone; about 100 dB is typical of small recorders, but only a calibration tells." />
            <div><Button onClick={() => void start()} disabled={!file}>Upload and analyse</Button></div>
          </>
        ) : (
          <div className="flex flex-col gap-3" data-testid="recording-progress">
            <ProgressBar value={sent} label="Uploading" />
            {measurementId ? <ProgressBar value={status === "ready" ? 1 : (job.data?.progress ?? 0)} label={status === "ready" ? "Analysed" : "Analysing"} /> : null}
            {status === "failed" ? <p className="text-sm font-medium text-danger">{job.data?.error ?? "The analysis failed."}</p> : null}
            {status === "ready" && measurementId ? <div><Button onClick={() => onDone(measurementId)}>Show the result</Button></div> : null}
          </div>
        )}
        {error ? <p className="text-sm font-medium text-danger" role="alert">{error}</p> : null}
      </div>
    </Card>
  );
}
