import { briefResponseSchema, type Brief, type BriefResponse } from "@hushmark/schemas";
import { queryOptions, useQuery } from "@tanstack/react-query";
import { api } from "../../../lib/api-client";

export const briefKeys = {
  all: ["brief"] as const,
  detail: (projectId: string) => [...briefKeys.all, projectId] as const,
};

export function getBrief(projectId: string, signal?: AbortSignal): Promise<BriefResponse> {
  return api.get(`/projects/${encodeURIComponent(projectId)}/brief`, briefResponseSchema, signal);
}

export function saveBrief(projectId: string, baseVersion: number, brief: Brief): Promise<BriefResponse> {
  return api.put(`/projects/${encodeURIComponent(projectId)}/brief`, { baseVersion, brief }, briefResponseSchema);
}

export const briefQueryOptions = (projectId: string) => queryOptions({ queryKey: briefKeys.detail(projectId), queryFn: ({ signal }) => getBrief(projectId, signal) });

export function useBrief(projectId: string) {
  // Read once per visit: the form owns the brief from then on, and refetches would fight autosave.
  return useQuery({ ...briefQueryOptions(projectId), staleTime: Infinity, refetchOnWindowFocus: false });
}
