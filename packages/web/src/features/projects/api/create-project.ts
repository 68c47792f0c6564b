import { projectSchema, type Project, type ProjectInput } from "@hushmark/schemas";
import { useMutation, useQueryClient } from "@tanstack/react-query";
import { api } from "../../../lib/api-client";
import { projectKeys } from "./keys";

export function createProject(input: ProjectInput): Promise<Project> {
  return api.post("/projects", input, projectSchema);
}

export function useCreateProject() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createProject,
    onSuccess: (project) => {
      queryClient.setQueryData(projectKeys.detail(project.id), project);
      return queryClient.invalidateQueries({ queryKey: projectKeys.lists() });
    },
  });
}
