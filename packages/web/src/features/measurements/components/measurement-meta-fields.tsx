import type { MeasurementKind } from "@hushmark/schemas";
import { Input, Select } from "../../../components/ui/field";
import type { PlanPlaces } from "../api/plan-places";
import { kindLabels } from "./spectrum-math";

export interface MetaValues {
  label: string;
  kind: MeasurementKind;
  takenAt: string;
  roomId: string;
  device: string;
  calibrationDb: string;
}

export const nowLocal = () => {
  const d = new Date();
  d.setSeconds(0, 0);
  return new Date(d.getTime() - d.getTimezoneOffset() * 60_000).toISOString().slice(0, 16);
};

export const emptyMeta = (label: string, calibrationDb = "0"): MetaValues => ({ label, kind: "background", takenAt: nowLocal(), roomId: "", device: "", calibrationDb });

export const isoOf = (local: string) => new Date(local).toISOString();

/** Name, kind, time, place and device of a new measurement. */
export function MeasurementMetaFields({ value, onChange, places, errors = {}, showCalibration = false, calibrationHint }: { value: MetaValues; onChange: (v: MetaValues) => void; places: PlanPlaces; errors?: Record<string, string>; showCalibration?: boolean; calibrationHint?: string }) {
  const set = (patch: Partial<MetaValues>) => onChange({ ...value, ...patch });
  return (
    <div className="grid gap-3 md:grid-cols-2">
      <Input label="Name" value={value.label} error={errors.label} onChange={(e) => set({ label: e.target.value })} />
      <Select label="What it measures" value={value.kind} onChange={(e) => set({ kind: e.target.value as MeasurementKind })} options={Object.entries(kindLabels).map(([v, l]) => ({ value: v, label: l }))} />
      <Input label="Taken at" type="datetime-local" value={value.takenAt} error={errors.takenAt} onChange={(e) => set({ takenAt: e.target.value })} />
      {places.rooms.length ? (
        <Select label="Room on the plan" value={value.roomId} onChange={(e) => set({ roomId: e.target.value })} options={[{ value: "", label: "Not pinned to a room" }, ...places.rooms.map((r) => ({ value: r.id, label: r.name }))]} />
      ) : (
        <Input label="Room" placeholder="No rooms on the plan yet; e.g. booth" value={value.roomId} onChange={(e) => set({ roomId: e.target.value })} />
      )}
      <Input label="Device" placeholder="e.g. class 1 meter, phone" value={value.device} onChange={(e) => set({ device: e.target.value })} />
      {showCalibration ? <Input label="Calibration offset (dB)" type="number" step="0.1" value={value.calibrationDb} error={errors.calibrationDb} hint={calibrationHint} onChange={(e) => set({ calibrationDb: e.target.value })} /> : null}
    </div>
  );
}

/** The plan point of a pinned room (its outline's centre), so the pin shows on the plan. */
export const pointOf = (places: PlanPlaces, roomId: string) => places.rooms.find((r) => r.id === roomId)?.centre ?? null;
