import { zodResolver } from "@hookform/resolvers/zod";
import { ROLES, inviteSchema } from "@hushmark/schemas";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { toast } from "sonner";
import type { z } from "zod";
import { Button } from "../../../components/ui/button";
import { FormMessage, Input, Select } from "../../../components/ui/field";
import { applyServerErrors } from "../../../lib/form-errors";
import { roleDescriptions, roleLabels } from "../../../lib/format";
import { useInvitePerson } from "../api/invite-person";

type Values = z.input<typeof inviteSchema>;

// Staff roles first: inviting colleagues is the common case, an owner the rare one.
const roleOptions = [...ROLES.filter((role) => role !== "owner"), "owner" as const].map((role) => ({ value: role, label: `${roleLabels[role]} — ${roleDescriptions[role]}` }));

export function InviteForm() {
  const [formError, setFormError] = useState<string | null>(null);
  const invite = useInvitePerson();
  const { register, handleSubmit, setError, formState, reset } = useForm<Values, unknown, z.output<typeof inviteSchema>>({
    resolver: zodResolver(inviteSchema),
    defaultValues: { email: "", role: "surveyor", displayName: undefined },
  });

  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    try {
      const invitation = await invite.mutateAsync(values);
      toast.success(`Invitation sent to ${invitation.email}.`);
      reset({ email: "", role: values.role, displayName: undefined });
    } catch (error) {
      setFormError(applyServerErrors(error, setError, ["email", "role", "displayName"]));
    }
  });

  return (
    <form noValidate onSubmit={onSubmit} className="flex flex-col gap-4" aria-label="Invite someone">
      <FormMessage>{formError}</FormMessage>
      <div className="grid gap-4 md:grid-cols-2 lg:grid-cols-1">
        <Input label="E-mail" type="email" autoComplete="off" inputMode="email" error={formState.errors.email?.message} {...register("email")} />
        <Input
          label="Name (optional)"
          autoComplete="off"
          error={formState.errors.displayName?.message}
          {...register("displayName", { setValueAs: (value: unknown) => (typeof value === "string" && value.trim() === "" ? undefined : value) })}
        />
      </div>
      <Select label="Role" options={roleOptions} error={formState.errors.role?.message} {...register("role")} />
      <div>
        <Button type="submit" pending={invite.isPending}>
          Send invitation
        </Button>
      </div>
    </form>
  );
}
