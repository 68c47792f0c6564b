import { useMutation, useQueryClient } from "@tanstack/react-query";
import { api } from "../../../lib/api-client";
import { peopleKeys } from "./keys";

export function revokeInvitation(invitationId: string): Promise<void> {
  return api.delete(`/people/invitations/${encodeURIComponent(invitationId)}`);
}

export function useRevokeInvitation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: revokeInvitation,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: peopleKeys.lists() }),
  });
}
