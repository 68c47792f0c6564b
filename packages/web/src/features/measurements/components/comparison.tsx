import type { Measurement } from "@hushmark/schemas";
import { Card, CardHeader } from "../../../components/ui/card";
import { SpectrumChart } from "./spectrum-chart";
import { aWeightedTotal, BANDS_HZ, formatHz, SERIES_COLOURS } from "./spectrum-math";

function differenceName(a: Measurement, b: Measurement): string {
  const kinds = new Set([a.kind, b.kind]);
  if (kinds.has("source_side") && kinds.has("receiver_side")) return "Measured level difference (source side − receiver side)";
  if (kinds.has("before_work") && kinds.has("after_work")) return "Improvement (before − after the work)";
  return `Difference (${a.label} − ${b.label})`;
}

/** Two or more measurements on one chart; for two, the difference per band. */
export function Comparison({ measurements }: { measurements: Measurement[] }) {
  let [a, b] = measurements;
  // Source before receiver and before before after, so the difference is positive when it helps.
  if (a && b && ((a.kind === "receiver_side" && b.kind === "source_side") || (a.kind === "after_work" && b.kind === "before_work"))) [a, b] = [b, a];
  const diff = a && b && measurements.length === 2 ? BANDS_HZ.map((_, i) => (a.leqDb[i] != null && b.leqDb[i] != null ? Math.round((a.leqDb[i]! - b.leqDb[i]!) * 10) / 10 : null)) : null;
  const da = a && b ? (aWeightedTotal(a.leqDb) ?? 0) - (aWeightedTotal(b.leqDb) ?? 0) : null;
  return (
    <Card>
      <CardHeader title="Comparison" description={`${measurements.length} measurements`} />
      <div className="flex flex-col gap-4 p-5">
        <SpectrumChart title="Compared band levels" series={measurements.map((m, i) => ({ label: m.label, colour: SERIES_COLOURS[i % SERIES_COLOURS.length]!, leqDb: m.leqDb }))} />
        {diff && a && b ? (
          <div className="flex flex-col gap-2">
            <h3 className="text-sm font-semibold">{differenceName(a, b)}: {da !== null ? `${da.toFixed(1)} dBA overall` : ""}</h3>
            <div className="overflow-x-auto">
              <table className="text-sm tabular-nums" data-testid="difference-table">
                <tbody>
                  <tr>{BANDS_HZ.map((f) => <th key={f} className="px-1.5 text-right font-normal text-muted">{formatHz(f)}</th>)}</tr>
                  <tr>{diff.map((d, i) => <td key={i} className="px-1.5 text-right">{d === null ? "—" : d.toFixed(1)}</td>)}</tr>
                </tbody>
              </table>
            </div>
            <p className="text-sm text-muted">The analysis in Paths gives the predicted difference between the same rooms to set beside this one.</p>
          </div>
        ) : null}
      </div>
    </Card>
  );
}
