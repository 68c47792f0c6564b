import { projectInputSchema, siteLocationSchema, type Project } from "@hushmark/schemas";
import { useEffect, useState, type FormEvent } from "react";
import { Button } from "../../../components/ui/button";
import { Dialog } from "../../../components/ui/dialog";
import { FormMessage, Input } from "../../../components/ui/field";
import { isApiError } from "../../../lib/api-client";
import { useUpdateProject } from "../api/update-project";

type Fields = { title: string; siteAddress: string; latDeg: string; lonDeg: string; bearingDeg: string };
const fieldsOf = (p: Project): Fields => ({
  title: p.title,
  siteAddress: p.siteAddress,
  latDeg: p.site ? String(p.site.latDeg) : "",
  lonDeg: p.site ? String(p.site.lonDeg) : "",
  bearingDeg: p.site ? String(p.site.planNorthBearingDeg) : "0",
});
/** A typed number, or text zod refuses with its own message ("" stays text so an empty box is reported). */
const numberOrText = (s: string): unknown => (s.trim() === "" || Number.isNaN(Number(s.replace(",", "."))) ? s : Number(s.replace(",", ".")));

/**
 * The project's title, address and site location: latitude and longitude of the plan origin and
 * which way the Sketch's top edge faces, so map exports land in the right place.
 */
export function ProjectSettingsDialog({ open, onClose, project }: { open: boolean; onClose: () => void; project: Project }) {
  const update = useUpdateProject(project.id);
  const [fields, setFields] = useState<Fields>(() => fieldsOf(project));
  const [errors, setErrors] = useState<Partial<Record<keyof Fields, string>>>({});
  const [formError, setFormError] = useState<string | null>(null);
  useEffect(() => { if (open) { setFields(fieldsOf(project)); setErrors({}); setFormError(null); } }, [open, project]);
  const set = (k: keyof Fields) => (e: { target: { value: string } }) => {
    setFields((f) => ({ ...f, [k]: e.target.value }));
    // A message about the old value would mislead once the person types again.
    setErrors(({ [k]: _gone, ...rest }) => rest);
  };

  const submit = async (e: FormEvent) => {
    e.preventDefault();
    const found: Partial<Record<keyof Fields, string>> = {};
    const head = projectInputSchema.pick({ title: true, siteAddress: true }).safeParse({ title: fields.title, siteAddress: fields.siteAddress });
    if (!head.success) for (const i of head.error.issues) found[i.path[0] as keyof Fields] = i.message;
    const noSite = fields.latDeg.trim() === "" && fields.lonDeg.trim() === "";
    const site = noSite ? null : siteLocationSchema.safeParse({ latDeg: numberOrText(fields.latDeg), lonDeg: numberOrText(fields.lonDeg), planNorthBearingDeg: numberOrText(fields.bearingDeg || "0") });
    if (site && !site.success) {
      for (const i of site.error.issues) found[i.path[0] === "planNorthBearingDeg" ? "bearingDeg" : (i.path[0] as keyof Fields)] = i.message;
    }
    setErrors(found);
    if (Object.keys(found).length > 0 || !head.success) return;
    setFormError(null);
    try {
      await update.mutateAsync({ ...head.data, site: site && site.success ? site.data : null });
      onClose();
    } catch (error) {
      setFormError(isApiError(error) ? error.message : "The settings could not be saved. Try again.");
    }
  };

  return (
    <Dialog open={open} onClose={onClose} title="Project settings" description="The site location places map exports (GeoJSON) on the Earth; without it they use a local frame.">
      <form noValidate onSubmit={(e) => void submit(e)} className="flex flex-col gap-4" aria-label="Project settings">
        <FormMessage>{formError}</FormMessage>
        <Input label="Title" value={fields.title} onChange={set("title")} error={errors.title} />
        <Input label="Site address" autoComplete="street-address" value={fields.siteAddress} onChange={set("siteAddress")} error={errors.siteAddress} />
        <fieldset className="flex flex-col gap-3">
          <legend className="text-sm font-medium">Site location (the plan origin)</legend>
          <div className="grid grid-cols-2 gap-3">
            <Input label="Latitude, degrees north" inputMode="decimal" placeholder="e.g. 51.4545" value={fields.latDeg} onChange={set("latDeg")} error={errors.latDeg} />
            <Input label="Longitude, degrees east" inputMode="decimal" placeholder="e.g. -2.5879" value={fields.lonDeg} onChange={set("lonDeg")} error={errors.lonDeg} />
          </div>
          <Input label="Top of the Sketch faces, degrees clockwise from true north" inputMode="decimal" value={fields.bearingDeg} onChange={set("bearingDeg")} error={errors.bearingDeg} hint="0 when north is up on the Sketch; 90 when the top edge faces east." />
          <p className="text-sm text-muted">South and west are negative. Leave latitude and longitude empty to use no site location.</p>
        </fieldset>
        <div className="flex justify-end gap-2 pt-2">
          <Button variant="secondary" onClick={onClose}>Cancel</Button>
          <Button type="submit" pending={update.isPending}>Save settings</Button>
        </div>
      </form>
    </Dialog>
  );
}
