import { zodResolver } from "@hookform/resolvers/zod";
import { PASSWORD_MIN_LENGTH, acceptInvitationSchema, type InvitationPreview, type Me } from "@hushmark/schemas";
import { useState } from "react";
import { useForm } from "react-hook-form";
import type { z } from "zod";
import { Button } from "../../../components/ui/button";
import { FormMessage, Input } from "../../../components/ui/field";
import { applyServerErrors } from "../../../lib/form-errors";
import { useAcceptInvitation } from "../api/accept-invitation";

type Values = z.input<typeof acceptInvitationSchema>;

function placeholderName(email: string): string {
  return (email.split("@")[0] ?? "").slice(0, 120) || "Member";
}

export function AcceptInvitationForm({ token, preview, onAccepted }: { token: string; preview: InvitationPreview; onAccepted: (me: Me) => void }) {
  const [formError, setFormError] = useState<string | null>(null);
  const accept = useAcceptInvitation();
  const { register, handleSubmit, setError, formState } = useForm<Values, unknown, z.output<typeof acceptInvitationSchema>>({
    resolver: zodResolver(acceptInvitationSchema),
    // Someone who already has an account keeps their name; the schema still wants one, and the
    // server ignores it for them, so fill it quietly instead of asking.
    defaultValues: { token, displayName: preview.existingUser ? placeholderName(preview.email) : "", password: "" },
  });

  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    try {
      onAccepted(await accept.mutateAsync(values));
    } catch (error) {
      setFormError(applyServerErrors(error, setError, ["displayName", "password"]));
    }
  });

  return (
    <form noValidate onSubmit={onSubmit} className="flex flex-col gap-4" aria-label="Accept the invitation">
      <FormMessage>{formError ?? (formState.errors.token?.message || null)}</FormMessage>
      <Input label="E-mail" type="email" value={preview.email} readOnly autoComplete="username" hint="The invitation was sent to this address." />
      {preview.existingUser ? null : <Input label="Your name" autoComplete="name" error={formState.errors.displayName?.message} {...register("displayName")} />}
      <Input
        label="Password"
        type="password"
        autoComplete={preview.existingUser ? "current-password" : "new-password"}
        hint={preview.existingUser ? "You already have a Hushmark account with this e-mail: enter its password." : `Choose one of at least ${PASSWORD_MIN_LENGTH} characters.`}
        error={formState.errors.password?.message}
        {...register("password")}
      />
      <Button type="submit" pending={accept.isPending} className="w-full">
        Accept and continue
      </Button>
    </form>
  );
}
