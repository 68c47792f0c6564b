import { projectSchema, type Project } from "@hushmark/schemas";
import { queryOptions, useQuery } from "@tanstack/react-query";
import { api } from "../../../lib/api-client";
import { projectKeys } from "./keys";

export function getProject(projectId: string, signal?: AbortSignal): Promise<Project> {
  return api.get(`/projects/${encodeURIComponent(projectId)}`, projectSchema, signal);
}

export const projectQueryOptions = (projectId: string) =>
  queryOptions({
    queryKey: projectKeys.detail(projectId),
    queryFn: ({ signal }) => getProject(projectId, signal),
  });

export function useProject(projectId: string) {
  return useQuery(projectQueryOptions(projectId));
}
