import { projectSchema, type Project, type ProjectUpdate } from "@hushmark/schemas";
import { useMutation, useQueryClient } from "@tanstack/react-query";
import { api } from "../../../lib/api-client";
import { projectKeys } from "./keys";

export function updateProject(projectId: string, patch: ProjectUpdate): Promise<Project> {
  return api.patch(`/projects/${encodeURIComponent(projectId)}`, patch, projectSchema);
}

export function useUpdateProject(projectId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (patch: ProjectUpdate) => updateProject(projectId, patch),
    onSuccess: (project) => {
      // The plan query nests under the detail key; only the project record changed.
      queryClient.setQueryData(projectKeys.detail(project.id), project);
      return queryClient.invalidateQueries({ queryKey: projectKeys.lists() });
    },
  });
}
