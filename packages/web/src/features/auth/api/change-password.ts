import type { PasswordChangeInput } from "@hushmark/schemas";
import { useMutation } from "@tanstack/react-query";
import { api } from "../../../lib/api-client";

/** Ends every other session of the person; the server signs this one in again. */
export function changePassword(input: PasswordChangeInput): Promise<void> {
  return api.post<void>("/auth/password", input);
}

export function useChangePassword() {
  return useMutation({ mutationFn: changePassword });
}
