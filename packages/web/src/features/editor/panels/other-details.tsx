import type { EditorStore } from "@hushmark/editor-core";
import { setProperties } from "@hushmark/editor-core";
import { constructionCatalogue, type Duct, type Note, type Pin, type Vent, type Void as PlanVoid } from "@hushmark/floorplan";
import { Link } from "react-router-dom";
import { paths } from "../../../config/paths";
import type { PinReading } from "../model/pin-readings";
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

export function PinDetails({ el, store, reading, projectId }: { el: Pin; store: EditorStore; reading?: PinReading | undefined; projectId?: string | undefined }) {
  return (
    <div className="flex flex-col gap-3">
      <CommitInput label="Label" value={el.label} onCommit={(v) => store.run(setProperties(el.id, { label: v }, "rename pin"))} />
      <PinReadingCard reading={reading} projectId={projectId} />
    </div>
  );
}

const hzText = (hz: number) => (hz >= 1000 ? `${hz / 1000} kHz` : `${hz} Hz`);

/** The latest measurement taken at the pin, with the way to it in Measure. */
function PinReadingCard({ reading, projectId }: { reading?: PinReading | undefined; projectId?: string | undefined }) {
  const measureLink = projectId ? paths.projectSection(projectId, "measure") : null;
  if (!reading) {
    return (
      <p className="text-sm text-muted" data-testid="pin-reading">
        No measurement taken here yet.{measureLink ? <> Add one in <Link className="font-medium text-brand-strong underline" to={measureLink}>Measure</Link>, pinned to this room.</> : null}
      </p>
    );
  }
  return (
    <section aria-label="Latest reading" className="rounded-md border border-rule bg-paper px-3 py-2" data-testid="pin-reading">
      <h3 className="text-[13px] font-semibold text-muted">Latest reading</h3>
      <p className="mt-1 flex flex-wrap items-baseline gap-x-3 tabular-nums">
        <span className="text-xl font-semibold">{reading.laeqDb === null ? "—" : `${reading.laeqDb.toFixed(1)} dBA`}</span>
        {reading.peakBandHz !== null && reading.peakDb !== null ? <span className="text-sm">peaks at {hzText(reading.peakBandHz)} ({reading.peakDb.toFixed(1)} dB)</span> : null}
      </p>
      <p className="mt-1 text-sm text-muted">
        {reading.label} · {new Date(reading.takenAt).toLocaleString("en-GB", { day: "numeric", month: "short", hour: "2-digit", minute: "2-digit" })}
      </p>
      {measureLink ? <Link className="mt-1 inline-flex min-h-10 items-center text-sm font-medium text-brand-strong underline" to={`${measureLink}?measurement=${encodeURIComponent(reading.measurementId)}`}>Open the measurement</Link> : null}
    </section>
  );
}

export function NoteDetails({ el, store }: { el: Note; store: EditorStore }) {
  return <CommitInput label="Note" multiline value={el.text} onCommit={(v) => store.run(setProperties(el.id, { text: v }, "edit note"))} />;
}
