import type { Readable } from "node:stream";
import sharp, { type Metadata } from "sharp";
import type { DataSource } from "typeorm";
import type { UnderlayFields, UnderlayFile as UnderlayFileDto } from "@hushmark/schemas";
import type { Actor } from "../auth/actor.js";
import type { FilesService } from "../files/files.service.js";
import type { StoredFile } from "../files/stored-file.entity.js";
import type { ReceivedUpload } from "../files/uploads.js";
import { conflict, HttpError, notFound } from "../http/errors.js";
import type { ProjectsService } from "../projects/projects.service.js";
import { UnderlayFile } from "./underlay-file.entity.js";

/**
 * Images only: a PDF page is rendered to PNG and a HEIC photo converted in the browser before it
 * is sent, so the server decodes nothing but what sharp reads and stores exactly what is drawn.
 */
export const UNDERLAY_TYPES = ["image/png", "image/jpeg", "image/webp"] as const;
/** 25 MB: a 6000 × 4000 px scan as PNG fits with room to spare. */
export const UNDERLAY_MAX_BYTES = 25 * 1024 * 1024;
/** 64 megapixels (8000 × 8000): beyond what tracing needs, and it bounds the memory a decode takes. */
export const UNDERLAY_MAX_PIXELS = 64_000_000;

function toDto(u: UnderlayFile, file: StoredFile): UnderlayFileDto {
  return {
    id: u.id, projectId: u.projectId, name: u.name, source: u.source, page: u.page, contentType: file.contentType, sizeBytes: file.sizeBytes,
    widthPx: u.widthPx, heightPx: u.heightPx, createdAt: new Date(u.createdAt).toISOString(),
  };
}

const unreadable = () => new HttpError(415, "unsupported_media_type", "The image could not be read; it may be damaged or cut short. Nothing was saved.");

/** Reads the image's size and decodes it once whole, so a damaged or truncated file is refused before anything is stored. */
async function checkedImageSize(path: string, maxPixels: number): Promise<{ widthPx: number; heightPx: number }> {
  let meta: Metadata;
  try {
    meta = await sharp(path).metadata();
  } catch {
    throw unreadable();
  }
  const widthPx = meta.width, heightPx = meta.height;
  if (!widthPx || !heightPx) throw unreadable();
  if (widthPx * heightPx > maxPixels) {
    throw new HttpError(413, "too_large", `The image is ${widthPx} × ${heightPx} px, more than the ${Math.round(maxPixels / 1e6)}-megapixel limit for an underlay. Save it smaller (about 6000 px on the long side is plenty to trace) and upload it again. Nothing was saved.`);
  }
  try {
    await sharp(path, { failOn: "error", limitInputPixels: maxPixels }).resize(64, 64, { fit: "inside" }).raw().toBuffer();
  } catch {
    throw unreadable();
  }
  return { widthPx, heightPx };
}

/** Underlay images of a project: upload, list, read and delete; the placements live in the plan. */
export function createUnderlaysService(dataSource: DataSource, projects: ProjectsService, files: FilesService, limits: { maxPixels?: number } = {}) {
  const repo = dataSource.getRepository(UnderlayFile);
  const maxPixels = limits.maxPixels ?? UNDERLAY_MAX_PIXELS;

  async function find(actor: Actor, projectId: string, id: string): Promise<UnderlayFile> {
    await projects.get(actor, projectId);
    const u = await repo.findOne({ where: { id, projectId, organizationId: actor.organizationId }, relations: { file: true } });
    if (!u) throw notFound("That underlay");
    return u;
  }

  async function list(actor: Actor, projectId: string): Promise<UnderlayFileDto[]> {
    await projects.get(actor, projectId);
    const rows = await repo.find({ where: { projectId, organizationId: actor.organizationId }, relations: { file: true }, order: { createdAt: "ASC", id: "ASC" } });
    return rows.map((u) => toDto(u, u.file!));
  }

  async function create(actor: Actor, projectId: string, upload: ReceivedUpload, fields: UnderlayFields): Promise<UnderlayFileDto> {
    await projects.get(actor, projectId);
    const size = await checkedImageSize(upload.path, maxPixels);
    const stored = await files.store(actor, projectId, files.fromDisk(upload.path, upload));
    try {
      const name = fields.name || upload.originalName.replace(/\.[A-Za-z0-9]{1,5}$/, "");
      const u = await repo.save(repo.create({
        organizationId: actor.organizationId, projectId, fileId: stored.id, name: name.slice(0, 200), source: fields.source,
        page: fields.source === "pdf-page" ? (fields.page ?? null) : null, ...size, createdById: actor.userId,
      }));
      return toDto(u, stored);
    } catch (error) {
      await (await dataSource.transaction((m) => files.remove(m, stored)))();
      throw error;
    }
  }

  async function image(actor: Actor, projectId: string, id: string): Promise<{ contentType: string; sizeBytes: number; body: Readable }> {
    const u = await find(actor, projectId, id);
    return { contentType: u.file!.contentType, sizeBytes: u.file!.sizeBytes, body: await files.open(u.file!) };
  }

  /** Deletes the image for good, unless the saved plan still places it (then it is taken off the plan first, which can be undone). */
  async function remove(actor: Actor, projectId: string, id: string): Promise<void> {
    const u = await find(actor, projectId, id);
    const placed: unknown[] = await dataSource.query(
      `SELECT 1 FROM plans WHERE project_id = $1 AND jsonb_typeof(document->'underlays') = 'array' AND document->'underlays' @> $2::jsonb`,
      [projectId, JSON.stringify([{ fileId: id }])],
    );
    if (placed.length) throw conflict("underlay_in_use", "This drawing is still on the plan. Remove it from the plan in the Sketch first, then delete the file.");
    const cleanup = await dataSource.transaction(async (manager) => {
      await manager.getRepository(UnderlayFile).delete({ id: u.id });
      return files.remove(manager, u.file!);
    });
    await cleanup();
  }

  return { list, create, image, remove };
}

export type UnderlaysService = ReturnType<typeof createUnderlaysService>;
