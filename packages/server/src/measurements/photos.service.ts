import { createHash } from "node:crypto";
import { Readable } from "node:stream";
import sharp from "sharp";
import type { DataSource } from "typeorm";
import type { Photo as PhotoDto, photoFieldsSchema } from "@hushmark/schemas";
import type { z } from "zod";
import type { Actor } from "../auth/actor.js";
import type { FilesService } from "../files/files.service.js";
import { StoredFile } from "../files/stored-file.entity.js";
import type { ReceivedUpload } from "../files/uploads.js";
import { HttpError, notFound } from "../http/errors.js";
import type { ProjectsService } from "../projects/projects.service.js";
import { Measurement } from "./measurement.entity.js";
import { Photo } from "./photo.entity.js";

export const PHOTO_TYPES = ["image/jpeg", "image/png", "image/webp"] as const;
const THUMB_PX = 320;

function toDto(p: Photo, file: StoredFile): PhotoDto {
  return {
    id: p.id, projectId: p.projectId, elementId: p.elementId, measurementId: p.measurementId, caption: p.caption,
    contentType: file.contentType, sizeBytes: file.sizeBytes, width: p.width, height: p.height, createdAt: new Date(p.createdAt).toISOString(),
  };
}

/** Photos of leaks and weak spots, with a thumbnail made on upload. */
export function createPhotosService(dataSource: DataSource, projects: ProjectsService, files: FilesService) {
  const repo = dataSource.getRepository(Photo);

  async function list(actor: Actor, projectId: string): Promise<PhotoDto[]> {
    await projects.get(actor, projectId);
    const photos = await repo.find({ where: { projectId, organizationId: actor.organizationId }, relations: { file: true }, order: { createdAt: "ASC" } });
    return photos.map((p) => toDto(p, p.file!));
  }

  async function create(actor: Actor, projectId: string, upload: ReceivedUpload, fields: z.infer<typeof photoFieldsSchema>): Promise<PhotoDto> {
    await projects.get(actor, projectId);
    if (fields.measurementId && !(await dataSource.getRepository(Measurement).existsBy({ id: fields.measurementId, projectId, organizationId: actor.organizationId }))) {
      throw notFound("That measurement");
    }
    let thumb: Buffer;
    let meta: Awaited<ReturnType<ReturnType<typeof sharp>["metadata"]>>;
    try {
      meta = await sharp(upload.path).metadata();
      thumb = await sharp(upload.path).rotate().resize(THUMB_PX, THUMB_PX, { fit: "inside", withoutEnlargement: true }).jpeg({ quality: 78 }).toBuffer();
    } catch {
      throw new HttpError(415, "unsupported_media_type", "The photo could not be read; it may be damaged. Nothing was saved.");
    }
    const original = await files.store(actor, projectId, files.fromDisk(upload.path, upload));
    const stored: StoredFile[] = [original];
    try {
      const thumbnail = await files.store(actor, projectId, {
        sizeBytes: thumb.length, sha256: createHash("sha256").update(thumb).digest("hex"), contentType: "image/jpeg", originalName: "", open: () => Readable.from(thumb),
      });
      stored.push(thumbnail);
      const swap = (meta.orientation ?? 1) >= 5;
      const photo = await repo.save(repo.create({
        organizationId: actor.organizationId, projectId, elementId: fields.elementId, measurementId: fields.measurementId, caption: fields.caption,
        fileId: original.id, thumbnailFileId: thumbnail.id, width: (swap ? meta.height : meta.width) ?? null, height: (swap ? meta.width : meta.height) ?? null, createdById: actor.userId,
      }));
      return toDto(photo, original);
    } catch (error) {
      for (const f of stored) await (await dataSource.transaction((m) => files.remove(m, f)))();
      throw error;
    }
  }

  async function image(actor: Actor, projectId: string, photoId: string, size: "thumb" | "full"): Promise<{ contentType: string; sizeBytes: number; body: Readable }> {
    await projects.get(actor, projectId);
    const photo = await repo.findOne({ where: { id: photoId, projectId, organizationId: actor.organizationId }, relations: { file: true, thumbnailFile: true } });
    if (!photo) throw notFound("That photo");
    const file = size === "thumb" ? photo.thumbnailFile! : photo.file!;
    return { contentType: file.contentType, sizeBytes: file.sizeBytes, body: await files.open(file) };
  }

  async function remove(actor: Actor, projectId: string, photoId: string): Promise<void> {
    await projects.get(actor, projectId);
    const photo = await repo.findOne({ where: { id: photoId, projectId, organizationId: actor.organizationId }, relations: { file: true, thumbnailFile: true } });
    if (!photo) throw notFound("That photo");
    const cleanups = await dataSource.transaction(async (manager) => {
      await manager.getRepository(Photo).delete({ id: photo.id });
      return [await files.remove(manager, photo.file!), await files.remove(manager, photo.thumbnailFile!)];
    });
    for (const c of cleanups) await c();
  }

  return { list, create, image, remove };
}

export type PhotosService = ReturnType<typeof createPhotosService>;
