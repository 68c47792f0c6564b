import type { Brief } from "@hushmark/schemas";
import { Controller, useFieldArray, type Control, type UseFormRegister } from "react-hook-form";
import { Button } from "../../../components/ui/button";
import { Input, Select } from "../../../components/ui/field";
import { dayLabels, noiseKindLabels, seasonLabels, timeLabels } from "./brief-words";

function Chips<K extends string>({ legend, labels, value, onChange, disabled }: { legend: string; labels: Record<K, string>; value: K[]; onChange: (v: K[]) => void; disabled: boolean }) {
  return (
    <fieldset className="flex flex-col gap-1.5">
      <legend className="mb-1.5 text-sm font-medium">{legend}</legend>
      <div className="flex flex-wrap gap-1.5">
        {(Object.keys(labels) as K[]).map((key) => {
          const on = value.includes(key);
          return (
            <button
              key={key}
              type="button"
              disabled={disabled}
              aria-pressed={on}
              onClick={() => onChange(on ? value.filter((v) => v !== key) : [...value, key])}
              className={`min-h-11 rounded-full border px-3 text-sm ${on ? "border-brand bg-brand-soft text-brand-strong" : "border-rule bg-panel text-ink"}`}
            >
              {labels[key]}
            </button>
          );
        })}
      </div>
    </fieldset>
  );
}

let nextId = 1;
const newNoiseId = () => `noise-${Date.now().toString(36)}-${nextId++}`;

/** The noises to deal with: kind, where from, keep in or out, and when. */
export function NoiseFields({ control, register, readOnly }: { control: Control<Brief>; register: UseFormRegister<Brief>; readOnly: boolean }) {
  const { fields, append, remove } = useFieldArray({ control, name: "noises", keyName: "key" });
  return (
    <div className="flex flex-col gap-4">
      {fields.length === 0 ? <p className="text-[15px] text-muted">No noises yet. Add each sound the client wants dealt with.</p> : null}
      {fields.map((field, i) => (
        <div key={field.key} className="flex flex-col gap-3 rounded-md border border-rule p-4" data-testid="brief-noise">
          <div className="grid gap-3 sm:grid-cols-2 lg:grid-cols-3">
            <Select label="Kind of noise" disabled={readOnly} options={Object.entries(noiseKindLabels).map(([value, label]) => ({ value, label }))} {...register(`noises.${i}.kind`)} />
            <Input label="Where it comes from" placeholder="e.g. café grinder behind the party wall" disabled={readOnly} {...register(`noises.${i}.where`)} />
            <Select label="Keep it in or out" disabled={readOnly} options={[{ value: "keep_out", label: "Keep it out (made elsewhere)" }, { value: "keep_in", label: "Keep it in (made in the room)" }]} {...register(`noises.${i}.direction`)} />
          </div>
          <Controller control={control} name={`noises.${i}.times`} render={({ field: f }) => <Chips legend="When in the day" labels={timeLabels} value={f.value} onChange={f.onChange} disabled={readOnly} />} />
          <div className="grid gap-3 lg:grid-cols-2">
            <Controller control={control} name={`noises.${i}.days`} render={({ field: f }) => <Chips legend="Which days" labels={dayLabels} value={f.value} onChange={f.onChange} disabled={readOnly} />} />
            <Controller control={control} name={`noises.${i}.seasons`} render={({ field: f }) => <Chips legend="Seasons (leave empty for all year)" labels={seasonLabels} value={f.value} onChange={f.onChange} disabled={readOnly} />} />
          </div>
          <div className="flex items-end gap-3">
            <div className="flex-1">
              <Input label="Note" placeholder="e.g. worst on Saturday mornings" disabled={readOnly} {...register(`noises.${i}.note`)} />
            </div>
            {readOnly ? null : (
              <Button variant="ghost" onClick={() => remove(i)} aria-label={`Remove noise ${i + 1}`}>
                Remove
              </Button>
            )}
          </div>
        </div>
      ))}
      {readOnly ? null : (
        <div>
          <Button variant="secondary" onClick={() => append({ id: newNoiseId(), kind: "speech", where: "", direction: "keep_out", times: [], days: [], seasons: [], note: "" })}>
            Add a noise
          </Button>
        </div>
      )}
    </div>
  );
}
