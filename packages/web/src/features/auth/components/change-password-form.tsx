import { zodResolver } from "@hookform/resolvers/zod";
import { PASSWORD_MIN_LENGTH, passwordChangeSchema } from "@hushmark/schemas";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { toast } from "sonner";
import type { z } from "zod";
import { Button } from "../../../components/ui/button";
import { FormMessage, Input } from "../../../components/ui/field";
import { applyServerErrors } from "../../../lib/form-errors";
import { useChangePassword } from "../api/change-password";

type Values = z.input<typeof passwordChangeSchema>;

export function ChangePasswordForm() {
  const [formError, setFormError] = useState<string | null>(null);
  const change = useChangePassword();
  const { register, handleSubmit, setError, formState, reset } = useForm<Values, unknown, z.output<typeof passwordChangeSchema>>({
    resolver: zodResolver(passwordChangeSchema),
    defaultValues: { currentPassword: "", newPassword: "" },
  });

  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    try {
      await change.mutateAsync(values);
      reset();
      toast.success("Password changed. Other devices have been signed out.");
    } catch (error) {
      setFormError(applyServerErrors(error, setError, ["currentPassword", "newPassword"]));
    }
  });

  return (
    <form noValidate onSubmit={onSubmit} className="flex max-w-md flex-col gap-4" aria-label="Change password">
      <FormMessage>{formError}</FormMessage>
      <Input label="Current password" type="password" autoComplete="current-password" error={formState.errors.currentPassword?.message} {...register("currentPassword")} />
      <Input
        label="New password"
        type="password"
        autoComplete="new-password"
        hint={`At least ${PASSWORD_MIN_LENGTH} characters. Saving it signs you out on every other device.`}
        error={formState.errors.newPassword?.message}
        {...register("newPassword")}
      />
      <div>
        <Button type="submit" pending={change.isPending}>
          Change password
        </Button>
      </div>
    </form>
  );
}
