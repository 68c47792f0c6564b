import type { Scenario } from "@hushmark/schemas";
import { Badge } from "../../../components/ui/badge";
import { Button } from "../../../components/ui/button";
import { flagLabels, formatMoney } from "../../price-book/components/money";

/** Scenarios side by side: the same rows for each, so they can be read across. */
export function ScenarioComparison({ scenarios, currency, onEdit, onPropose, proposing }: { scenarios: Scenario[]; currency: string; onEdit: (s: Scenario) => void; onPropose: (s: Scenario) => void; proposing: string | null }) {
  if (scenarios.length === 0) return <p className="text-sm text-muted">No scenarios yet.</p>;
  const rows: [string, (s: Scenario) => React.ReactNode][] = [
    ["Upgrades", (s) => s.items.length],
    ["Received level", (s) => (s.evaluation ? `${s.evaluation.after.dba.toFixed(1)} dBA` : "—")],
    ["Gain", (s) => (s.evaluation ? `−${s.evaluation.after.gainDb.toFixed(1)} dB` : "—")],
    ["NC", (s) => s.evaluation?.after.nc ?? "—"],
    ["Target", (s) => (s.evaluation?.target ? (s.evaluation.target.met ? <Badge tone="good">met</Badge> : <Badge tone="caution">short {s.evaluation.target.shortfallDb.toFixed(1)} dB</Badge>) : "—")],
    ["Cost", (s) => (s.evaluation ? formatMoney(s.evaluation.totals.cost, currency) : "—")],
    ["Floor area lost", (s) => (s.evaluation ? `${s.evaluation.totals.floorAreaLostM2.toFixed(2)} m²` : "—")],
    ["Labour", (s) => (s.evaluation ? `${s.evaluation.totals.labourHours} h` : "—")],
    ["Gives up", (s) => s.evaluation?.flags.map((f) => flagLabels[f] ?? f).join(", ") || "nothing"],
    ["Cautions", (s) => s.evaluation?.cautions.length ?? 0],
  ];
  return (
    <div className="overflow-x-auto">
      <table className="w-full min-w-[520px] text-sm tabular-nums">
        <thead>
          <tr className="border-b border-rule text-left">
            <th className="py-2 pr-3 font-medium text-muted" scope="col">Scenario</th>
            {scenarios.map((s) => <th key={s.id} scope="col" className="py-2 pr-3 font-semibold">{s.name}</th>)}
          </tr>
        </thead>
        <tbody>
          {rows.map(([label, cell]) => (
            <tr key={label} className="border-b border-rule/60">
              <th scope="row" className="py-1.5 pr-3 text-left font-normal text-muted">{label}</th>
              {scenarios.map((s) => <td key={s.id} className="py-1.5 pr-3">{cell(s)}</td>)}
            </tr>
          ))}
          <tr>
            <td />
            {scenarios.map((s) => (
              <td key={s.id} className="py-2 pr-3">
                <div className="flex flex-wrap gap-1">
                  <Button variant="secondary" className="min-h-9 px-3 text-sm" onClick={() => onEdit(s)}>Edit</Button>
                  <Button className="min-h-9 px-3 text-sm" pending={proposing === s.id} onClick={() => onPropose(s)}>Make proposal</Button>
                </div>
              </td>
            ))}
          </tr>
        </tbody>
      </table>
    </div>
  );
}
