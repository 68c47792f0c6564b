import { zodResolver } from "@hookform/resolvers/zod";
import { firmSettingsSchema, type FirmSettings } from "@hushmark/schemas";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { Button } from "../../../components/ui/button";
import { applyServerErrors } from "../../../lib/form-errors";
import { useSaveFirmSettings } from "../api/price-book";

const FIELDS = ["currency", "taxRatePercent", "depositPercent", "validityDays", "terms"] as const;

/** Tax, deposit, validity and terms the proposals use; the same schema checks the form and the server. */
export function FirmSettingsForm({ settings }: { settings: FirmSettings }) {
  const save = useSaveFirmSettings();
  const [message, setMessage] = useState<string | null>(null);
  const form = useForm<FirmSettings>({ resolver: zodResolver(firmSettingsSchema), defaultValues: settings });
  const { register, handleSubmit, formState: { errors } } = form;
  const input = "min-h-11 rounded-md border border-rule bg-panel px-3 text-[15px] aria-[invalid=true]:border-danger";
  return (
    <form className="grid gap-3 sm:grid-cols-4" onSubmit={handleSubmit((v) => save.mutate(v, { onSuccess: () => setMessage("Saved."), onError: (e) => setMessage(applyServerErrors(e, form.setError, FIELDS)) }))} noValidate>
      {([["currency", "Currency", "text"], ["taxRatePercent", "Tax rate (%)", "number"], ["depositPercent", "Deposit (%)", "number"], ["validityDays", "Valid for (days)", "number"]] as const).map(([name, label, type]) => (
        <label key={name} className="flex flex-col gap-1 text-sm font-medium">
          {label}
          <input className={input} type={type} step="any" aria-invalid={errors[name] ? true : undefined} {...register(name, type === "number" ? { valueAsNumber: true } : {})} />
          {errors[name] ? <span className="text-sm text-danger">{errors[name]?.message}</span> : null}
        </label>
      ))}
      <label className="flex flex-col gap-1 text-sm font-medium sm:col-span-4">
        Terms printed on proposals
        <textarea className="min-h-20 rounded-md border border-rule bg-panel p-3 text-[15px]" {...register("terms")} />
        {errors.terms ? <span className="text-sm text-danger">{errors.terms.message}</span> : null}
      </label>
      <div className="flex items-center gap-3 sm:col-span-4">
        <Button type="submit" pending={save.isPending}>Save settings</Button>
        {message ? <span role="status" className="text-sm text-muted">{message}</span> : null}
      </div>
    </form>
  );
}
