import { BandAnalyzer, type BandSnapshot } from "@hushmark/acoustics";
import { useEffect, useRef, useState } from "react";
import { Button } from "../../../components/ui/button";
import { Card, CardHeader } from "../../../components/ui/card";
import { Input } from "../../../components/ui/field";
import { createMeasurement } from "../api/measurements";
import { usePlanPlaces } from "../api/plan-places";
import { emptyMeta, isoOf, MeasurementMetaFields, pointOf, type MetaValues } from "./measurement-meta-fields";
import { SpectrumChart } from "./spectrum-chart";

// A band the microphone did not hear at all (digital silence) has no level worth keeping.
const inRange = (v: number | null) => (v === null || v < -50 ? null : v);

interface Capture {
  context: AudioContext;
  stream: MediaStream;
  analyzer: BandAnalyzer;
  timer: ReturnType<typeof setInterval>;
}

/**
 * The device microphone through Web Audio, analysed by the same one-third-octave filters as the
 * server (in the page). Shows live bars with peak hold and the A-weighted level; saves the capture's
 * Leq and peak hold as a measurement.
 */
export function LiveAnalyzer({ projectId, onSaved, onClose }: { projectId: string; onSaved: (id: string) => void; onClose: () => void }) {
  const places = usePlanPlaces(projectId);
  const [offset, setOffset] = useState("100");
  const [snap, setSnap] = useState<BandSnapshot | null>(null);
  const [running, setRunning] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const [meta, setMeta] = useState<MetaValues>(emptyMeta("Live capture"));
  const [saving, setSaving] = useState(false);
  const capture = useRef<Capture | null>(null);
  const calibration = Number.isFinite(Number(offset)) ? Number(offset) : 0;

  const stop = () => {
    const c = capture.current;
    if (!c) return;
    clearInterval(c.timer);
    c.stream.getTracks().forEach((t) => t.stop());
    void c.context.close();
    setSnap(c.analyzer.snapshot());
    capture.current = null;
    setRunning(false);
  };
  useEffect(() => stop, []);

  async function start() {
    setError(null);
    try {
      const stream = await navigator.mediaDevices.getUserMedia({ audio: { echoCancellation: false, noiseSuppression: false, autoGainControl: false } });
      const context = new AudioContext();
      const analyzer = new BandAnalyzer({ sampleRateHz: context.sampleRate, calibrationDb: calibration, keepHistory: false });
      const source = context.createMediaStreamSource(stream);
      // A script processor hands over every sample block, so the capture's Leq has no gaps.
      const processor = context.createScriptProcessor(4096, 1, 1);
      processor.onaudioprocess = (e) => analyzer.feed(e.inputBuffer.getChannelData(0));
      const mute = context.createGain();
      mute.gain.value = 0;
      source.connect(processor);
      processor.connect(mute);
      mute.connect(context.destination);
      const timer = setInterval(() => setSnap(analyzer.snapshot()), 200);
      capture.current = { context, stream, analyzer, timer };
      setRunning(true);
    } catch (e) {
      setError(e instanceof DOMException && e.name === "NotAllowedError" ? "The browser was not allowed to use the microphone. Allow it in the address bar and try again." : "No microphone could be opened on this device.");
    }
  }

  async function save() {
    if (!snap) return;
    setSaving(true);
    try {
      const m = await createMeasurement(projectId, {
        label: meta.label, kind: meta.kind, takenAt: isoOf(meta.takenAt), roomId: meta.roomId || null, point: meta.roomId ? pointOf(places, meta.roomId) : null, device: meta.device || "Browser microphone (uncalibrated)", calibrationDb: calibration,
        source: "live", leqDb: snap.leqDb.map(inRange), lmaxDb: snap.lmaxDb.map(inRange),
      });
      onSaved(m.id);
    } catch (e) {
      setError(e instanceof Error ? e.message : "The snapshot was not saved.");
    } finally {
      setSaving(false);
    }
  }

  return (
    <Card>
      <CardHeader title="Live analyzer" description="The microphone of this device, in one-third-octave bands." actions={<Button variant="ghost" onClick={() => { stop(); onClose(); }}>Close</Button>} />
      <div className="flex flex-col gap-4 p-5">
        <p className="rounded-md border border-caution/40 bg-caution/10 px-3 py-2 text-[15px]" role="note">
          Phone and laptop microphones are not calibrated and hear little below about 200 Hz, so bass and hum read too low. Use these levels to compare places and times with the same device, or enter a calibration offset taken from a sound level meter or a calibrator.
        </p>
        <div className="flex flex-wrap items-end gap-3">
          <div className="w-48"><Input label="Calibration offset (dB)" type="number" step="0.5" value={offset} disabled={running} onChange={(e) => setOffset(e.target.value)} /></div>
          {running ? <Button variant="secondary" onClick={stop}>Stop</Button> : <Button onClick={() => void start()}>{snap ? "Start again" : "Start listening"}</Button>}
          <div className="ml-auto text-right" aria-live="off">
            {running || !snap ? (
              <>
                <div className="text-3xl font-semibold tabular-nums" data-testid="live-dba">{snap?.lafDb?.toFixed(1) ?? "—"} <span className="text-base font-normal text-muted">dBA now</span></div>
                <div className="text-sm text-muted tabular-nums">LAeq {snap?.laeqDb?.toFixed(1) ?? "—"} dBA over {snap ? Math.round(snap.durationS) : 0} s</div>
              </>
            ) : (
              <>
                <div className="text-3xl font-semibold tabular-nums" data-testid="live-dba">{snap.laeqDb?.toFixed(1) ?? "—"} <span className="text-base font-normal text-muted">dBA LAeq</span></div>
                <div className="text-sm text-muted tabular-nums">over the {Math.round(snap.durationS)} s captured</div>
              </>
            )}
          </div>
        </div>
        {error ? <p className="text-sm font-medium text-danger" role="alert">{error}</p> : null}
        {snap ? <SpectrumChart title="Live band levels with peak hold" series={[{ label: running ? "Now (fast)" : "Leq of the capture", colour: "#1f7a74", leqDb: running ? snap.fastDb : snap.leqDb, lmaxDb: snap.lmaxDb }]} showNc={false} /> : null}
        {snap && !running ? (
          <div className="flex flex-col gap-3 border-t border-rule pt-4">
            <h3 className="text-sm font-semibold">Save this capture (Leq over {Math.round(snap.durationS)} s and the peak hold)</h3>
            <MeasurementMetaFields value={meta} onChange={setMeta} places={places} />
            <div><Button onClick={() => void save()} pending={saving}>Save as a measurement</Button></div>
          </div>
        ) : null}
      </div>
    </Card>
  );
}
