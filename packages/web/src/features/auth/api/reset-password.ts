import type { PasswordResetInput } from "@hushmark/schemas";
import { useMutation } from "@tanstack/react-query";
import { api } from "../../../lib/api-client";

export function resetPassword(input: PasswordResetInput): Promise<void> {
  return api.post<void>("/auth/password-reset", input, undefined, { skipRefresh: true });
}

export function useResetPassword() {
  return useMutation({ mutationFn: resetPassword });
}
