import { zodResolver } from "@hookform/resolvers/zod";
import { briefSchema, type Brief, type BriefResponse } from "@hushmark/schemas";
import { useQueryClient } from "@tanstack/react-query";
import { useEffect } from "react";
import { useForm } from "react-hook-form";
import { Button } from "../../components/ui/button";
import { Card, CardHeader } from "../../components/ui/card";
import { ErrorState } from "../../components/ui/error-state";
import { Field, Input, Select } from "../../components/ui/field";
import { PageLoading } from "../../components/ui/spinner";
import { useCurrentMe } from "../auth/components/use-current-me";
import { briefKeys, saveBrief, useBrief } from "./api/brief";
import { NoiseFields } from "./components/noise-fields";
import { TargetFields } from "./components/target-fields";
import { saveStateText, useAutosave } from "./components/use-autosave";

const amountOrNull = (v: unknown) => (v === "" || v === null || v === undefined ? null : Number(v));
const depthOrNaN = (v: unknown) => (v === "" ? Number.NaN : Number(v));

const losses: { name: keyof Omit<Brief["accepts"], "liningDepth" | "tenure">; label: string }[] = [
  { name: "daylight", label: "Some daylight (a window insert or a smaller opening)" },
  { name: "ventilation", label: "Some ventilation (sealed vents need another fresh-air route)" },
  { name: "doorLook", label: "The look of a door (heavier, with seals and a threshold)" },
  { name: "structuralWork", label: "Structural work (floated floors, independent ceilings)" },
  { name: "neighbourAccess", label: "Work from the neighbour's side" },
];

