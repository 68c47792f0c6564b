import type { EditorStore } from "@hushmark/editor-core";
import { setProperties } from "@hushmark/editor-core";
import { constructionCatalogue, type Duct, type Note, type Pin, type Vent, type Void as PlanVoid } from "@hushmark/floorplan";
import { CommitInput, SelectField, readNumber } from "./commit-input";

const num = (v: string, ok: (n: number) => boolean) => { const n = readNumber(v); return n !== null && ok(n) ? n : null; };

export function VentDetails({ el, store }: { el: Vent; store: EditorStore }) {
  const set = (patch: Record<string, unknown>, label: string) => store.run(setProperties(el.id, patch, label));
  return (
    <div className="flex flex-col gap-3">
      <CommitInput label="Name" value={el.name ?? ""} onCommit={(v) => set({ name: v || undefined }, "rename")} />
      <SelectField label="Mounted in" value={el.mount} options={[{ value: "ceiling", label: "Ceiling" }, { value: "wall", label: "Wall" }, { value: "floor", label: "Floor" }]} onChange={(v) => set({ mount: v }, "change mount")} />
      <CommitInput label="Free open area" suffix="cm²" type="number" value={String(Math.round(el.openAreaM2 * 1e4))} onCommit={(v) => { const n = num(v, (x) => x > 0); if (n !== null) set({ openAreaM2: n / 1e4 }, "change open area"); }} />
    </div>
  );
}

export function DuctDetails({ el, store }: { el: Duct; store: EditorStore }) {
  const set = (patch: Record<string, unknown>, label: string) => store.run(setProperties(el.id, patch, label));
  const silencers = Object.values(constructionCatalogue.silencers);
  return (
    <div className="flex flex-col gap-3">
      <CommitInput label="Name" value={el.name ?? ""} onCommit={(v) => set({ name: v || undefined }, "rename")} />
      <CommitInput label="Run length" suffix="m" type="number" value={String(el.lengthM)} onCommit={(v) => { const n = num(v, (x) => x >= 0); if (n !== null) set({ lengthM: n }, "change duct length"); }} />
      <SelectField label="Lining" value={el.lining} options={[{ value: "bare", label: "Bare sheet metal" }, { value: "lined", label: "Lined with absorber" }]} onChange={(v) => set({ lining: v }, "change lining")} />
      <CommitInput label="Bends" type="number" value={String(el.bends)} onCommit={(v) => { const n = num(v, (x) => x >= 0); if (n !== null) set({ bends: Math.round(n) }, "change bends"); }} />
      <SelectField label="Silencer" value={el.silencerId ?? ""} options={[{ value: "", label: "None" }, ...silencers.map((s) => ({ value: s.id, label: s.name }))]} onChange={(v) => set({ silencerId: v || undefined }, "change silencer")} />
    </div>
  );
}

export function VoidDetails({ el, store }: { el: PlanVoid; store: EditorStore }) {
  const set = (patch: Record<string, unknown>, label: string) => store.run(setProperties(el.id, patch, label));
  return (
    <div className="flex flex-col gap-3">
      <CommitInput label="Name" value={el.name} onCommit={(v) => set({ name: v }, "rename")} />
      <SelectField label="Kind" value={el.kind} options={[{ value: "ceiling-void", label: "Ceiling void" }, { value: "attic", label: "Attic" }, { value: "crawlspace", label: "Crawlspace" }]} onChange={(v) => set({ kind: v }, "change void")} />
      <CommitInput label="Depth" suffix="m" type="number" value={String(el.depthM)} onCommit={(v) => { const n = num(v, (x) => x >= 0); if (n !== null) set({ depthM: n }, "change depth"); }} />
    </div>
  );
}

export function PinDetails({ el, store }: { el: Pin; store: EditorStore }) {
  return <CommitInput label="Label" value={el.label} onCommit={(v) => store.run(setProperties(el.id, { label: v }, "rename pin"))} />;
}

export function NoteDetails({ el, store }: { el: Note; store: EditorStore }) {
  return <CommitInput label="Note" multiline value={el.text} onCommit={(v) => store.run(setProperties(el.id, { text: v }, "edit note"))} />;
}
