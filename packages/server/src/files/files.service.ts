import { createHash, randomUUID } from "node:crypto";
import { createReadStream } from "node:fs";
import { Readable } from "node:stream";
import type { DataSource, EntityManager } from "typeorm";
import type { Actor } from "../auth/actor.js";
import { storageUnavailable, type ObjectStorage } from "./object-storage.js";
import { StoredFile } from "./stored-file.entity.js";

export interface FileSource {
  sizeBytes: number;
  sha256: string;
  contentType: string;
  originalName: string;
  /** A fresh stream of the bytes (called once). */
  open: () => Readable;
}

/** Who a file is stored for: a signed-in person, or the firm itself for files a background job makes. */
export type FileOwner = Pick<Actor, "organizationId"> & { userId: string | null };

/** Files of a project in object storage, recorded in `stored_files`; nothing is left half-saved. */
export function createFilesService(dataSource: DataSource, storage: ObjectStorage) {
  /**
   * Stores the bytes and then the record, in that order, and answers the record. If the store
   * refuses, no record remains; if the record cannot be written, the object is removed again.
   */
  async function store(actor: FileOwner, projectId: string, source: FileSource): Promise<StoredFile> {
    const id = randomUUID();
    const objectKey = `projects/${projectId}/files/${id}`;
    const repo = dataSource.getRepository(StoredFile);
    await repo.insert({
      id, organizationId: actor.organizationId, projectId, objectKey, contentType: source.contentType, sizeBytes: source.sizeBytes,
      sha256: source.sha256, originalName: source.originalName, state: "receiving", createdById: actor.userId,
    });
    try {
      await storage.put(objectKey, source.open(), source.sizeBytes, source.contentType);
    } catch {
      await repo.delete({ id });
      throw storageUnavailable();
    }
    try {
      await repo.update({ id }, { state: "stored" });
    } catch (error) {
      await storage.delete(objectKey).catch(() => undefined);
      await repo.delete({ id }).catch(() => undefined);
      throw error;
    }
    return (await repo.findOneByOrFail({ id }));
  }

  const fromDisk = (path: string, meta: Omit<FileSource, "open">): FileSource => ({ ...meta, open: () => createReadStream(path) });

  /** Bytes made by the server itself (a rendered PDF), with their size and digest. */
  const fromBuffer = (bytes: Buffer, meta: Pick<FileSource, "contentType" | "originalName">): FileSource => ({
    ...meta, sizeBytes: bytes.length, sha256: createHash("sha256").update(bytes).digest("hex"), open: () => Readable.from([bytes]),
  });

  /** Removes a file's record (inside the caller's transaction) and then its object. */
  async function remove(manager: EntityManager, file: StoredFile): Promise<() => Promise<void>> {
    await manager.getRepository(StoredFile).delete({ id: file.id });
    return () => storage.delete(file.objectKey).catch(() => undefined);
  }

  async function open(file: StoredFile, range?: { start: number; end: number }): Promise<Readable> {
    try {
      return await storage.get(file.objectKey, range);
    } catch {
      throw storageUnavailable();
    }
  }

  /**
   * Removes records a crash left in `receiving` (the record is written before the bytes), with any
   * object that reached the store; answers how many were removed.
   */
  async function sweepUnfinished(olderThanMs: number): Promise<number> {
    const repo = dataSource.getRepository(StoredFile);
    const stale = await repo.createQueryBuilder("f").where("f.state = 'receiving' AND f.created_at < :before", { before: new Date(Date.now() - olderThanMs) }).getMany();
    for (const f of stale) {
      await storage.delete(f.objectKey).catch(() => undefined);
      await repo.delete({ id: f.id });
    }
    return stale.length;
  }

  return { store, fromDisk, fromBuffer, remove, open, sweepUnfinished };
}

export type FilesService = ReturnType<typeof createFilesService>;
