import type { AnalysisResult } from "@hushmark/schemas";
import { pct, shareColour } from "../model/share-scale";

/** "Where the sound gets through": the elements carrying most of the energy, largest first. */
export function WeakLinksList({ result, selected, onPick, plain, dimmed }: { result: AnalysisResult; selected: string | null; onPick: (elementId: string) => void; plain: boolean; dimmed: boolean }) {
  const rows = result.elements.filter((e) => e.share >= 0.005).slice(0, 12);
  return (
    <section aria-labelledby="weak-links-title" className={dimmed ? "opacity-50" : ""}>
      <h3 id="weak-links-title" className="text-[15px] font-semibold">Where the sound gets through</h3>
      <ol className="mt-2 flex flex-col gap-1">
        {rows.map((e) => (
          <li key={e.elementId}>
            <button
              type="button"
              onClick={() => onPick(e.elementId)}
              aria-pressed={selected === e.elementId}
              className={`flex min-h-11 w-full items-center gap-3 rounded-md px-2 py-1.5 text-left hover:bg-ink/5 ${selected === e.elementId ? "bg-brand-soft" : ""}`}
            >
              <span aria-hidden="true" className="h-6 w-3 shrink-0 rounded-sm border border-rule" style={{ background: shareColour(e.share) }} />
              <span className="min-w-0 flex-1">
                <span className="block text-[14px] font-medium leading-snug">{e.name}</span>
                <span className="numeric block text-[12px] text-muted">
                  {plain ? `${pct(e.share)} of what you hear` : `${pct(e.share)} of the energy`} · {plain ? "if it let nothing through" : "if perfect"}: −{e.gainIfPerfectDb.toFixed(1)} dB{e.gainExact ? "" : " (estimate)"}
                </span>
              </span>
            </button>
          </li>
        ))}
      </ol>
    </section>
  );
}
