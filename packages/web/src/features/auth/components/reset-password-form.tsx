import { zodResolver } from "@hookform/resolvers/zod";
import { PASSWORD_MIN_LENGTH, passwordSchema } from "@hushmark/schemas";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { z } from "zod";
import { Button } from "../../../components/ui/button";
import { FormMessage, Input } from "../../../components/ui/field";
import { applyServerErrors } from "../../../lib/form-errors";
import { useResetPassword } from "../api/reset-password";

// The token comes from the link, not the form; a second entry catches a typo in a hidden field.
const resetFormSchema = z
  .object({ password: passwordSchema, confirmPassword: z.string() })
  .refine((values) => values.password === values.confirmPassword, { path: ["confirmPassword"], message: "The two passwords differ." });

type Values = z.input<typeof resetFormSchema>;

export function ResetPasswordForm({ token, onReset }: { token: string; onReset: () => void }) {
  const [formError, setFormError] = useState<string | null>(null);
  const reset = useResetPassword();
  const { register, handleSubmit, setError, formState } = useForm<Values, unknown, z.output<typeof resetFormSchema>>({
    resolver: zodResolver(resetFormSchema),
    defaultValues: { password: "", confirmPassword: "" },
  });

  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    try {
      await reset.mutateAsync({ token, password: values.password });
      onReset();
    } catch (error) {
      setFormError(applyServerErrors(error, setError, ["password"]));
    }
  });

  return (
    <form noValidate onSubmit={onSubmit} className="flex flex-col gap-4" aria-label="Choose a new password">
      <FormMessage>{formError}</FormMessage>
      <Input
        label="New password"
        type="password"
        autoComplete="new-password"
        hint={`At least ${PASSWORD_MIN_LENGTH} characters.`}
        error={formState.errors.password?.message}
        {...register("password")}
      />
      <Input label="Repeat password" type="password" autoComplete="new-password" error={formState.errors.confirmPassword?.message} {...register("confirmPassword")} />
      <Button type="submit" pending={reset.isPending} className="w-full">
        Save new password
      </Button>
    </form>
  );
}
