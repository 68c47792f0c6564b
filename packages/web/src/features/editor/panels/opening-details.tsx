import type { EditorStore } from "@hushmark/editor-core";
import { setLeaks, setProperties } from "@hushmark/editor-core";
import type { Door, Penetration, Window } from "@hushmark/floorplan";
import { ConstructionPicker } from "./construction-picker";
import { CommitInput, SelectField, readNumber } from "./commit-input";

function SizeFields({ el, store }: { el: Door | Window | Penetration; store: EditorStore }) {
  const set = (patch: Record<string, unknown>, label: string) => store.run(setProperties(el.id, patch, label));
  return (
    <div className="grid grid-cols-2 gap-2">
      <CommitInput label="Width" suffix="m" type="number" value={String(el.widthM)} onCommit={(v) => { const n = readNumber(v); if (n !== null && n > 0) set({ widthM: n }, "change width"); }} />
      <CommitInput label="Height" suffix="m" type="number" value={String(el.heightM)} onCommit={(v) => { const n = readNumber(v); if (n !== null && n >= 0) set({ heightM: n }, "change height"); }} />
      <CommitInput label="From wall start" suffix="m" type="number" value={String(el.offsetM)} onCommit={(v) => { const n = readNumber(v); if (n !== null) set({ offsetM: n }, "move opening"); }} />
    </div>
  );
}

/** Door or window: size, construction and the leaks that often matter more than the leaf. */
export function LeafDetails({ el, store }: { el: Door | Window; store: EditorStore }) {
  const leaks = el.leaks ?? { undercutMm: 0, perimeterGapMm: 0, sealsCracked: false };
  return (
    <div className="flex flex-col gap-3">
      <CommitInput label="Name" value={el.name ?? ""} onCommit={(v) => store.run(setProperties(el.id, { name: v || undefined }, "rename"))} />
      <SizeFields el={el} store={store} />
      {el.type === "window" ? <CommitInput label="Sill height" suffix="m" type="number" value={String(el.sillM)} onCommit={(v) => { const n = readNumber(v); if (n !== null && n >= 0) store.run(setProperties(el.id, { sillM: n }, "change sill")); }} /> : null}
      <ConstructionPicker category={el.type} value={el.constructionId} onPick={(id) => store.run(setProperties(el.id, { constructionId: id }, "change construction"))} />
      <fieldset className="flex flex-col gap-2 rounded-md border border-rule p-3">
        <legend className="px-1 text-sm font-medium">Leaks</legend>
        {el.type === "door" ? <CommitInput label="Undercut" suffix="mm" type="number" value={String(leaks.undercutMm)} hint="Gap under the leaf" onCommit={(v) => { const n = readNumber(v); if (n !== null && n >= 0) store.run(setLeaks(el.id, { undercutMm: n })); }} /> : null}
        <CommitInput label="Perimeter gap" suffix="mm" type="number" value={String(leaks.perimeterGapMm)} hint="Round the sides and head" onCommit={(v) => { const n = readNumber(v); if (n !== null && n >= 0) store.run(setLeaks(el.id, { perimeterGapMm: n })); }} />
        <label className="flex min-h-11 items-center gap-2 text-[15px]">
          <input type="checkbox" className="h-5 w-5 accent-brand" checked={leaks.sealsCracked} onChange={(e) => store.run(setLeaks(el.id, { sealsCracked: e.target.checked }))} />
          Seals torn, flattened or painted over
        </label>
      </fieldset>
    </div>
  );
}

const whatLabels = { "outlet-box": "Outlet box", pipe: "Pipe", "cable-hole": "Cable hole", "duct-sleeve": "Duct sleeve", other: "Other" } as const;

export function GapDetails({ el, store }: { el: Penetration; store: EditorStore }) {
  return (
    <div className="flex flex-col gap-3">
      <CommitInput label="Name" value={el.name ?? ""} onCommit={(v) => store.run(setProperties(el.id, { name: v || undefined }, "rename"))} />
      <SelectField label="What it is" value={el.what} options={Object.entries(whatLabels).map(([value, label]) => ({ value: value as Penetration["what"], label }))} onChange={(v) => store.run(setProperties(el.id, { what: v }, "change gap"))} />
      <CommitInput label="Open area" suffix="cm²" type="number" value={String(Math.round(el.openAreaM2 * 1e4 * 10) / 10)} hint="Straight through the wall" onCommit={(v) => { const n = readNumber(v); if (n !== null && n >= 0) store.run(setProperties(el.id, { openAreaM2: n / 1e4 }, "change open area")); }} />
      <SizeFields el={el} store={store} />
    </div>
  );
}
