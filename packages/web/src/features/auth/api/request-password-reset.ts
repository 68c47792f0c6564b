import type { PasswordResetRequestInput } from "@hushmark/schemas";
import { useMutation } from "@tanstack/react-query";
import { api } from "../../../lib/api-client";

export function requestPasswordReset(input: PasswordResetRequestInput): Promise<void> {
  return api.post<void>("/auth/password-reset/request", input, undefined, { skipRefresh: true });
}

export function useRequestPasswordReset() {
  return useMutation({ mutationFn: requestPasswordReset });
}
