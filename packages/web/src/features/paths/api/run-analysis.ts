import { analysisResultSchema, type AnalysisRequest, type AnalysisResult } from "@hushmark/schemas";
import { keepPreviousData, queryOptions, useQuery } from "@tanstack/react-query";
import { api } from "../../../lib/api-client";
import { projectKeys } from "../../projects/api/keys";

export const analysisKeys = {
  all: (projectId: string) => [...projectKeys.detail(projectId), "analysis"] as const,
  /** One analysis per plan version and inputs: editing the plan makes a new key, so a new request. */
  detail: (projectId: string, request: AnalysisRequest) => [...analysisKeys.all(projectId), request.planVersion, request.source, request.receiverId, request.target ?? null, request.paths ?? 5] as const,
};

export function runAnalysis(projectId: string, request: AnalysisRequest): Promise<AnalysisResult> {
  return api.post(`/projects/${encodeURIComponent(projectId)}/analyses`, request, analysisResultSchema);
}

/** The same analysis drawn by the server as a one-page PDF for print. */
export function analysisDrawing(projectId: string, request: AnalysisRequest): Promise<Blob> {
  return api.postForFile(`/projects/${encodeURIComponent(projectId)}/analyses/drawing`, request);
}

export const analysisQueryOptions = (projectId: string, request: AnalysisRequest | null) =>
  queryOptions({
    queryKey: request ? analysisKeys.detail(projectId, request) : [...analysisKeys.all(projectId), "none"],
    queryFn: () => runAnalysis(projectId, request!),
    enabled: request !== null,
    // While a new analysis runs the old one stays on screen, dimmed.
    placeholderData: keepPreviousData,
    staleTime: Infinity,
    retry: false,
  });

export function useAnalysis(projectId: string, request: AnalysisRequest | null) {
  return useQuery(analysisQueryOptions(projectId, request));
}
