import { analysisResultSchema, type AnalysisResult, type Measurement } from "@hushmark/schemas";
import { useState } from "react";
import { Button } from "../../../components/ui/button";
import { Card, CardHeader } from "../../../components/ui/card";
import { api } from "../../../lib/api-client";
import { usePlan } from "../../projects/api/get-plan";
import { SpectrumChart } from "./spectrum-chart";
import { aWeightedTotal, BANDS_HZ, formatHz, SERIES_COLOURS } from "./spectrum-math";

function differenceName(a: Measurement, b: Measurement): string {
  const kinds = new Set([a.kind, b.kind]);
  if (kinds.has("source_side") && kinds.has("receiver_side")) return "Measured level difference (source side − receiver side)";
  if (kinds.has("before_work") && kinds.has("after_work")) return "Improvement (before − after the work)";
  return `Difference (${a.label} − ${b.label})`;
}

/** Two or more measurements on one chart; for two, the difference per band and, for a source and a receiver room, the predicted one. */
export function Comparison({ projectId, measurements }: { projectId: string; measurements: Measurement[] }) {
  const plan = usePlan(projectId);
  const [predicted, setPredicted] = useState<AnalysisResult | null>(null);
  const [predictError, setPredictError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  let [a, b] = measurements;
  // Source before receiver and before before after, so the difference is positive when it helps.
  if (a && b && ((a.kind === "receiver_side" && b.kind === "source_side") || (a.kind === "after_work" && b.kind === "before_work"))) [a, b] = [b, a];
  const diff = a && b && measurements.length === 2 ? BANDS_HZ.map((_, i) => (a.leqDb[i] != null && b.leqDb[i] != null ? Math.round((a.leqDb[i]! - b.leqDb[i]!) * 10) / 10 : null)) : null;
  const da = a && b ? (aWeightedTotal(a.leqDb) ?? 0) - (aWeightedTotal(b.leqDb) ?? 0) : null;
  const canPredict = Boolean(a && b && measurements.length === 2 && a.kind === "source_side" && b.kind === "receiver_side" && a.roomId && b.roomId && a.roomId !== b.roomId && plan.data);

  async function predict() {
    if (!a || !b || !plan.data) return;
    setBusy(true);
    setPredictError(null);
    try {
      // Bands the source measurement lacks are sent at the lowest level the analysis takes, so they add nothing.
      const levelsDb = a.leqDb.map((v) => (v === null ? -20 : Math.min(160, Math.max(-20, v))));
      setPredicted(await api.post(`/projects/${encodeURIComponent(projectId)}/analyses`, { planVersion: plan.data.version, source: { kind: "airborne", spaceId: a.roomId, spectrum: { kind: "custom", levelsDb } }, receiverId: b.roomId }, analysisResultSchema));
    } catch (e) {
      setPredictError(e instanceof Error ? e.message : "The prediction could not be made.");
    } finally {
      setBusy(false);
    }
  }
  const predictedDiff = predicted && a ? predicted.receiver.levelsDb.map((v, i) => (a.leqDb[i] == null ? null : Math.round((a.leqDb[i]! - v) * 10) / 10)) : null;
  return (
    <Card>
      <CardHeader title="Comparison" description={`${measurements.length} measurements`} />
      <div className="flex flex-col gap-4 p-5">
        <SpectrumChart
          title="Compared band levels"
          series={[
            ...measurements.map((m, i) => ({ label: m.label, colour: SERIES_COLOURS[i % SERIES_COLOURS.length]!, leqDb: m.leqDb })),
            ...(predicted ? [{ label: `Predicted in ${predicted.receiver.name}`, colour: "#6b7080", leqDb: predicted.receiver.levelsDb }] : []),
          ]}
        />
        {diff && a && b ? (
          <div className="flex flex-col gap-2">
            <h3 className="text-sm font-semibold">{differenceName(a, b)}: {da !== null ? `${da.toFixed(1)} dBA overall` : ""}</h3>
            <div className="overflow-x-auto">
              <table className="text-sm tabular-nums" data-testid="difference-table">
                <tbody>
                  <tr><th className="sticky left-0 bg-panel pr-2 text-left font-normal text-muted">Hz</th>{BANDS_HZ.map((f) => <th key={f} className="px-1.5 text-right font-normal text-muted">{formatHz(f)}</th>)}</tr>
                  <tr><th className="sticky left-0 bg-panel pr-2 text-left font-medium">Measured</th>{diff.map((d, i) => <td key={i} className="px-1.5 text-right">{d === null ? "—" : d.toFixed(1)}</td>)}</tr>
                  {predictedDiff ? <tr className="text-muted"><th className="sticky left-0 bg-panel pr-2 text-left font-medium">Predicted</th>{predictedDiff.map((d, i) => <td key={i} className="px-1.5 text-right">{d === null ? "—" : d.toFixed(1)}</td>)}</tr> : null}
                </tbody>
              </table>
            </div>
            {predicted ? (
              <p className="text-sm">Predicted from the plan (version {predicted.planVersion}) with this source spectrum — {predicted.receiver.dba.toFixed(1)} dBA expected in {predicted.receiver.name}, measured {aWeightedTotal(b.leqDb)?.toFixed(1) ?? "—"} dBA.</p>
            ) : canPredict ? (
              <div><Button variant="secondary" pending={busy} onClick={() => void predict()}>Compare with the prediction from the plan</Button></div>
            ) : (
              <p className="text-sm text-muted">Pin a source-side and a receiver-side measurement to two rooms of the plan to compare this difference with the predicted one.</p>
            )}
            {predictError ? <p className="text-sm font-medium text-danger" role="alert">{predictError}</p> : null}
          </div>
        ) : null}
      </div>
    </Card>
  );
}
