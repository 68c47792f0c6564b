import type { Door, Window } from "@hushmark/floorplan";
import { CommitInput, readNumber } from "../../editor/panels/commit-input";

/** The leaks of a door or window, editable right in the Paths view so their effect shows at once. */
export function LeakQuickEdit({ el, onLeaks, busy }: { el: Door | Window; onLeaks: (leaks: Partial<NonNullable<Door["leaks"]>>) => void; busy: boolean }) {
  const leaks = el.leaks ?? { undercutMm: 0, perimeterGapMm: 0, sealsCracked: false };
  return (
    <fieldset className="flex flex-col gap-2 rounded-md border border-rule p-3" disabled={busy}>
      <legend className="px-1 text-sm font-medium">Leaks of {el.name ?? (el.type === "door" ? "this door" : "this window")}</legend>
      {el.type === "door" ? <CommitInput label="Undercut" suffix="mm" type="number" value={String(leaks.undercutMm)} onCommit={(v) => { const n = readNumber(v); if (n !== null && n >= 0) onLeaks({ undercutMm: n }); }} /> : null}
      <CommitInput label="Perimeter gap" suffix="mm" type="number" value={String(leaks.perimeterGapMm)} onCommit={(v) => { const n = readNumber(v); if (n !== null && n >= 0) onLeaks({ perimeterGapMm: n }); }} />
      <label className="flex min-h-11 items-center gap-2 text-[14px]">
        <input type="checkbox" className="h-5 w-5 accent-brand" checked={leaks.sealsCracked} onChange={(e) => onLeaks({ sealsCracked: e.target.checked })} />
        Seals torn, flattened or painted over
      </label>
    </fieldset>
  );
}
