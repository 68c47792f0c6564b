import { meSchema, type Me, type SignInInput } from "@hushmark/schemas";
import { useMutation, useQueryClient } from "@tanstack/react-query";
import { api } from "../../../lib/api-client";
import { authKeys } from "./keys";

export function signIn(input: SignInInput): Promise<Me> {
  // A 401 here means a wrong e-mail or password, not an expired session.
  return api.post("/auth/sign-in", input, meSchema, { skipRefresh: true });
}

export function useSignIn() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signIn,
    onSuccess: (me) => {
      // Whatever an earlier user left in the cache belongs to them.
      queryClient.clear();
      queryClient.setQueryData(authKeys.me(), me);
    },
  });
}
