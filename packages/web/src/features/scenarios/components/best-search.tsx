import type { OptionSearchResult, ScenarioSetup, UpgradeFlagName } from "@hushmark/schemas";
import { useEffect, useState } from "react";
import { Button } from "../../../components/ui/button";
import { isApiError } from "../../../lib/api-client";
import { flagLabels, formatMoney } from "../../price-book/components/money";
import { cancelOptionSearch, startOptionSearch, useOptionSearch } from "../api/scenarios";

const FLAGS = Object.keys(flagLabels) as UpgradeFlagName[];

export interface Limits {
  budget: string;
  floorAreaM2: string;
  labourHours: string;
  allowedFlags: UpgradeFlagName[];
}

const num = (v: string) => (v.trim() === "" ? undefined : Number(v));

/** "Best within limits": starts the search, shows its progress, can cancel it, and shows the answer. */
export function BestSearch({ projectId, setup, elementIds, currency, onResult, onKeep }: {
  projectId: string;
  setup: ScenarioSetup;
  elementIds: string[];
  currency: string;
  onResult: (r: OptionSearchResult | null) => void;
  onKeep: (r: OptionSearchResult) => void;
}) {
  const [limits, setLimits] = useState<Limits>({ budget: "", floorAreaM2: "", labourHours: "", allowedFlags: [...FLAGS] });
  const [searchId, setSearchId] = useState<string | null>(null);
  const [error, setError] = useState<string | null>(null);
  const [starting, setStarting] = useState(false);
  const search = useOptionSearch(projectId, searchId);
  const status = search.data;
  const result = status?.status === "done" ? status.result : null;

  async function start() {
    setError(null);
    setStarting(true);
    try {
      const budget = num(limits.budget), floorAreaM2 = num(limits.floorAreaM2), labourHours = num(limits.labourHours);
      const started = await startOptionSearch(projectId, {
        setup, elementIds,
        limits: { ...(budget !== undefined ? { budget } : {}), ...(floorAreaM2 !== undefined ? { floorAreaM2 } : {}), ...(labourHours !== undefined ? { labourHours } : {}), allowedFlags: limits.allowedFlags },
      });
      setSearchId(started.id);
      onResult(null);
    } catch (e) {
      setError(isApiError(e) ? e.message : "The search did not start.");
    } finally {
      setStarting(false);
    }
  }

  useEffect(() => {
    if (result) onResult(result);
  }, [result, onResult]);
  const running = status?.status === "running";
  const pct = status ? Math.round((status.progress.done / Math.max(status.progress.total, 1)) * 100) : 0;
  const phaseWords: Record<string, string> = { starting: "Starting", singles: "Trying each upgrade alone", best: "Searching the best set", frontier: "Tracing cost against level", done: "Done" };

  return (
    <div className="flex flex-col gap-4">
      <div className="grid gap-3 sm:grid-cols-3">
        {([["budget", `Budget (${currency})`], ["floorAreaM2", "Floor area it may take (m²)"], ["labourHours", "Labour (hours)"]] as const).map(([key, label]) => (
          <label key={key} className="flex flex-col gap-1 text-sm font-medium">
            {label}
            <input className="min-h-11 rounded-md border border-rule bg-panel px-3 text-[15px] tabular-nums" inputMode="decimal" placeholder="no limit" value={limits[key]} onChange={(e) => setLimits({ ...limits, [key]: e.target.value })} aria-invalid={limits[key] !== "" && !(Number(limits[key]) >= 0)} />
          </label>
        ))}
      </div>
      <fieldset className="flex flex-wrap gap-x-4 gap-y-1 text-sm">
        <legend className="mb-1 font-medium">The client accepts</legend>
        {FLAGS.map((f) => (
          <label key={f} className="flex min-h-11 items-center gap-2">
            <input type="checkbox" className="size-5 accent-brand" checked={limits.allowedFlags.includes(f)} onChange={() => setLimits({ ...limits, allowedFlags: limits.allowedFlags.includes(f) ? limits.allowedFlags.filter((x) => x !== f) : [...limits.allowedFlags, f] })} />
            {flagLabels[f]}
          </label>
        ))}
      </fieldset>
      <div className="flex flex-wrap items-center gap-3">
        <Button onClick={() => void start()} pending={starting} disabled={running || elementIds.length === 0}>Find the best within limits</Button>
        {running && searchId ? <Button variant="secondary" onClick={() => void cancelOptionSearch(projectId, searchId).then(() => search.refetch())}>Cancel</Button> : null}
        {elementIds.length === 0 ? <span className="text-sm text-muted">Tick the weak links to try upgrades on.</span> : null}
      </div>
      {running ? (
        <div role="status" className="flex flex-col gap-1 text-sm">
          <span>{phaseWords[status.progress.phase] ?? status.progress.phase}… {status.progress.phase === "singles" ? `${status.progress.done} of ${status.progress.total}` : ""}</span>
          <span className="h-2 w-full max-w-md overflow-hidden rounded bg-rule"><span className="block h-full bg-brand transition-all" style={{ width: `${status.progress.phase === "singles" ? pct : 100}%` }} /></span>
        </div>
      ) : null}
      {status?.status === "cancelled" ? <p role="status" className="text-sm text-muted">Search cancelled.</p> : null}
      {status?.status === "failed" ? <p role="alert" className="text-sm font-medium text-danger">{status.error}</p> : null}
      {error ? <p role="alert" className="text-sm font-medium text-danger">{error}</p> : null}
      {result ? <BestResult result={result} currency={currency} onKeep={() => onKeep(result)} /> : null}
    </div>
  );
}

