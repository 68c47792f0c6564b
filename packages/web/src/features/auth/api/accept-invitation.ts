import { meSchema, type AcceptInvitationInput, type Me } from "@hushmark/schemas";
import { useMutation, useQueryClient } from "@tanstack/react-query";
import { api } from "../../../lib/api-client";
import { authKeys } from "./keys";

export function acceptInvitation(input: AcceptInvitationInput): Promise<Me> {
  return api.post("/invitations/accept", input, meSchema, { skipRefresh: true });
}

export function useAcceptInvitation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: acceptInvitation,
    onSuccess: (me) => {
      queryClient.clear();
      queryClient.setQueryData(authKeys.me(), me);
    },
  });
}