function BriefForm({ projectId, initial, readOnly }: { projectId: string; initial: BriefResponse; readOnly: boolean }) {
  const queryClient = useQueryClient();
  const form = useForm<Brief>({ resolver: zodResolver(briefSchema) as never, defaultValues: initial.brief, mode: "onChange" });
  const { register, control, watch, setValue, formState, trigger, getValues } = form;
  const autosave = useAutosave<Brief>({
    version: initial.version,
    validate: async () => ((await trigger()) ? briefSchema.parse(getValues()) : null),
    save: async (brief, baseVersion) => {
      const saved = await saveBrief(projectId, baseVersion, brief);
      queryClient.setQueryData(briefKeys.detail(projectId), saved);
      return saved.version;
    },
  });
  const { changed } = autosave;
  useEffect(() => {
    if (readOnly) return;
    const sub = watch((_value, info) => {
      if (info.type === "change" || info.name) changed();
    });
    return () => sub.unsubscribe();
  }, [watch, changed, readOnly]);

  const target = watch("target");
  const depth = watch("accepts.liningDepth");
  const state = autosave.state;
  const tone = state.kind === "saved" ? "text-good" : state.kind === "failed" || state.kind === "conflict" || state.kind === "invalid" ? "text-danger" : "text-muted";

  return (
    <form className="flex flex-col gap-5" onSubmit={(e) => e.preventDefault()} aria-label="Brief">
      <div className="sticky top-0 z-10 -mx-1 flex items-center justify-between gap-3 rounded-md border border-rule bg-panel/95 px-4 py-2 backdrop-blur">
        <p className={`text-sm font-medium ${tone}`} role="status" aria-live="polite" data-testid="brief-save-state">
          {readOnly ? "Read only: your role may not change the brief" : saveStateText(state)}
        </p>
        {state.kind === "failed" ? (
          <Button variant="secondary" onClick={() => void autosave.saveNow()}>
            Try again
          </Button>
        ) : null}
        {state.kind === "conflict" ? (
          <Button variant="secondary" onClick={() => window.location.reload()}>
            Reload
          </Button>
        ) : null}
      </div>

      <Card>
        <CardHeader title="The noise" description="Each sound the client wants dealt with, where it comes from and when it happens." />
        <div className="p-5">
          <NoiseFields control={control} register={register} readOnly={readOnly} />
        </div>
      </Card>

      <Card>
        <CardHeader title="How quiet it must be" description="The analysis and the upgrade search aim at this target in the receiving room." />
        <div className="flex flex-col gap-4 p-5">
          <Input label="Receiving room" placeholder="e.g. recording booth" disabled={readOnly} {...register("receivingRoom")} />
          <TargetFields target={target ?? null} register={register} setValue={setValue} errors={formState.errors} readOnly={readOnly} />
        </div>
      </Card>

      <Card>
        <CardHeader title="Budget and what the client accepts losing" />
        <div className="flex flex-col gap-4 p-5">
          <div className="grid gap-3 sm:grid-cols-[1fr_8rem]">
            <Input label="Budget" type="number" min="0" step="100" inputMode="decimal" placeholder="No budget given" disabled={readOnly} error={formState.errors.budget?.amount?.message} {...register("budget.amount", { setValueAs: amountOrNull })} />
            <Input label="Currency" maxLength={3} disabled={readOnly} error={formState.errors.budget?.currency?.message} {...register("budget.currency", { setValueAs: (v: string) => v.toUpperCase() })} />
          </div>
          <fieldset className="flex flex-col gap-2">
            <legend className="mb-1 text-sm font-medium">Floor area: a thicker lining on a wall may take up to</legend>
            <div className="flex flex-wrap items-end gap-3">
              <label className="flex min-h-11 items-center gap-2 text-[15px]">
                <input type="checkbox" className="size-5" disabled={readOnly} checked={depth !== null && depth !== undefined} onChange={(e) => setValue("accepts.liningDepth", e.target.checked ? { value: 5, unit: "cm" } : null, { shouldDirty: true })} />
                Some floor area may be lost
              </label>
              {depth ? (
                <div className="flex items-end gap-2">
                  <div className="w-28">
                    <Input label="Depth per wall" type="number" min="0" step="0.5" disabled={readOnly} error={formState.errors.accepts?.liningDepth?.value?.message} {...register("accepts.liningDepth.value", { setValueAs: depthOrNaN })} />
                  </div>
                  <div className="w-24">
                    <Select label="Unit" disabled={readOnly} options={[{ value: "cm", label: "cm" }, { value: "in", label: "inches" }]} {...register("accepts.liningDepth.unit")} />
                  </div>
                </div>
              ) : null}
            </div>
          </fieldset>
          <fieldset className="flex flex-col gap-1">
            <legend className="mb-1 text-sm font-medium">The client accepts losing</legend>
            {losses.map((l) => (
              <label key={l.name} className="flex min-h-11 items-center gap-2 text-[15px]">
                <input type="checkbox" className="size-5" disabled={readOnly} {...register(`accepts.${l.name}`)} />
                {l.label}
              </label>
            ))}
          </fieldset>
          <Select
            label="The client"
            disabled={readOnly}
            hint="Tenants often may not do structural work or change a shared wall; check the lease."
            options={[{ value: "unknown", label: "Not asked yet" }, { value: "owner", label: "Owns the place" }, { value: "tenant", label: "Rents the place" }]}
            {...register("accepts.tenure")}
          />
          <Field label="Notes">
            {({ id }) => <textarea id={id} rows={4} disabled={readOnly} className="w-full rounded-md border border-rule bg-panel px-3 py-2 text-[15px]" {...register("notes")} />}
          </Field>
        </div>
      </Card>
    </form>
  );
}

/** The Brief section: the noise problem, the target, the budget and the limits, saved as the user types. */
export default function BriefSection({ projectId }: { projectId: string }) {
  const me = useCurrentMe();
  const brief = useBrief(projectId);
  if (brief.isPending) return <PageLoading label="Opening the brief" />;
  if (brief.isError) return <ErrorState title="The brief did not load" error={brief.error} onRetry={() => void brief.refetch()} />;
  const readOnly = !(me.membership.role === "owner" || me.membership.role === "surveyor");
  return <BriefForm key={projectId} projectId={projectId} initial={brief.data} readOnly={readOnly} />;
}
