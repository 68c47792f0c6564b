import { useCallback } from "react";
import { underlayFileListSchema, underlayFileSchema, type UnderlayFile } from "@hushmark/schemas";
import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { api, API_BASE, ApiError } from "../../../lib/api-client";
import { projectKeys } from "../../projects/api/keys";

const base = (projectId: string) => `/projects/${encodeURIComponent(projectId)}/underlays`;
export const underlayKeys = { list: (projectId: string) => [...projectKeys.detail(projectId), "underlays"] as const };

export const underlayImageUrl = (projectId: string, id: string) => `${API_BASE}${base(projectId)}/${encodeURIComponent(id)}/image`;

/** A stable `fileId → image URL` for the canvas layer (a new function each render would redraw it). */
export function useUnderlaySrc(projectId: string) {
  return useCallback((fileId: string) => underlayImageUrl(projectId, fileId), [projectId]);
}

/** The project's uploaded drawings, placed on the plan or not. */
export function useUnderlayFiles(projectId: string, enabled = true) {
  return useQuery({ queryKey: underlayKeys.list(projectId), enabled, queryFn: ({ signal }) => api.get(base(projectId), underlayFileListSchema, signal).then((r) => r.underlays) });
}

export interface UnderlayUpload {
  blob: Blob;
  fileName: string;
  name: string;
  source: "image" | "pdf-page";
  page?: number;
}

export function useUploadUnderlay(projectId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: async (u: UnderlayUpload): Promise<UnderlayFile> => {
      const body = new FormData();
      body.append("name", u.name);
      body.append("source", u.source);
      if (u.page !== undefined) body.append("page", String(u.page));
      body.append("file", u.blob, u.fileName);
      // Uploads are multipart; the server asks for this header on them instead of a JSON body type.
      const res = await fetch(`${API_BASE}${base(projectId)}`, { method: "POST", body, credentials: "same-origin", headers: { "X-Hushmark-Upload": "1", Accept: "application/json" } });
      const json: unknown = await res.json().catch(() => null);
      if (!res.ok) {
        const e = (json as { error?: { code?: string; message?: string } } | null)?.error;
        throw new ApiError({ status: res.status, code: e?.code ?? "upload_failed", message: e?.message ?? "The drawing was not uploaded; nothing was added." });
      }
      return underlayFileSchema.parse(json);
    },
    onSuccess: () => qc.invalidateQueries({ queryKey: underlayKeys.list(projectId) }),
  });
}

export function useDeleteUnderlayFile(projectId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (id: string) => api.delete(`${base(projectId)}/${encodeURIComponent(id)}`),
    onSettled: () => qc.invalidateQueries({ queryKey: underlayKeys.list(projectId) }),
  });
}
