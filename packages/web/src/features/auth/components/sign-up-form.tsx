import { zodResolver } from "@hookform/resolvers/zod";
import { PASSWORD_MIN_LENGTH, signUpSchema, type Me } from "@hushmark/schemas";
import { useState } from "react";
import { useForm } from "react-hook-form";
import type { z } from "zod";
import { Button } from "../../../components/ui/button";
import { FormMessage, Input } from "../../../components/ui/field";
import { applyServerErrors } from "../../../lib/form-errors";
import { useSignUp } from "../api/sign-up";

type Values = z.input<typeof signUpSchema>;

export function SignUpForm({ onSignedUp }: { onSignedUp: (me: Me) => void }) {
  const [formError, setFormError] = useState<string | null>(null);
  const signUp = useSignUp();
  const { register, handleSubmit, setError, formState } = useForm<Values, unknown, z.output<typeof signUpSchema>>({
    resolver: zodResolver(signUpSchema),
    defaultValues: { firmName: "", displayName: "", email: "", password: "" },
  });

  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    try {
      onSignedUp(await signUp.mutateAsync(values));
    } catch (error) {
      setFormError(applyServerErrors(error, setError, ["firmName", "displayName", "email", "password"]));
    }
  });

  return (
    <form noValidate onSubmit={onSubmit} className="flex flex-col gap-4" aria-label="Create your firm">
      <FormMessage>{formError}</FormMessage>
      <Input label="Firm name" autoComplete="organization" error={formState.errors.firmName?.message} {...register("firmName")} />
      <Input label="Your name" autoComplete="name" error={formState.errors.displayName?.message} {...register("displayName")} />
      <Input label="E-mail" type="email" autoComplete="email" inputMode="email" error={formState.errors.email?.message} {...register("email")} />
      <Input
        label="Password"
        type="password"
        autoComplete="new-password"
        hint={`At least ${PASSWORD_MIN_LENGTH} characters. A few unrelated words make a strong one.`}
        error={formState.errors.password?.message}
        {...register("password")}
      />
      <Button type="submit" pending={signUp.isPending} className="w-full">
        Create firm
      </Button>
    </form>
  );
}
