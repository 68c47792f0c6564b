import { projectListSchema, type Project } from "@hushmark/schemas";
import { queryOptions, useQuery } from "@tanstack/react-query";
import { api } from "../../../lib/api-client";
import { projectKeys } from "./keys";

export async function getProjects(signal?: AbortSignal): Promise<Project[]> {
  const { projects } = await api.get("/projects", projectListSchema, signal);
  return projects;
}

export const projectsQueryOptions = () =>
  queryOptions({
    queryKey: projectKeys.list(),
    queryFn: ({ signal }) => getProjects(signal),
  });

export function useProjects() {
  return useQuery(projectsQueryOptions());
}
