import { useMutation, useQueryClient } from "@tanstack/react-query";
import { api } from "../../../lib/api-client";

export function signOut(): Promise<void> {
  return api.post<void>("/auth/sign-out", {}, undefined, { skipRefresh: true });
}

export function useSignOut() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signOut,
    // Forget the session's data even if the server could not be reached: this device is done with it.
    onSettled: () => queryClient.clear(),
  });
}
