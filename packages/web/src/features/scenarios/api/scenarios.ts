import { analysisResultSchema, optionSearchStatusSchema, scenarioListSchema, scenarioSchema, type AnalysisRequest, type OptionSearchInput, type ScenarioInput } from "@hushmark/schemas";
import { queryOptions, useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { api, apiRequest } from "../../../lib/api-client";
import { projectKeys } from "../../projects/api/keys";

const base = (projectId: string) => `/projects/${encodeURIComponent(projectId)}`;

export const scenarioKeys = {
  all: (projectId: string) => [...projectKeys.detail(projectId), "scenarios"] as const,
  list: (projectId: string) => [...scenarioKeys.all(projectId), "list"] as const,
  weakLinks: (projectId: string, request: AnalysisRequest) => [...scenarioKeys.all(projectId), "weak-links", request] as const,
  search: (projectId: string, id: string) => [...scenarioKeys.all(projectId), "search", id] as const,
};

export const scenariosQueryOptions = (projectId: string) => queryOptions({ queryKey: scenarioKeys.list(projectId), queryFn: ({ signal }) => api.get(`${base(projectId)}/scenarios`, scenarioListSchema, signal) });
export const useScenarios = (projectId: string) => useQuery(scenariosQueryOptions(projectId));

/** The weak links of the plan for the chosen source and receiver (the analysis API). */
export function useWeakLinks(projectId: string, request: AnalysisRequest | null) {
  return useQuery({
    queryKey: request ? scenarioKeys.weakLinks(projectId, request) : [...scenarioKeys.all(projectId), "weak-links", "none"],
    queryFn: () => api.post(`${base(projectId)}/analyses`, request, analysisResultSchema),
    enabled: request !== null,
    staleTime: Infinity,
    retry: false,
  });
}

export function useSaveScenario(projectId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: ({ id, input }: { id: string | null; input: ScenarioInput }) =>
      id ? api.patch(`${base(projectId)}/scenarios/${id}`, input, scenarioSchema) : api.post(`${base(projectId)}/scenarios`, input, scenarioSchema),
    onSuccess: () => qc.invalidateQueries({ queryKey: scenarioKeys.list(projectId) }),
  });
}

export function useDeleteScenario(projectId: string) {
  const qc = useQueryClient();
  return useMutation({ mutationFn: (id: string) => api.delete(`${base(projectId)}/scenarios/${id}`), onSuccess: () => qc.invalidateQueries({ queryKey: scenarioKeys.list(projectId) }) });
}

export const startOptionSearch = (projectId: string, input: OptionSearchInput) => api.post(`${base(projectId)}/option-searches`, input, optionSearchStatusSchema);
export const cancelOptionSearch = (projectId: string, id: string) => apiRequest(`${base(projectId)}/option-searches/${id}`, { method: "DELETE", schema: optionSearchStatusSchema });

/** Polls a running search every half second until it ends. */
export function useOptionSearch(projectId: string, id: string | null) {
  return useQuery({
    queryKey: scenarioKeys.search(projectId, id ?? "none"),
    queryFn: ({ signal }) => api.get(`${base(projectId)}/option-searches/${id}`, optionSearchStatusSchema, signal),
    enabled: id !== null,
    refetchInterval: (q) => (q.state.data?.status === "running" || !q.state.data ? 500 : false),
    retry: false,
  });
}
