import { pipeline } from "node:stream/promises";
import { projectIdParamSchema, underlayFieldsSchema, underlayParamSchema } from "@hushmark/schemas";
import { receiveUpload, type UploadRules } from "../files/uploads.js";
import { parse } from "../http/parse.js";
import type { RouteSpec } from "../http/routes.js";
import { UNDERLAY_MAX_BYTES, UNDERLAY_TYPES, type UnderlaysService } from "./underlays.service.js";

const WRITERS = ["owner", "surveyor"] as const;

/** Underlay image routes, mounted under `/projects`. */
export function underlayRoutes(underlays: UnderlaysService, limits: { maxBytes?: number } = {}): RouteSpec[] {
  const rules: UploadRules = {
    maxBytes: limits.maxBytes ?? UNDERLAY_MAX_BYTES, accept: UNDERLAY_TYPES,
    what: "an image to trace (PNG, JPEG or WebP; in the Sketch a PDF page or a HEIC photo is turned into one before it is sent)",
  };
  return [
    { method: "get", path: "/:projectId/underlays", access: "signed-in", handler: async ({ req, actor }) => ({ underlays: await underlays.list(actor, parse(projectIdParamSchema, req.params).projectId) }) },
    {
      method: "post", path: "/:projectId/underlays", access: [...WRITERS], status: 201,
      handler: async ({ req, res, actor }) => {
        const { projectId } = parse(projectIdParamSchema, req.params);
        const upload = await receiveUpload(req, res, rules);
        try {
          return await underlays.create(actor, projectId, upload, parse(underlayFieldsSchema, upload.fields));
        } finally {
          await upload.discard();
        }
      },
    },
    {
      method: "get", path: "/:projectId/underlays/:underlayId/image", access: "signed-in",
      handler: async ({ req, res, actor }) => {
        const { projectId, underlayId } = parse(underlayParamSchema, req.params);
        const img = await underlays.image(actor, projectId, underlayId);
        res.status(200).type(img.contentType).set({ "content-length": String(img.sizeBytes), "cache-control": "private, max-age=86400", "x-content-type-options": "nosniff" });
        await pipeline(img.body, res);
        return undefined;
      },
    },
    {
      method: "delete", path: "/:projectId/underlays/:underlayId", access: [...WRITERS],
      handler: async ({ req, actor }) => {
        const { projectId, underlayId } = parse(underlayParamSchema, req.params);
        await underlays.remove(actor, projectId, underlayId);
        return undefined;
      },
    },
  ];
}
