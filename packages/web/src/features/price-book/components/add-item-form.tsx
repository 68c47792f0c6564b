import { zodResolver } from "@hookform/resolvers/zod";
import { priceBookItemInputSchema, type PriceBookItemInput, type UpgradeTargetKind } from "@hushmark/schemas";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { z } from "zod";
import { Button } from "../../../components/ui/button";
import { applyServerErrors } from "../../../lib/form-errors";
import { useAddPriceBookItem } from "../api/price-book";
import { familyLabels } from "./money";

const KINDS: UpgradeTargetKind[] = ["wall", "door", "window", "penetration", "floor", "ceiling", "vent"];

/** The simple effects a new upgrade starts with; band-by-band figures come in through CSV. */
const formSchema = z.object({
  code: priceBookItemInputSchema.shape.code,
  name: priceBookItemInputSchema.shape.name,
  family: priceBookItemInputSchema.shape.family,
  appliesTo: z.array(z.enum(KINDS)).min(1, "Say what it applies to."),
  effectKind: z.enum(["added-layer", "duct-attenuation", "impact-improvement", "sealed-gap", "construction"]),
  effectValue: z.string().trim().min(1, "Give the dB figure, the gap (undercut, perimeter, opening) or the construction id."),
  perM2Materials: z.number("Give a number.").min(0, "A price cannot be negative."),
  perM2Labour: z.number("Give a number.").min(0, "A price cannot be negative."),
  perItemMaterials: z.number("Give a number.").min(0, "A price cannot be negative."),
  perItemLabour: z.number("Give a number.").min(0, "A price cannot be negative."),
  labourHours: z.number("Give a number.").min(0, "Labour cannot be negative."),
}).superRefine((v, ctx) => {
  const numeric = v.effectKind === "added-layer" || v.effectKind === "duct-attenuation" || v.effectKind === "impact-improvement";
  const n = Number(v.effectValue);
  if (numeric && !(Number.isFinite(n) && n >= 0 && n <= 60)) ctx.addIssue({ code: "custom", path: ["effectValue"], message: "Give the improvement in dB, between 0 and 60." });
  if (v.effectKind === "sealed-gap" && !["undercut", "perimeter", "opening"].includes(v.effectValue)) ctx.addIssue({ code: "custom", path: ["effectValue"], message: "Say which gap: undercut, perimeter or opening." });
});
type FormValues = z.infer<typeof formSchema>;

function effectOf(v: FormValues): PriceBookItemInput["effect"] {
  const n = Number(v.effectValue);
  switch (v.effectKind) {
    case "added-layer": return { kind: "added-layer", deltaTlDb: n };
    case "duct-attenuation": return { kind: "duct-attenuation", attenuationDb: n };
    case "impact-improvement": return { kind: "impact-improvement", deltaLDb: n };
    case "sealed-gap": return { kind: "sealed-gap", gap: v.effectValue as "undercut" | "perimeter" | "opening", remainingOpenAreaM2: 0 };
    case "construction": return { kind: "construction", constructionId: v.effectValue };
  }
}

/** An owner adds an upgrade; the server checks it with the same schema and names the field at fault. */
export function AddItemForm() {
  const add = useAddPriceBookItem();
  const [message, setMessage] = useState<string | null>(null);
  const form = useForm<FormValues>({
    resolver: zodResolver(formSchema),
    defaultValues: { code: "", name: "", family: "mass", appliesTo: ["wall"], effectKind: "added-layer", effectValue: "5", perM2Materials: 0, perM2Labour: 0, perItemMaterials: 0, perItemLabour: 0, labourHours: 0 },
  });
  const { register, handleSubmit, formState: { errors } } = form;
  const input = "min-h-11 rounded-md border border-rule bg-panel px-3 text-[15px] aria-[invalid=true]:border-danger";
  const err = (m?: string) => (m ? <span className="text-sm text-danger">{m}</span> : null);
  const submit = handleSubmit((v) => {
    setMessage(null);
    const item: PriceBookItemInput = {
      code: v.code, name: v.name, family: v.family, appliesTo: v.appliesTo, effect: effectOf(v),
      costs: { fixedMaterials: 0, fixedLabour: 0, perM2Materials: v.perM2Materials, perM2Labour: v.perM2Labour, perItemMaterials: v.perItemMaterials, perItemLabour: v.perItemLabour },
      labourHours: v.labourHours,
    };
    add.mutate(item, {
      onSuccess: () => {
        setMessage(`Added “${v.name}”.`);
        form.reset();
      },
      onError: (e) => setMessage(applyServerErrors(e, form.setError, ["code", "name", "family", "appliesTo", "labourHours"])),
    });
  });
  return (
    <form className="grid gap-3 sm:grid-cols-3" onSubmit={(e) => void submit(e)} noValidate aria-label="Add an upgrade">
      <label className="flex flex-col gap-1 text-sm font-medium">Code<input className={input} aria-invalid={errors.code ? true : undefined} {...register("code")} />{err(errors.code?.message)}</label>
      <label className="flex flex-col gap-1 text-sm font-medium sm:col-span-2">Name<input className={input} aria-invalid={errors.name ? true : undefined} {...register("name")} />{err(errors.name?.message)}</label>
      <label className="flex flex-col gap-1 text-sm font-medium">Family
        <select className={input} {...register("family")}>{Object.entries(familyLabels).map(([k, l]) => <option key={k} value={k}>{l}</option>)}</select>
      </label>
      <label className="flex flex-col gap-1 text-sm font-medium">Effect
        <select className={input} {...register("effectKind")}>
          <option value="added-layer">adds TL (dB)</option>
          <option value="duct-attenuation">duct attenuation (dB)</option>
          <option value="impact-improvement">impact ΔL (dB)</option>
          <option value="sealed-gap">seals a gap</option>
          <option value="construction">becomes a catalogue construction</option>
        </select>
      </label>
      <label className="flex flex-col gap-1 text-sm font-medium">Figure, gap or construction<input className={input} aria-invalid={errors.effectValue ? true : undefined} {...register("effectValue")} />{err(errors.effectValue?.message)}</label>
      <fieldset className="flex flex-wrap gap-x-3 text-sm sm:col-span-3">
        <legend className="mb-1 font-medium">Applies to</legend>
        {KINDS.map((k) => <label key={k} className="flex min-h-11 items-center gap-1.5"><input type="checkbox" value={k} className="size-5 accent-brand" {...register("appliesTo")} />{k}</label>)}
        {err(errors.appliesTo?.message)}
      </fieldset>
      {(["perM2Materials", "perM2Labour", "perItemMaterials", "perItemLabour", "labourHours"] as const).map((name) => (
        <label key={name} className="flex flex-col gap-1 text-sm font-medium">
          {{ perM2Materials: "Materials / m²", perM2Labour: "Labour / m²", perItemMaterials: "Materials / item", perItemLabour: "Labour / item", labourHours: "Labour hours" }[name]}
          <input className={input} type="number" step="any" aria-invalid={errors[name] ? true : undefined} {...register(name, { valueAsNumber: true })} />
          {err(errors[name]?.message)}
        </label>
      ))}
      <div className="flex items-center gap-3 sm:col-span-3">
        <Button type="submit" pending={add.isPending}>Add to the price book</Button>
        {message ? <span role="status" className="text-sm">{message}</span> : null}
      </div>
    </form>
  );
}
