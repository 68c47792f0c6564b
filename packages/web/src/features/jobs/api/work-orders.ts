import { workOrderListSchema } from "@hushmark/schemas";
import { queryOptions, useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { api } from "../../../lib/api-client";
import { projectKeys } from "../../projects/api/keys";

export const workOrderKeys = { list: (projectId: string) => [...projectKeys.detail(projectId), "work-orders"] as const };

export const workOrdersQueryOptions = (projectId: string) =>
  queryOptions({ queryKey: workOrderKeys.list(projectId), queryFn: ({ signal }) => api.get(`/projects/${encodeURIComponent(projectId)}/work-orders`, workOrderListSchema, signal) });
export const useWorkOrders = (projectId: string) => useQuery(workOrdersQueryOptions(projectId));

export function useUpdateTask(projectId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: ({ taskId, patch }: { taskId: string; patch: { status?: "todo" | "doing" | "done"; assigneeMembershipId?: string | null; assignToMe?: true } }) => api.patch(`/work-order-tasks/${taskId}`, patch, workOrderListSchema),
    onSuccess: (data) => qc.setQueryData(workOrderKeys.list(projectId), data),
  });
}
