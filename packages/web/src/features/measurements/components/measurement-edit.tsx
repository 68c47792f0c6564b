import type { MeasurementDetail, MeasurementKind } from "@hushmark/schemas";
import { useQueryClient } from "@tanstack/react-query";
import { useState } from "react";
import { Button } from "../../../components/ui/button";
import { Input, Select } from "../../../components/ui/field";
import { isApiError } from "../../../lib/api-client";
import { measurementKeys, updateMeasurement } from "../api/measurements";
import { kindLabels } from "./spectrum-math";

/** Name, kind and calibration of a saved measurement; a new offset moves every level by the change. */
export function MeasurementEdit({ projectId, measurement, onDone }: { projectId: string; measurement: MeasurementDetail; onDone: () => void }) {
  const queryClient = useQueryClient();
  const [label, setLabel] = useState(measurement.label);
  const [kind, setKind] = useState<MeasurementKind>(measurement.kind);
  const [calibration, setCalibration] = useState(String(measurement.calibrationDb));
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const delta = Number(calibration) - measurement.calibrationDb;

  async function save() {
    setBusy(true);
    setErrors({});
    setError(null);
    try {
      await updateMeasurement(projectId, measurement.id, { label, kind, calibrationDb: Number(calibration) });
      await queryClient.invalidateQueries({ queryKey: measurementKeys.all });
      onDone();
    } catch (e) {
      if (isApiError(e) && e.fieldIssues.length) setErrors(Object.fromEntries(e.fieldIssues.map((i) => [i.path, i.message])));
      setError(e instanceof Error ? e.message : "The changes were not saved.");
    } finally {
      setBusy(false);
    }
  }

  return (
    <div className="flex flex-col gap-3 rounded-md border border-rule p-4" aria-label="Edit the measurement">
      <div className="grid gap-3 md:grid-cols-3">
        <Input label="Name" value={label} error={errors.label} onChange={(e) => setLabel(e.target.value)} />
        <Select label="What it measures" value={kind} onChange={(e) => setKind(e.target.value as MeasurementKind)} options={Object.entries(kindLabels).map(([v, l]) => ({ value: v, label: l }))} />
        <Input
          label="Calibration offset (dB)"
          type="number"
          step="0.1"
          value={calibration}
          error={errors.calibrationDb}
          hint={Number.isFinite(delta) && delta !== 0 ? `Every level moves by ${delta > 0 ? "+" : ""}${delta.toFixed(1)} dB.` : undefined}
          onChange={(e) => setCalibration(e.target.value)}
        />
      </div>
      {error ? <p className="text-sm font-medium text-danger" role="alert">{error}</p> : null}
      <div className="flex gap-2">
        <Button onClick={() => void save()} pending={busy}>Save changes</Button>
        <Button variant="ghost" onClick={onDone}>Cancel</Button>
      </div>
    </div>
  );
}
