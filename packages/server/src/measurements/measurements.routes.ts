import { pipeline } from "node:stream/promises";
import {
  audioExcerptQuerySchema, csvPreviewInputSchema, measurementInputSchema, measurementParamSchema, measurementUpdateSchema, photoFieldsSchema,
  photoImageQuerySchema, photoParamSchema, projectIdParamSchema, recordingFieldsSchema,
} from "@hushmark/schemas";
import type { AppConfig } from "../config.js";
import { receiveUpload, type UploadRules } from "../files/uploads.js";
import { parse } from "../http/parse.js";
import type { RouteSpec } from "../http/routes.js";
import type { MeasurementsService } from "./measurements.service.js";
import { PHOTO_TYPES, type PhotosService } from "./photos.service.js";

const WRITERS = ["owner", "surveyor"] as const;

/** Measurement, recording and photo routes, mounted under `/projects`. */
export function measurementRoutes(measurements: MeasurementsService, photos: PhotosService, limits: AppConfig["uploads"]): RouteSpec[] {
  const recordingRules: UploadRules = { maxBytes: limits.maxRecordingBytes, accept: ["audio/wav", "audio/vnd.wave", "audio/x-wav"], what: "a WAV recording" };
  const photoRules: UploadRules = { maxBytes: limits.maxPhotoBytes, accept: PHOTO_TYPES, what: "a photo (JPEG, PNG or WebP)" };
  const ids = (params: unknown) => parse(measurementParamSchema, params);

  return [
    { method: "get", path: "/:projectId/measurements", access: "signed-in", handler: async ({ req, actor }) => ({ measurements: await measurements.list(actor, parse(projectIdParamSchema, req.params).projectId) }) },
    {
      method: "post", path: "/:projectId/measurements", access: [...WRITERS], status: 201,
      handler: async ({ req, actor }) => measurements.create(actor, parse(projectIdParamSchema, req.params).projectId, parse(measurementInputSchema, req.body)),
    },
    {
      method: "post", path: "/:projectId/measurements/csv-preview", access: [...WRITERS],
      handler: async ({ req, actor }) => measurements.previewCsv(actor, parse(projectIdParamSchema, req.params).projectId, parse(csvPreviewInputSchema, req.body).text),
    },
    { method: "get", path: "/:projectId/measurements/:measurementId", access: "signed-in", handler: async ({ req, actor }) => measurements.get(actor, ids(req.params).projectId, ids(req.params).measurementId) },
    {
      method: "patch", path: "/:projectId/measurements/:measurementId", access: [...WRITERS],
      handler: async ({ req, actor }) => {
        const { projectId, measurementId } = ids(req.params);
        return measurements.update(actor, projectId, measurementId, parse(measurementUpdateSchema, req.body));
      },
    },
    {
      method: "delete", path: "/:projectId/measurements/:measurementId", access: [...WRITERS],
      handler: async ({ req, actor }) => {
        const { projectId, measurementId } = ids(req.params);
        await measurements.remove(actor, projectId, measurementId);
        return undefined;
      },
    },
    {
      method: "get", path: "/:projectId/measurements/:measurementId/csv", access: "signed-in",
      handler: async ({ req, res, actor }) => {
        const { projectId, measurementId } = ids(req.params);
        const { filename, text } = await measurements.exportCsv(actor, projectId, measurementId);
        res.type("text/csv").attachment(filename).send(text);
        return undefined;
      },
    },
    {
      method: "get", path: "/:projectId/measurements/:measurementId/audio", access: "signed-in",
      handler: async ({ req, res, actor }) => {
        const { projectId, measurementId } = ids(req.params);
        const { startS, durationS } = parse(audioExcerptQuerySchema, req.query);
        const { header, body } = await measurements.audioExcerpt(actor, projectId, measurementId, startS, durationS);
        res.status(200).type("audio/wav").set("cache-control", "private, max-age=3600");
        res.write(header);
        if (body) await pipeline(body, res);
        else res.end();
        return undefined;
      },
    },
    {
      method: "post", path: "/:projectId/recordings", access: [...WRITERS], status: 202,
      handler: async ({ req, res, actor }) => {
        const { projectId } = parse(projectIdParamSchema, req.params);
        const upload = await receiveUpload(req, res, recordingRules);
        try {
          return await measurements.createFromRecording(actor, projectId, upload, parse(recordingFieldsSchema, upload.fields));
        } finally {
          await upload.discard();
        }
      },
    },
    { method: "get", path: "/:projectId/photos", access: "signed-in", handler: async ({ req, actor }) => ({ photos: await photos.list(actor, parse(projectIdParamSchema, req.params).projectId) }) },
    {
      method: "post", path: "/:projectId/photos", access: [...WRITERS], status: 201,
      handler: async ({ req, res, actor }) => {
        const { projectId } = parse(projectIdParamSchema, req.params);
        const upload = await receiveUpload(req, res, photoRules);
        try {
          return await photos.create(actor, projectId, upload, parse(photoFieldsSchema, upload.fields));
        } finally {
          await upload.discard();
        }
      },
    },
    {
      method: "get", path: "/:projectId/photos/:photoId/image", access: "signed-in",
      handler: async ({ req, res, actor }) => {
        const { projectId, photoId } = parse(photoParamSchema, req.params);
        const { size } = parse(photoImageQuerySchema, req.query);
        const img = await photos.image(actor, projectId, photoId, size);
        res.status(200).type(img.contentType).set({ "content-length": String(img.sizeBytes), "cache-control": "private, max-age=86400", "x-content-type-options": "nosniff" });
        await pipeline(img.body, res);
        return undefined;
      },
    },
    {
      method: "delete", path: "/:projectId/photos/:photoId", access: [...WRITERS],
      handler: async ({ req, actor }) => {
        const { projectId, photoId } = parse(photoParamSchema, req.params);
        await photos.remove(actor, projectId, photoId);
        return undefined;
      },
    },
  ];
}
