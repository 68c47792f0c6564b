import type { PriceBookItem, ScenarioEvaluation, ScenarioItem } from "@hushmark/schemas";
import { Button } from "../../../components/ui/button";
import { formatMoney } from "../../price-book/components/money";

/** The scenario being put together: its name and upgrades, saved to be evaluated by the engine. */
export function ScenarioBuilder({ name, items, book, elementNames, onName, onRemove, onSave, saving, error }: {
  name: string;
  items: ScenarioItem[];
  book: Map<string, PriceBookItem>;
  elementNames: Map<string, string>;
  onName: (v: string) => void;
  onRemove: (index: number) => void;
  onSave: () => void;
  saving: boolean;
  error: string | null;
}) {
  return (
    <div className="flex flex-col gap-3">
      <label className="flex flex-col gap-1 text-sm font-medium">
        Scenario name
        <input className="min-h-11 rounded-md border border-rule bg-panel px-3 text-[15px]" value={name} onChange={(e) => onName(e.target.value)} />
      </label>
      {items.length === 0 ? <p className="text-sm text-muted">Add upgrades from the list of weak links or by picking an element on the plan, or run “Best within limits” and keep its answer.</p> : null}
      <ol className="flex flex-col gap-1.5">
        {items.map((it, i) => (
          <li key={`${it.priceBookItemId}-${it.elementId}-${i}`} className="flex items-center justify-between gap-2 rounded-md border border-rule px-3 py-1.5 text-sm">
            <span>
              <span className="font-medium">{book.get(it.priceBookItemId)?.name ?? "Removed upgrade"}</span> on {elementNames.get(it.elementId) ?? it.elementId}
            </span>
            <Button variant="ghost" className="min-h-9 px-2 text-sm" onClick={() => onRemove(i)} aria-label={`Remove ${book.get(it.priceBookItemId)?.name ?? "upgrade"}`}>
              Remove
            </Button>
          </li>
        ))}
      </ol>
      {error ? <p role="alert" className="text-sm font-medium text-danger">{error}</p> : null}
      <div>
        <Button onClick={onSave} pending={saving} disabled={!name.trim() || items.length === 0}>
          Save and evaluate
        </Button>
      </div>
    </div>
  );
}

export function EvaluationSummary({ ev, currency }: { ev: ScenarioEvaluation; currency: string }) {
  return (
    <dl className="grid grid-cols-2 gap-x-4 gap-y-1 text-sm tabular-nums sm:grid-cols-4">
      <dt className="text-muted">In {ev.receiver.name}</dt>
      <dd>{ev.before.dba.toFixed(1)} → <strong>{ev.after.dba.toFixed(1)} dBA</strong></dd>
      <dt className="text-muted">NC</dt>
      <dd>{ev.before.nc} → <strong>{ev.after.nc}</strong>{ev.target ? (ev.target.met ? " (target met)" : ` (short by ${ev.target.shortfallDb.toFixed(1)} dB)`) : ""}</dd>
      <dt className="text-muted">Cost</dt>
      <dd>{formatMoney(ev.totals.cost, currency)}</dd>
      <dt className="text-muted">Labour · floor lost</dt>
      <dd>{ev.totals.labourHours} h · {ev.totals.floorAreaLostM2.toFixed(2)} m²</dd>
    </dl>
  );
}
