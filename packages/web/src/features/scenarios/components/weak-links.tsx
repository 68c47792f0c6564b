import type { AnalysisResult, PriceBookItem } from "@hushmark/schemas";
import { formatMoney } from "../../price-book/components/money";

type Element = AnalysisResult["elements"][number];

/** "Where the sound gets through": each weak link with its share, its gain if perfect, and the upgrades that fit it. */
export function WeakLinks({ elements, items, currency, chosen, onToggle, onAdd }: {
  elements: Element[];
  items: PriceBookItem[];
  currency: string;
  chosen: Set<string>;
  onToggle: (elementId: string) => void;
  onAdd: (elementId: string, itemId: string) => void;
}) {
  const rows = elements.filter((e) => e.kind !== "flanking").slice(0, 12);
  return (
    <ul className="divide-y divide-rule" aria-label="Where the sound gets through">
      {rows.map((e) => {
        return (
          <li key={e.elementId} className="flex flex-wrap items-center gap-3 py-2.5">
            <label className="flex min-h-11 min-w-0 flex-1 items-center gap-3">
              <input type="checkbox" className="size-5 shrink-0 accent-brand" checked={chosen.has(e.elementId)} onChange={() => onToggle(e.elementId)} aria-label={`Try upgrades on ${e.name}`} />
              <span className="min-w-0">
                <span className="block truncate font-medium">{e.name}</span>
                <span className="text-sm text-muted tabular-nums">
                  {e.share < 0.005 ? "under 1%" : `${Math.round(e.share * 100)}%`} of the sound · if perfect: {e.gainIfPerfectDb < 0.05 ? "under 0.1 dB" : `−${e.gainIfPerfectDb.toFixed(1)} dB`}
                </span>
              </span>
            </label>
            <span className="h-2 w-24 overflow-hidden rounded bg-rule" aria-hidden="true">
              <span className="block h-full bg-danger" style={{ width: `${Math.min(100, e.share * 100)}%` }} />
            </span>
            <UpgradeSelect element={e} items={items} currency={currency} onAdd={onAdd} />
          </li>
        );
      })}
    </ul>
  );
}

/** The price book upgrades that fit an element, as a picker that adds the chosen one. */
export function UpgradeSelect({ element: e, items, currency, onAdd }: { element: Pick<Element, "elementId" | "kind" | "name">; items: PriceBookItem[]; currency: string; onAdd: (elementId: string, itemId: string) => void }) {
  const fits = items.filter((i) => i.active && i.appliesTo.includes(e.kind as PriceBookItem["appliesTo"][number]));
  return (
    <select
      className="min-h-11 max-w-64 rounded-md border border-rule bg-panel px-2 text-sm"
      value=""
      aria-label={`Add an upgrade on ${e.name}`}
      disabled={fits.length === 0}
      onChange={(ev) => ev.target.value && onAdd(e.elementId, ev.target.value)}
    >
      <option value="">{fits.length ? "Add an upgrade…" : "No upgrade fits"}</option>
      {fits.map((i) => (
        <option key={i.id} value={i.id}>
          {i.name} ({formatMoney(i.costs.fixedMaterials + i.costs.fixedLabour + i.costs.perItemMaterials + i.costs.perItemLabour, currency)}{i.costs.perM2Materials + i.costs.perM2Labour > 0 ? ` + ${formatMoney(i.costs.perM2Materials + i.costs.perM2Labour, currency)}/m²` : ""})
        </option>
      ))}
    </select>
  );
}
