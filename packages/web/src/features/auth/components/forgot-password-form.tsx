import { zodResolver } from "@hookform/resolvers/zod";
import { passwordResetRequestSchema } from "@hushmark/schemas";
import { useState } from "react";
import { useForm } from "react-hook-form";
import type { z } from "zod";
import { Button } from "../../../components/ui/button";
import { FormMessage, Input } from "../../../components/ui/field";
import { applyServerErrors } from "../../../lib/form-errors";
import { useRequestPasswordReset } from "../api/request-password-reset";

type Values = z.input<typeof passwordResetRequestSchema>;

export function ForgotPasswordForm() {
  const [formError, setFormError] = useState<string | null>(null);
  const [sentTo, setSentTo] = useState<string | null>(null);
  const request = useRequestPasswordReset();
  const { register, handleSubmit, setError, formState } = useForm<Values, unknown, z.output<typeof passwordResetRequestSchema>>({
    resolver: zodResolver(passwordResetRequestSchema),
    defaultValues: { email: "" },
  });

  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    try {
      await request.mutateAsync(values);
      setSentTo(values.email);
    } catch (error) {
      setFormError(applyServerErrors(error, setError, ["email"]));
    }
  });

  if (sentTo) {
    // The server answers the same whether or not the address has an account, and so do we.
    return (
      <div role="status" className="flex flex-col gap-2 rounded-md border border-good/40 bg-good/5 p-4">
        <p className="font-semibold">Check your mail</p>
        <p className="text-sm">
          If <strong>{sentTo}</strong> has a Hushmark account, a link to choose a new password is on its way. It works for a limited time.
        </p>
      </div>
    );
  }

  return (
    <form noValidate onSubmit={onSubmit} className="flex flex-col gap-4" aria-label="Ask for a reset link">
      <FormMessage>{formError}</FormMessage>
      <Input label="E-mail" type="email" autoComplete="email" inputMode="email" error={formState.errors.email?.message} {...register("email")} />
      <Button type="submit" pending={request.isPending} className="w-full">
        Send reset link
      </Button>
    </form>
  );
}
