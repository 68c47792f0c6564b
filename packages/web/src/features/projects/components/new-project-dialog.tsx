import { zodResolver } from "@hookform/resolvers/zod";
import { projectInputSchema, type Project } from "@hushmark/schemas";
import { useState } from "react";
import { useForm } from "react-hook-form";
import type { z } from "zod";
import { Button } from "../../../components/ui/button";
import { Dialog } from "../../../components/ui/dialog";
import { FormMessage, Input } from "../../../components/ui/field";
import { applyServerErrors } from "../../../lib/form-errors";
import { useCreateProject } from "../api/create-project";

type Values = z.input<typeof projectInputSchema>;

export function NewProjectDialog({ open, onClose, onCreated }: { open: boolean; onClose: () => void; onCreated: (project: Project) => void }) {
  const [formError, setFormError] = useState<string | null>(null);
  const create = useCreateProject();
  const { register, handleSubmit, setError, formState, reset } = useForm<Values, unknown, z.output<typeof projectInputSchema>>({
    resolver: zodResolver(projectInputSchema),
    defaultValues: { title: "", siteAddress: "" },
  });

  const close = () => {
    reset();
    setFormError(null);
    onClose();
  };

  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    try {
      const project = await create.mutateAsync(values);
      reset();
      onCreated(project);
    } catch (error) {
      setFormError(applyServerErrors(error, setError, ["title", "siteAddress"]));
    }
  });

  return (
    <Dialog open={open} onClose={close} title="New project" description="Start with a title and the site; the brief, sketch and measurements follow inside the project.">
      <form noValidate onSubmit={onSubmit} className="flex flex-col gap-4" aria-label="New project">
        <FormMessage>{formError}</FormMessage>
        <Input label="Title" placeholder="e.g. Studio party wall" autoFocus error={formState.errors.title?.message} {...register("title")} />
        <Input label="Site address" autoComplete="street-address" error={formState.errors.siteAddress?.message} {...register("siteAddress")} />
        <div className="flex justify-end gap-2 pt-2">
          <Button variant="secondary" onClick={close}>
            Cancel
          </Button>
          <Button type="submit" pending={create.isPending}>
            Create project
          </Button>
        </div>
      </form>
    </Dialog>
  );
}
