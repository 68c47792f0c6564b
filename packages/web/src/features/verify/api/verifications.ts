import { verificationListSchema, verificationSchema } from "@hushmark/schemas";
import { queryOptions, useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { api } from "../../../lib/api-client";
import { projectKeys } from "../../projects/api/keys";

export const verificationKeys = { list: (projectId: string) => [...projectKeys.detail(projectId), "verifications"] as const };

export const verificationsQueryOptions = (projectId: string) =>
  queryOptions({ queryKey: verificationKeys.list(projectId), queryFn: ({ signal }) => api.get(`/projects/${encodeURIComponent(projectId)}/verifications`, verificationListSchema, signal) });
export const useVerifications = (projectId: string) => useQuery(verificationsQueryOptions(projectId));

export function useAddVerification(projectId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: { proposalId: string; beforeLevelsDb: number[]; afterLevelsDb: number[]; note: string }) => api.post(`/projects/${encodeURIComponent(projectId)}/verifications`, input, verificationSchema),
    onSuccess: () => qc.invalidateQueries({ queryKey: projectKeys.detail(projectId) }),
  });
}

export const reportUrl = (projectId: string, id: string) => `/api/v1/projects/${encodeURIComponent(projectId)}/verifications/${id}/report`;
