import { memberSchema, type Member, type Role } from "@hushmark/schemas";
import { useMutation, useQueryClient } from "@tanstack/react-query";
import { api } from "../../../lib/api-client";
import { projectKeys } from "../../projects/api/keys";
import { peopleKeys } from "./keys";

export function changeRole({ membershipId, role }: { membershipId: string; role: Role }): Promise<Member> {
  return api.patch(`/people/members/${encodeURIComponent(membershipId)}`, { role }, memberSchema);
}

export function useChangeRole() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: changeRole,
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: peopleKeys.lists() }),
        // A client who becomes staff (or back) changes who appears on projects.
        queryClient.invalidateQueries({ queryKey: projectKeys.all }),
      ]),
  });
}
