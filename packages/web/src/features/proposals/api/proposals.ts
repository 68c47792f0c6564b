import { depositStartResultSchema, proposalListSchema, proposalSchema, type Proposal } from "@hushmark/schemas";
import { queryOptions, useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { api } from "../../../lib/api-client";
import { projectKeys } from "../../projects/api/keys";

export const proposalKeys = {
  all: ["proposals"] as const,
  project: (projectId: string) => [...projectKeys.detail(projectId), "proposals"] as const,
  detail: (id: string) => [...proposalKeys.all, id] as const,
};

export const projectProposalsQueryOptions = (projectId: string) =>
  queryOptions({ queryKey: proposalKeys.project(projectId), queryFn: ({ signal }) => api.get(`/projects/${encodeURIComponent(projectId)}/proposals`, proposalListSchema, signal) });
export const useProjectProposals = (projectId: string) => useQuery(projectProposalsQueryOptions(projectId));

export const proposalQueryOptions = (id: string) => queryOptions({ queryKey: proposalKeys.detail(id), queryFn: ({ signal }) => api.get(`/proposals/${encodeURIComponent(id)}`, proposalSchema, signal) });

/** A proposal; while its PDF is being made or a payment is pending it is read again every 2 s. */
export function useProposal(id: string | null) {
  return useQuery({
    ...proposalQueryOptions(id ?? "none"),
    enabled: id !== null,
    refetchInterval: (q) => {
      const p = q.state.data;
      if (!p) return false;
      const waiting = p.versions.some((v) => v.pdf === "pending") || (p.status === "approved" && p.payments.some((x) => x.status === "pending"));
      return waiting ? 2000 : false;
    },
  });
}

function useProposalMutation<T>(fn: (input: T) => Promise<Proposal>, projectId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: fn,
    onSuccess: (p) => {
      qc.setQueryData(proposalKeys.detail(p.id), p);
      void qc.invalidateQueries({ queryKey: proposalKeys.project(projectId) });
    },
  });
}

export const useCreateProposal = (projectId: string) =>
  useProposalMutation((input: { scenarioId: string; note: string }) => api.post(`/projects/${encodeURIComponent(projectId)}/proposals`, input, proposalSchema), projectId);
export const useUpdateProposal = (projectId: string, id: string) => useProposalMutation((patch: { note?: string; validUntil?: string; scenarioId?: string }) => api.patch(`/proposals/${id}`, patch, proposalSchema), projectId);
export const useSendProposal = (projectId: string, id: string) => useProposalMutation(() => api.post(`/proposals/${id}/send`, {}, proposalSchema), projectId);
export const useCommentProposal = (projectId: string, id: string) => useProposalMutation((body: string) => api.post(`/proposals/${id}/comments`, { body }, proposalSchema), projectId);
export const useApproveProposal = (projectId: string, id: string) => useProposalMutation((input: { version: number; comment: string }) => api.post(`/proposals/${id}/approve`, input, proposalSchema), projectId);
export const useAskChanges = (projectId: string, id: string) => useProposalMutation((input: { version: number; comment: string }) => api.post(`/proposals/${id}/changes`, input, proposalSchema), projectId);

export const startDeposit = (id: string, version: number) => api.post(`/proposals/${id}/deposit`, { version }, depositStartResultSchema);
export const pdfUrl = (id: string, version: number) => `/api/v1/proposals/${encodeURIComponent(id)}/versions/${version}/pdf`;