function BestResult({ result, currency, onKeep }: { result: OptionSearchResult; currency: string; onKeep: () => void }) {
  const b = result.best;
  return (
    <div className="flex flex-col gap-3 rounded-md border border-brand/30 bg-brand-soft/40 p-4" data-testid="best-result">
      <p className="font-medium">
        {b.items.length === 0 ? "Nothing within the limits lowers the level." : `${b.items.length} upgrade${b.items.length === 1 ? "" : "s"} for ${formatMoney(b.cost, currency)}: ${result.base.dba.toFixed(1)} → ${b.dba.toFixed(1)} dBA (−${b.gainDb.toFixed(1)} dB)`}
        {b.reachesTarget ? " — reaches the target." : ""}
        {b.exact ? "" : " (best found; not proven optimal)"}
      </p>
      <ul className="list-disc pl-5 text-sm">{b.items.map((i) => <li key={i.key}>{i.name} on {i.elementName}</li>)}</ul>
      {b.alternatives.length ? (
        <div className="text-sm">
          <p className="font-medium">Why not…</p>
          <ul className="list-disc pl-5">{b.alternatives.map((a, k) => <li key={k}><span className="text-muted">{a.items.join(", ") || "doing nothing"}:</span> {a.whyNot}</li>)}</ul>
        </div>
      ) : null}
      <div><Button variant="secondary" onClick={onKeep} disabled={b.items.length === 0}>Keep as a scenario</Button></div>
    </div>
  );
}

export function SingleRanking({ result, currency }: { result: OptionSearchResult; currency: string }) {
  const [by, setBy] = useState<"db" | "money">("db");
  const rows = [...result.ranking].sort((a, b) => (by === "db" ? b.gainDb - a.gainDb : (b.gainPerThousandDb ?? Infinity) - (a.gainPerThousandDb ?? Infinity))).slice(0, 10);
  return (
    <div>
      <div className="mb-2 flex gap-2 text-sm" role="group" aria-label="Rank by">
        <Button variant={by === "db" ? "primary" : "secondary"} className="min-h-9 px-3 text-sm" onClick={() => setBy("db")}>dB gained</Button>
        <Button variant={by === "money" ? "primary" : "secondary"} className="min-h-9 px-3 text-sm" onClick={() => setBy("money")}>dB per {formatMoney(1000, currency).replace(/\.00$/, "")}</Button>
      </div>
      <table className="w-full text-sm tabular-nums">
        <thead><tr className="border-b border-rule text-left text-muted"><th className="py-1 font-medium">Upgrade</th><th className="font-medium">Gain</th><th className="font-medium">Per {formatMoney(1000, currency).replace(/\.00$/, "")}</th><th className="font-medium">Cost</th></tr></thead>
        <tbody>
          {rows.map((r) => (
            <tr key={r.key} className="border-b border-rule/60">
              <td className="py-1.5 pr-2">{r.name} <span className="text-muted">on {r.elementName}</span></td>
              <td>−{r.gainDb.toFixed(1)} dB</td>
              <td>{r.gainPerThousandDb === null ? "free" : `${r.gainPerThousandDb.toFixed(1)} dB`}</td>
              <td>{formatMoney(r.cost, currency)}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
