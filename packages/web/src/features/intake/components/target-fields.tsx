import type { Brief, BriefTarget } from "@hushmark/schemas";
import type { FieldErrors, UseFormRegister, UseFormSetValue } from "react-hook-form";
import { Input, Select } from "../../../components/ui/field";
import { targetExplanation, targetKindLabels } from "./brief-words";

const numberOrNaN = (v: unknown) => (v === "" || v === null || v === undefined ? Number.NaN : Number(v));

const fresh: Record<BriefTarget["kind"], BriefTarget> = {
  level: { kind: "level", levelDba: 30 },
  nc: { kind: "nc", nc: 25 },
  reduction: { kind: "reduction", reductionDb: 10 },
  noticeable: { kind: "noticeable" },
};

/** How quiet it must be, with what the number means in plain words. */
export function TargetFields({ target, register, setValue, errors, readOnly }: { target: BriefTarget | null; register: UseFormRegister<Brief>; setValue: UseFormSetValue<Brief>; errors: FieldErrors<Brief>; readOnly: boolean }) {
  const err = errors.target as Record<string, { message?: string }> | undefined;
  return (
    <div className="flex flex-col gap-3">
      <div className="grid gap-3 md:grid-cols-2">
        <Select
          label="The target is"
          disabled={readOnly}
          value={target?.kind ?? ""}
          onChange={(e) => setValue("target", e.target.value ? fresh[e.target.value as BriefTarget["kind"]] : null, { shouldDirty: true, shouldValidate: true })}
          options={[{ value: "", label: "Not agreed yet" }, ...Object.entries(targetKindLabels).map(([value, label]) => ({ value, label }))]}
        />
        {target?.kind === "level" ? <Input label="Level in the receiving room (dBA)" type="number" step="1" inputMode="decimal" disabled={readOnly} error={err?.levelDba?.message} {...register("target.levelDba", { setValueAs: numberOrNaN })} /> : null}
        {target?.kind === "nc" ? <Input label="NC rating" type="number" step="5" inputMode="numeric" disabled={readOnly} error={err?.nc?.message} {...register("target.nc", { setValueAs: numberOrNaN })} /> : null}
        {target?.kind === "reduction" ? <Input label="Reduction (dB)" type="number" step="1" inputMode="decimal" disabled={readOnly} error={err?.reductionDb?.message} {...register("target.reductionDb", { setValueAs: numberOrNaN })} /> : null}
      </div>
      <p className="rounded-md bg-brand-soft px-3 py-2 text-[15px] text-ink" data-testid="target-explanation">
        {targetExplanation(target)}
      </p>
    </div>
  );
}
