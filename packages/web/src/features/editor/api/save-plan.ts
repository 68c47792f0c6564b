import { planResponseSchema, type PlanResponse } from "@hushmark/schemas";
import type { SaveOutcome, SaveTransport } from "@hushmark/editor-core";
import { api, isApiError } from "../../../lib/api-client";

export function savePlan(projectId: string, document: unknown, baseVersion: number, message?: string): Promise<PlanResponse> {
  return api.put(`/projects/${encodeURIComponent(projectId)}/plan`, { baseVersion, document, ...(message ? { message } : {}) }, planResponseSchema);
}

function currentVersionOf(details: unknown): number | null {
  if (details && typeof details === "object" && "currentVersion" in details) {
    const v = (details as { currentVersion: unknown }).currentVersion;
    if (typeof v === "number") return v;
  }
  return null;
}

/** The autosave machine's view of PUT /plan: 409 is a conflict, no answer or a 5xx is "offline, retry". */
export function planTransport(projectId: string, onSaved?: (response: PlanResponse) => void): SaveTransport {
  return {
    async save(document, baseVersion): Promise<SaveOutcome> {
      if (typeof navigator !== "undefined" && navigator.onLine === false) return { kind: "offline" };
      try {
        const response = await savePlan(projectId, document, baseVersion);
        onSaved?.(response);
        return { kind: "saved", version: response.version };
      } catch (error) {
        if (!isApiError(error)) return { kind: "offline" };
        if (error.status === 409) return { kind: "conflict", currentVersion: currentVersionOf(error.details) ?? baseVersion + 1 };
        if (error.status === 0 || error.status >= 500 || error.status === 429) return { kind: "offline" };
        return { kind: "rejected", message: error.message };
      }
    },
  };
}
