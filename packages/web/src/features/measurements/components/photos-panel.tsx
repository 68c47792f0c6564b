import { useQueryClient } from "@tanstack/react-query";
import { useState } from "react";
import { Input, Select } from "../../../components/ui/field";
import type { PlanPlaces } from "../api/plan-places";
import { deletePhoto, measurementKeys, photoUrl, uploadPhoto, usePhotos } from "../api/measurements";
import { ProgressBar } from "./progress-bar";

/** Photos of leaks and weak spots for a measurement (or a plan element). */
export function PhotosPanel({ projectId, measurementId, canEdit, places }: { projectId: string; measurementId: string; canEdit: boolean; places: PlanPlaces }) {
  const photos = usePhotos(projectId);
  const queryClient = useQueryClient();
  const [caption, setCaption] = useState("");
  const [elementId, setElementId] = useState("");
  const [sent, setSent] = useState<number | null>(null);
  const [error, setError] = useState<string | null>(null);
  const mine = (photos.data ?? []).filter((p) => p.measurementId === measurementId);

  async function add(file: File) {
    setError(null);
    setSent(0);
    try {
      await uploadPhoto(projectId, file, { measurementId, caption, elementId }, setSent);
      setCaption("");
      await queryClient.invalidateQueries({ queryKey: measurementKeys.photos(projectId) });
    } catch (e) {
      setError(e instanceof Error ? e.message : "The photo was not saved.");
    } finally {
      setSent(null);
    }
  }

  return (
    <section className="flex flex-col gap-3" aria-label="Photos">
      <h3 className="text-base font-semibold">Photos</h3>
      {mine.length === 0 ? <p className="text-sm text-muted">No photos for this measurement.</p> : (
        <ul className="grid grid-cols-2 gap-3 sm:grid-cols-4">
          {mine.map((p) => (
            <li key={p.id} className="flex flex-col gap-1">
              <a href={photoUrl(projectId, p.id, "full")} target="_blank" rel="noreferrer">
                <img src={photoUrl(projectId, p.id, "thumb")} alt={p.caption || "Photo"} className="aspect-[4/3] w-full rounded-md border border-rule object-cover" loading="lazy" />
              </a>
              <span className="text-sm">{p.caption || <span className="text-muted">No caption</span>}{p.elementId ? <span className="text-muted"> · {places.nameOf(p.elementId)}</span> : null}</span>
              {canEdit ? <button type="button" className="self-start text-sm text-danger hover:underline" onClick={() => void deletePhoto(projectId, p.id).then(() => queryClient.invalidateQueries({ queryKey: measurementKeys.photos(projectId) }))}>Remove</button> : null}
            </li>
          ))}
        </ul>
      )}
      {canEdit ? (
        <div className="grid items-end gap-3 md:grid-cols-[1fr_12rem_auto]">
          <Input label="Caption" placeholder="e.g. 6 mm gap under the door" value={caption} onChange={(e) => setCaption(e.target.value)} />
          <Select label="Plan element (optional)" value={elementId} onChange={(e) => setElementId(e.target.value)} options={[{ value: "", label: places.elements.length ? "None" : "No elements on the plan yet" }, ...places.elements.map((el) => ({ value: el.id, label: el.label }))]} />
          <label className="inline-flex min-h-11 cursor-pointer items-center justify-center rounded-md border border-rule bg-panel px-4 text-[15px] font-medium hover:border-muted">
            Add a photo
            <input type="file" accept="image/jpeg,image/png,image/webp" className="sr-only" onChange={(e) => e.target.files?.[0] && void add(e.target.files[0])} />
          </label>
        </div>
      ) : null}
      {sent !== null ? <ProgressBar value={sent} label="Uploading the photo" /> : null}
      {error ? <p className="text-sm font-medium text-danger" role="alert">{error}</p> : null}
      {photos.isError ? <p className="text-sm text-danger">The photos did not load.</p> : null}
    </section>
  );
}
