import { useMutation, useQueryClient } from "@tanstack/react-query";
import { api } from "../../../lib/api-client";
import { projectKeys } from "../../projects/api/keys";
import { peopleKeys } from "./keys";

export function removeMember(membershipId: string): Promise<void> {
  return api.delete(`/people/members/${encodeURIComponent(membershipId)}`);
}

export function useRemoveMember() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: removeMember,
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: peopleKeys.lists() }),
        queryClient.invalidateQueries({ queryKey: projectKeys.all }),
      ]),
  });
}
