import {
  csvPreviewSchema, measurementDetailSchema, measurementListSchema, measurementSchema, photoListSchema, photoSchema,
  type CsvPreview, type Measurement, type MeasurementDetail, type MeasurementInput, type MeasurementUpdate, type Photo,
} from "@hushmark/schemas";
import { queryOptions, useQuery } from "@tanstack/react-query";
import { API_BASE, ApiError, api } from "../../../lib/api-client";

const base = (projectId: string) => `/projects/${encodeURIComponent(projectId)}`;

export const measurementKeys = {
  all: ["measurements"] as const,
  lists: () => [...measurementKeys.all, "list"] as const,
  list: (projectId: string) => [...measurementKeys.lists(), projectId] as const,
  details: () => [...measurementKeys.all, "detail"] as const,
  detail: (projectId: string, id: string) => [...measurementKeys.details(), projectId, id] as const,
  photos: (projectId: string) => [...measurementKeys.all, "photos", projectId] as const,
};

export const measurementsQueryOptions = (projectId: string) =>
  queryOptions({
    queryKey: measurementKeys.list(projectId),
    queryFn: ({ signal }) => api.get(`${base(projectId)}/measurements`, measurementListSchema, signal).then((r) => r.measurements),
    refetchInterval: (q) => (q.state.data?.some((m) => m.status === "processing") ? 1500 : false),
  });

export function useMeasurements(projectId: string) {
  return useQuery(measurementsQueryOptions(projectId));
}

/** One measurement with its history; polls while its recording is analysed. */
export function useMeasurement(projectId: string, id: string | null) {
  return useQuery({
    queryKey: measurementKeys.detail(projectId, id ?? "none"),
    queryFn: ({ signal }) => api.get(`${base(projectId)}/measurements/${encodeURIComponent(id!)}`, measurementDetailSchema, signal),
    enabled: id !== null,
    refetchInterval: (q) => (q.state.data?.status === "processing" ? 700 : false),
  });
}

export function usePhotos(projectId: string) {
  return useQuery({ queryKey: measurementKeys.photos(projectId), queryFn: ({ signal }) => api.get(`${base(projectId)}/photos`, photoListSchema, signal).then((r) => r.photos) });
}

export const previewCsv = (projectId: string, text: string): Promise<CsvPreview> => api.post(`${base(projectId)}/measurements/csv-preview`, { text }, csvPreviewSchema);
export const createMeasurement = (projectId: string, input: MeasurementInput): Promise<Measurement> => api.post(`${base(projectId)}/measurements`, input, measurementSchema);
export const updateMeasurement = (projectId: string, id: string, patch: MeasurementUpdate): Promise<MeasurementDetail> =>
  api.patch(`${base(projectId)}/measurements/${encodeURIComponent(id)}`, patch, measurementDetailSchema);
export const deleteMeasurement = (projectId: string, id: string) => api.delete(`${base(projectId)}/measurements/${encodeURIComponent(id)}`);
export const deletePhoto = (projectId: string, id: string) => api.delete(`${base(projectId)}/photos/${encodeURIComponent(id)}`);

export const csvUrl = (projectId: string, id: string) => `${API_BASE}${base(projectId)}/measurements/${encodeURIComponent(id)}/csv`;
export const audioUrl = (projectId: string, id: string, startS: number, durationS: number) =>
  `${API_BASE}${base(projectId)}/measurements/${encodeURIComponent(id)}/audio?startS=${startS}&durationS=${durationS}`;
export const photoUrl = (projectId: string, id: string, size: "thumb" | "full") => `${API_BASE}${base(projectId)}/photos/${encodeURIComponent(id)}/image?size=${size}`;

/**
 * Sends a file as multipart with upload progress (fetch has none). Answers the parsed body;
 * refusals become ApiErrors with the server's message.
 */
export function uploadFile<T>(path: string, file: File, fields: Record<string, string>, schema: { parse: (v: unknown) => T }, onProgress: (fraction: number) => void): Promise<T> {
  return new Promise((resolve, reject) => {
    const form = new FormData();
    for (const [k, v] of Object.entries(fields)) form.append(k, v);
    form.append("file", file);
    const xhr = new XMLHttpRequest();
    xhr.open("POST", `${API_BASE}${path}`);
    xhr.setRequestHeader("X-Hushmark-Upload", "1");
    xhr.setRequestHeader("Accept", "application/json");
    xhr.upload.onprogress = (e) => e.lengthComputable && onProgress(e.loaded / e.total);
    xhr.onerror = () => reject(new ApiError({ status: 0, code: "network_error", message: "The upload stopped: check the connection and try again. Nothing was saved." }));
    xhr.onload = () => {
      let body: unknown = null;
      try {
        body = JSON.parse(xhr.responseText);
      } catch {
        // not JSON
      }
      if (xhr.status >= 200 && xhr.status < 300) return resolve(schema.parse(body));
      const err = (body as { error?: { code: string; message: string; details?: unknown } } | null)?.error;
      reject(new ApiError({ status: xhr.status, code: err?.code ?? "upload_failed", message: err?.message ?? (xhr.status === 413 ? "The file is too large." : "The upload was refused."), details: err?.details }));
    };
    xhr.send(form);
  });
}

export const uploadRecording = (projectId: string, file: File, fields: Record<string, string>, onProgress: (f: number) => void) =>
  uploadFile(`${base(projectId)}/recordings`, file, fields, measurementSchema, onProgress);
export const uploadPhoto = (projectId: string, file: File, fields: Record<string, string>, onProgress: (f: number) => void): Promise<Photo> =>
  uploadFile(`${base(projectId)}/photos`, file, fields, photoSchema, onProgress);

export type { Measurement, MeasurementDetail };
