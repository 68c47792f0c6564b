import { photoListSchema, photoSchema, type Photo } from "@hushmark/schemas";
import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { api, API_BASE, ApiError } from "../../../lib/api-client";
import { projectKeys } from "../../projects/api/keys";

const base = (projectId: string) => `/projects/${encodeURIComponent(projectId)}`;
export const jobPhotoKeys = { list: (projectId: string) => [...projectKeys.detail(projectId), "job-photos"] as const };

/** The project's photos (the photo API of Measure), read here to show each work order's own. */
export function useJobPhotos(projectId: string) {
  return useQuery({ queryKey: jobPhotoKeys.list(projectId), queryFn: ({ signal }) => api.get(`${base(projectId)}/photos`, photoListSchema, signal).then((r) => r.photos) });
}

export function useUploadJobPhoto(projectId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: async ({ file, elementId, caption }: { file: File; elementId: string; caption: string }): Promise<Photo> => {
      const body = new FormData();
      body.append("elementId", elementId);
      body.append("caption", caption);
      body.append("file", file);
      // Uploads are multipart; the server asks for this header on them instead of a JSON body type.
      const res = await fetch(`${API_BASE}${base(projectId)}/photos`, { method: "POST", body, credentials: "same-origin", headers: { "X-Hushmark-Upload": "1", Accept: "application/json" } });
      const json: unknown = await res.json().catch(() => null);
      if (!res.ok) {
        const e = (json as { error?: { code?: string; message?: string } } | null)?.error;
        throw new ApiError({ status: res.status, code: e?.code ?? "upload_failed", message: e?.message ?? "The photo was not uploaded." });
      }
      return photoSchema.parse(json);
    },
    onSuccess: () => qc.invalidateQueries({ queryKey: jobPhotoKeys.list(projectId) }),
  });
}

export const jobPhotoUrl = (projectId: string, id: string) => `${API_BASE}${base(projectId)}/photos/${encodeURIComponent(id)}/image?size=thumb`;
