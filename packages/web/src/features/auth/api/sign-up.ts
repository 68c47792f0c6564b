import { meSchema, type Me, type SignUpInput } from "@hushmark/schemas";
import { useMutation, useQueryClient } from "@tanstack/react-query";
import { api } from "../../../lib/api-client";
import { authKeys } from "./keys";

export function signUp(input: SignUpInput): Promise<Me> {
  return api.post("/auth/sign-up", input, meSchema, { skipRefresh: true });
}

export function useSignUp() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signUp,
    onSuccess: (me) => {
      queryClient.clear();
      queryClient.setQueryData(authKeys.me(), me);
    },
  });
}
