import { invitationSchema, type Invitation, type InviteInput } from "@hushmark/schemas";
import { useMutation, useQueryClient } from "@tanstack/react-query";
import { api } from "../../../lib/api-client";
import { peopleKeys } from "./keys";

export function invitePerson(input: InviteInput): Promise<Invitation> {
  return api.post("/people/invitations", input, invitationSchema);
}

export function useInvitePerson() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: invitePerson,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: peopleKeys.lists() }),
  });
}
