import type { EditorStore } from "@hushmark/editor-core";
import { setProperties } from "@hushmark/editor-core";
import { finishPresets, formatArea, polygonAreaM2, roomUseSchema, type Room, type Target } from "@hushmark/floorplan";
import { CommitInput, SelectField, readNumber } from "./commit-input";

const useLabels: Record<string, string> = {
  bedroom: "Bedroom", nursery: "Nursery", living: "Living room", dining: "Dining room", kitchen: "Kitchen", bathroom: "Bathroom",
  office: "Office", meeting: "Meeting room", studio: "Studio", "control-room": "Control room", cinema: "Home cinema",
  classroom: "Classroom", retail: "Shop", cafe: "Café", corridor: "Corridor", stair: "Stair", plant: "Plant room", storage: "Storage", other: "Other",
};
export const roomUseLabel = (use: string) => useLabels[use] ?? use;

type TargetKind = "none" | Target["kind"];

export function RoomDetails({ room, store, unit }: { room: Room; store: EditorStore; unit: "metric" | "imperial" }) {
  const set = (patch: Record<string, unknown>, label?: string) => store.run(setProperties(room.id, patch, label));
  const targetKind: TargetKind = room.target?.kind ?? "none";
  const targetValue = room.target ? String(room.target.kind === "nc" ? room.target.nc : room.target.kind === "dba" ? room.target.dba : room.target.reductionDb) : "";
  const setTarget = (kind: TargetKind, value: number | null) => {
    if (kind === "none") return set({ target: undefined }, "clear target");
    const v = value ?? (kind === "nc" ? 30 : kind === "dba" ? 35 : 10);
    set({ target: kind === "nc" ? { kind, nc: v } : kind === "dba" ? { kind, dba: v } : { kind, reductionDb: v } }, "change target");
  };
  return (
    <div className="flex flex-col gap-3">
      <CommitInput label="Name" value={room.name} onCommit={(v) => set({ name: v }, "rename room")} />
      <SelectField label="Use" value={room.use} options={roomUseSchema.options.map((u) => ({ value: u, label: roomUseLabel(u) }))} onChange={(v) => set({ use: v }, "change use")} />
      <p className="numeric text-sm text-muted">Floor area {formatArea(polygonAreaM2(room.outline), unit)} · {room.outline.length} corners</p>
      <fieldset className="flex flex-col gap-2 rounded-md border border-rule p-3">
        <legend className="px-1 text-sm font-medium">How quiet it must be</legend>
        <SelectField<TargetKind>
          label="Target"
          value={targetKind}
          options={[{ value: "none", label: "No target yet" }, { value: "nc", label: "Noise criterion (NC)" }, { value: "dba", label: "Level (dBA)" }, { value: "reduction", label: "Reduction (dB)" }]}
          onChange={(k) => setTarget(k, null)}
        />
        {targetKind !== "none" ? (
          <CommitInput label={targetKind === "nc" ? "NC rating" : targetKind === "dba" ? "Level, dBA" : "Reduction, dB"} type="number" value={targetValue} onCommit={(v) => { const n = readNumber(v); if (n !== null) setTarget(targetKind, n); }} />
        ) : null}
      </fieldset>
      <SelectField
        label="Furnishing (sound absorption)"
        value={room.finish?.kind === "preset" ? room.finish.presetId : "assumed"}
        options={[{ value: "assumed", label: "Not known — assume typical" }, ...finishPresets.map((f) => ({ value: f.id, label: f.name }))]}
        onChange={(v) => set({ finish: v === "assumed" ? undefined : { kind: "preset", presetId: v } }, "change furnishing")}
      />
    </div>
  );
}
