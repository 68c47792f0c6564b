import { invitationPreviewSchema, type InvitationPreview } from "@hushmark/schemas";
import { queryOptions, useQuery } from "@tanstack/react-query";
import { api } from "../../../lib/api-client";
import { authKeys } from "./keys";

export function getInvitation(token: string, signal?: AbortSignal): Promise<InvitationPreview> {
  return api.get(`/invitations/${encodeURIComponent(token)}`, invitationPreviewSchema, signal);
}

export const invitationQueryOptions = (token: string) =>
  queryOptions({
    queryKey: authKeys.invitation(token),
    queryFn: ({ signal }) => getInvitation(token, signal),
    staleTime: Infinity,
  });

export function useInvitation(token: string) {
  return useQuery(invitationQueryOptions(token));
}
