import { useQueryClient } from "@tanstack/react-query";
import { useEffect } from "react";
import { matchPath } from "react-router-dom";
import { planQueryOptions } from "./get-plan";

const PLAN_SECTIONS = ["/projects/:projectId/sketch", "/projects/:projectId/paths"];

/** The project id whose plan the page at `pathname` draws first, if any. */
export function planProjectFor(pathname: string): string | null {
  for (const pattern of PLAN_SECTIONS) {
    const match = matchPath(pattern, pathname);
    if (match?.params.projectId) return match.params.projectId;
  }
  return null;
}

/**
 * Starts the plan download as soon as the address is known — beside the session check and the
 * project's own request, not after them — so a large plan is on its way while the editor's code
 * loads. The plan query's stale time makes the section's own request reuse this one.
 */
export function useEarlyPlan(pathname: string): void {
  const queryClient = useQueryClient();
  const projectId = planProjectFor(pathname);
  useEffect(() => {
    if (projectId) void queryClient.prefetchQuery(planQueryOptions(projectId));
  }, [projectId, queryClient]);
}
