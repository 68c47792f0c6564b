import { useMemo, useState } from "react";
import { elementsOfType, parsePlan } from "@hushmark/floorplan";
import type { AnalysisResult, PriceBookItem } from "@hushmark/schemas";
import { MarkedUpPlan } from "../../proposals/components/marked-up-plan";
import { pickTargets } from "../model/pick-targets";
import { UpgradeSelect } from "./weak-links";

type Element = AnalysisResult["elements"][number];

/**
 * "Pick on the plan": the marked-up plan, read-only; a click on a wall part, door, window, vent
 * or floor shows that weak link with the upgrades that fit it, as the list does.
 */
export function PlanPick({ document, elements, receiverId, receiverName, items, currency, chosen, onToggle, onAdd }: {
  document: Record<string, unknown>;
  elements: Element[];
  receiverId: string;
  receiverName: string;
  items: PriceBookItem[];
  currency: string;
  chosen: Set<string>;
  onToggle: (elementId: string) => void;
  onAdd: (elementId: string, itemId: string) => void;
}) {
  const parsed = useMemo(() => parsePlan(document), [document]);
  const [picked, setPicked] = useState<string | null>(null);
  const [added, setAdded] = useState<string | null>(null);
  if (!parsed.ok) return <p className="text-sm text-muted">The plan cannot be drawn here; use the list.</p>;
  const plan = parsed.plan;
  const levelId = elementsOfType(plan, "room").find((r) => r.id === receiverId)?.levelId ?? elementsOfType(plan, "room")[0]?.levelId ?? "ground";
  const targets = pickTargets(elements, plan, picked);
  const pickedName = picked ? (plan.elements[picked] && "name" in plan.elements[picked]! ? String((plan.elements[picked] as { name?: string }).name ?? "") : "") : "";
  return (
    <div className="grid gap-4 lg:grid-cols-[3fr_2fr]">
      <MarkedUpPlan
        plan={plan}
        shares={elements}
        levelId={levelId}
        label={`Plan coloured by each element's share of the sound reaching ${receiverName}. Click a wall part, door, window, vent or room to pick it; the list of weak links does the same.`}
        legendTitle="Share of the sound reaching the room"
        onPick={(id) => { setPicked(id); setAdded(null); }}
        picked={picked}
      />
      <div aria-live="polite" aria-label="Picked on the plan" data-testid="plan-pick-panel" className="flex flex-col gap-3">
        {!picked ? <p className="text-sm text-muted">Click a wall part, door, window, vent or room on the plan to see how much sound it lets through and the upgrades that fit it.</p> : null}
        {picked && targets.length === 0 ? (
          <p className="text-sm">{pickedName || "That element"} carries no sound to {receiverName} in this set-up. Pick a wall part, door, window, vent or room.</p>
        ) : null}
        {targets.map((e) => (
          <div key={e.elementId} className="flex flex-col gap-2 rounded-md border border-rule p-3">
            <p className="font-medium">{e.name}</p>
            <p className="text-sm text-muted tabular-nums">
              {e.share < 0.005 ? "under 1%" : `${Math.round(e.share * 100)}%`} of the sound · if perfect: {e.gainIfPerfectDb < 0.05 ? "under 0.1 dB" : `−${e.gainIfPerfectDb.toFixed(1)} dB`}
            </p>
            <label className="flex min-h-11 items-center gap-3 text-sm">
              <input type="checkbox" className="size-5 accent-brand" checked={chosen.has(e.elementId)} onChange={() => onToggle(e.elementId)} />
              Try upgrades on it in “Best within limits”
            </label>
            <UpgradeSelect element={e} items={items} currency={currency} onAdd={(elementId, itemId) => { onAdd(elementId, itemId); setAdded(`${items.find((i) => i.id === itemId)?.name ?? "The upgrade"} on ${e.name}`); }} />
          </div>
        ))}
        {added ? <p role="status" className="text-sm text-good">Added to the scenario: {added}.</p> : null}
      </div>
    </div>
  );
}
