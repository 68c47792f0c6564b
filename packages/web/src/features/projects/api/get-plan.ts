import { planResponseSchema, type PlanResponse } from "@hushmark/schemas";
import { queryOptions, useQuery } from "@tanstack/react-query";
import { api } from "../../../lib/api-client";
import { projectKeys } from "./keys";

export function getPlan(projectId: string, signal?: AbortSignal): Promise<PlanResponse> {
  return api.get(`/projects/${encodeURIComponent(projectId)}/plan`, planResponseSchema, signal);
}

export const planQueryOptions = (projectId: string) =>
  queryOptions({
    queryKey: projectKeys.plan(projectId),
    queryFn: ({ signal }) => getPlan(projectId, signal),
  });

export function usePlan(projectId: string) {
  return useQuery(planQueryOptions(projectId));
}
