import { zodResolver } from "@hookform/resolvers/zod";
import { signInSchema, type Me } from "@hushmark/schemas";
import { useState } from "react";
import { useForm } from "react-hook-form";
import type { z } from "zod";
import { Button } from "../../../components/ui/button";
import { FormMessage, Input } from "../../../components/ui/field";
import { applyServerErrors } from "../../../lib/form-errors";
import { useSignIn } from "../api/sign-in";

type Values = z.input<typeof signInSchema>;

export function SignInForm({ onSignedIn }: { onSignedIn: (me: Me) => void }) {
  const [formError, setFormError] = useState<string | null>(null);
  const signIn = useSignIn();
  const { register, handleSubmit, setError, formState } = useForm<Values, unknown, z.output<typeof signInSchema>>({
    resolver: zodResolver(signInSchema),
    defaultValues: { email: "", password: "" },
  });

  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    try {
      onSignedIn(await signIn.mutateAsync(values));
    } catch (error) {
      setFormError(applyServerErrors(error, setError, ["email", "password"]));
    }
  });

  return (
    <form noValidate onSubmit={onSubmit} className="flex flex-col gap-4" aria-label="Sign in">
      <FormMessage>{formError}</FormMessage>
      <Input label="E-mail" type="email" autoComplete="username" inputMode="email" error={formState.errors.email?.message} {...register("email")} />
      <Input label="Password" type="password" autoComplete="current-password" error={formState.errors.password?.message} {...register("password")} />
      <Button type="submit" pending={signIn.isPending} className="w-full">
        Sign in
      </Button>
    </form>
  );
}
