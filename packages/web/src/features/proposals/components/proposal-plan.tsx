import { useMemo, useState } from "react";
import { elementsOfType, parsePlan } from "@hushmark/floorplan";
import type { ProposalContent } from "@hushmark/schemas";
import { pct } from "../../paths/model/share-scale";
import { elementWords } from "../model/element-anchor";
import { MarkedUpPlan } from "./marked-up-plan";

/** Plain words for the colour bins, quiet to loud (the percentages are shown beside them). */
export const CLIENT_LEGEND = ["hardly any", "very little", "a little", "some", "a lot", "most"] as const;

/** The client's marked-up plan: the editor's drawing, read-only, coloured by share now and after the work, with the upgrades numbered. */
export function ProposalPlan({ content, document }: { content: ProposalContent; document: Record<string, unknown> }) {
  const [when, setWhen] = useState<"before" | "after">("before");
  const ev = content.evaluation;
  const marked = useMemo(() => [...new Set(ev.lines.map((l) => l.elementId))], [ev.lines]);
  const parsed = useMemo(() => parsePlan(document), [document]);
  if (!parsed.ok) return null;
  const plan = parsed.plan;
  const rooms = elementsOfType(plan, "room");
  const levelId = rooms.find((r) => r.id === ev.receiver.id)?.levelId ?? rooms[0]?.levelId ?? "ground";
  const record = content.planShares?.[when];
  const shares = record ? Object.entries(record).map(([elementId, share]) => ({ elementId, share })) : null;
  const top = shares ? [...shares].sort((a, b) => b.share - a.share)[0] : undefined;
  return (
    <div className="flex flex-col gap-2">
      {content.planShares ? (
        <div role="group" aria-label="Show the plan" className="flex gap-1">
          {(["before", "after"] as const).map((w) => (
            <button key={w} type="button" aria-pressed={when === w} onClick={() => setWhen(w)}
              className={`min-h-11 rounded-md border px-4 text-sm font-medium ${when === w ? "border-brand bg-brand text-white" : "border-rule bg-panel hover:bg-ink/5"}`}>
              {w === "before" ? "Now" : "After the work"}
            </button>
          ))}
        </div>
      ) : null}
      <MarkedUpPlan
        key={when}
        plan={plan}
        shares={shares}
        levelId={levelId}
        markers={marked}
        heightPx={380}
        label={`Plan of ${content.projectTitle}${shares ? `, ${when === "before" ? "now" : "after the work"}: each wall, door, window and vent coloured by how much of the sound reaching ${ev.receiver.name} comes through it` : ""}. The numbered places are where the work goes; the list below names them.`}
        legendTitle="How much of what you hear comes through"
        legendLabels={CLIENT_LEGEND}
      />
      {top ? (
        <p className="text-sm" data-testid="plan-words">
          {when === "before" ? "Now, the largest part" : "After the work, the largest part"} of the sound reaching {ev.receiver.name} comes through {elementWords(plan, top.elementId)} ({pct(top.share)} of it).
        </p>
      ) : null}
    </div>
  );
}
