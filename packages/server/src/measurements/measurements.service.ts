import { open as openFile } from "node:fs/promises";
import type { Readable } from "node:stream";
import type { DataSource } from "typeorm";
import { parseSpectrumCsv, spectrumToCsv } from "@hushmark/acoustics";
import type { CsvPreview, Measurement as MeasurementDto, MeasurementDetail, MeasurementUpdate, measurementInputSchema, recordingFieldsSchema } from "@hushmark/schemas";
import type { z } from "zod";
import type { Actor } from "../auth/actor.js";
import { recordAudit } from "../audit/audit.js";
import type { FilesService } from "../files/files.service.js";
import { StoredFile } from "../files/stored-file.entity.js";
import type { ReceivedUpload } from "../files/uploads.js";
import { WavFormatError, readWavHeader, wavHeaderFor } from "../files/wav-header.js";
import { HttpError, notFound } from "../http/errors.js";
import type { JobQueue } from "../jobs/job-queue.js";
import type { ProjectsService } from "../projects/projects.service.js";
import { Measurement } from "./measurement.entity.js";
import { measurementDetailDto, measurementDto } from "./measurement-dto.js";
import { Photo } from "./photo.entity.js";
import { RECORDING_QUEUE, storedWavFormat, type RecordingJobData } from "./recording-job.js";

const LIST_COLUMNS = ["id", "projectId", "label", "kind", "source", "status", "progress", "error", "takenAt", "roomId", "point", "device", "calibrationDb", "leqDb", "lmaxDb", "l10Db", "l90Db", "summary", "events", "fileId", "createdAt"] as const;

/** Measurements of a project: spectra from files, recordings and the live analyzer. */
export function createMeasurementsService(dataSource: DataSource, projects: ProjectsService, files: FilesService, jobs: JobQueue) {
  const repo = dataSource.getRepository(Measurement);

  async function find(actor: Actor, projectId: string, id: string): Promise<Measurement> {
    await projects.get(actor, projectId);
    const m = await repo.findOneBy({ id, projectId, organizationId: actor.organizationId });
    if (!m) throw notFound("That measurement");
    return m;
  }

  async function list(actor: Actor, projectId: string): Promise<MeasurementDto[]> {
    await projects.get(actor, projectId);
    const rows = await repo.find({ where: { projectId, organizationId: actor.organizationId }, select: Object.fromEntries(LIST_COLUMNS.map((c) => [c, true])) as never, order: { takenAt: "ASC", createdAt: "ASC" } });
    return rows.map(measurementDto);
  }

  async function get(actor: Actor, projectId: string, id: string): Promise<MeasurementDetail> {
    return measurementDetailDto(await find(actor, projectId, id));
  }

  async function create(actor: Actor, projectId: string, input: z.infer<typeof measurementInputSchema>): Promise<MeasurementDto> {
    await projects.get(actor, projectId);
    if (input.leqDb.every((v) => v === null)) {
      throw new HttpError(400, "invalid_input", "Some fields need attention.", [{ path: "leqDb", message: "Give at least one band level." }]);
    }
    const saved = await repo.save(repo.create({
      organizationId: actor.organizationId, projectId, label: input.label, kind: input.kind, source: input.source, status: "ready", progress: 1,
      takenAt: new Date(input.takenAt), roomId: input.roomId, point: input.point, device: input.device, calibrationDb: input.calibrationDb,
      leqDb: input.leqDb, lmaxDb: input.lmaxDb, createdById: actor.userId, fileId: null, error: null,
    }));
    await recordAudit(dataSource, { organizationId: actor.organizationId, actorUserId: actor.userId, action: "measurement.created", entityType: "measurement", entityId: saved.id, data: { projectId, source: input.source } });
    return measurementDto(saved);
  }

  async function update(actor: Actor, projectId: string, id: string, patch: MeasurementUpdate): Promise<MeasurementDetail> {
    const m = await find(actor, projectId, id);
    const changes: Partial<Measurement> = {};
    if (patch.label !== undefined) changes.label = patch.label;
    if (patch.kind !== undefined) changes.kind = patch.kind;
    if (patch.takenAt !== undefined) changes.takenAt = new Date(patch.takenAt);
    if (patch.roomId !== undefined) changes.roomId = patch.roomId;
    if (patch.point !== undefined) changes.point = patch.point;
    if (patch.device !== undefined) changes.device = patch.device;
    if (patch.calibrationDb !== undefined && patch.calibrationDb !== m.calibrationDb) {
      if (m.status === "processing") throw new HttpError(409, "still_processing", "Wait until the recording is analysed before changing its calibration.");
      // Every stored level moves by the change in offset, so the spectrum stays consistent.
      const delta = patch.calibrationDb - m.calibrationDb;
      const shift = (a: (number | null)[] | null) => a?.map((v) => (v === null ? null : Math.round((v + delta) * 100) / 100)) ?? null;
      changes.calibrationDb = patch.calibrationDb;
      changes.leqDb = shift(m.leqDb) ?? [];
      changes.lmaxDb = shift(m.lmaxDb);
      changes.l10Db = shift(m.l10Db);
      changes.l90Db = shift(m.l90Db);
      if (m.summary) changes.summary = Object.fromEntries(Object.entries(m.summary).map(([k, v]) => [k, /Db$/.test(k) && typeof v === "number" ? Math.round((v + delta) * 100) / 100 : v]));
      if (m.timeHistory) {
        const h = m.timeHistory as { stepS: number; laeqDb: number[]; lafmaxDb: number[]; bandsDb: (number | null)[][] | null };
        changes.timeHistory = { stepS: h.stepS, laeqDb: h.laeqDb.map((v) => v + delta), lafmaxDb: h.lafmaxDb.map((v) => v + delta), bandsDb: h.bandsDb?.map((row) => shift(row)!) ?? null };
      }
      if (m.events) changes.events = m.events.map((e) => ({ ...e, peakDb: (e.peakDb as number) + delta, leqDb: (e.leqDb as number) + delta }));
    }
    if (Object.keys(changes).length) await repo.update({ id }, changes as never);
    return get(actor, projectId, id);
  }

  async function remove(actor: Actor, projectId: string, id: string): Promise<void> {
    const m = await find(actor, projectId, id);
    // The measurement's recording and its photos' files go with it; objects are removed after the commit.
    const afterCommit = await dataSource.transaction(async (manager) => {
      const photos = await manager.getRepository(Photo).find({ where: { measurementId: m.id }, relations: { file: true, thumbnailFile: true } });
      await manager.getRepository(Measurement).delete({ id: m.id });
      const doomed = [
        ...(m.fileId ? [await manager.getRepository(StoredFile).findOneBy({ id: m.fileId })] : []),
        ...photos.flatMap((p) => [p.file, p.thumbnailFile]),
      ].filter((f): f is StoredFile => Boolean(f));
      const cleanups: (() => Promise<void>)[] = [];
      for (const f of doomed) cleanups.push(await files.remove(manager, f));
      return cleanups;
    });
    for (const cleanup of afterCommit) await cleanup();
    await recordAudit(dataSource, { organizationId: actor.organizationId, actorUserId: actor.userId, action: "measurement.deleted", entityType: "measurement", entityId: id, data: { projectId } });
  }

  async function previewCsv(actor: Actor, projectId: string, text: string): Promise<CsvPreview> {
    await projects.get(actor, projectId);
    return parseSpectrumCsv(text);
  }

  async function exportCsv(actor: Actor, projectId: string, id: string): Promise<{ filename: string; text: string }> {
    const m = await find(actor, projectId, id);
    if (m.status !== "ready") throw new HttpError(409, "still_processing", "This measurement has no spectrum yet; wait until its recording is analysed.");
    const safe = m.label.replace(/[^A-Za-z0-9 _-]+/g, "").trim().replace(/\s+/g, "-").slice(0, 60) || "measurement";
    return { filename: `${safe}.csv`, text: spectrumToCsv({ leqDb: m.leqDb, lmaxDb: m.lmaxDb }) };
  }

  /** Stores an uploaded WAV and queues its analysis; answers the measurement in the processing state. */
  async function createFromRecording(actor: Actor, projectId: string, upload: ReceivedUpload, fields: z.infer<typeof recordingFieldsSchema>): Promise<MeasurementDto> {
    await projects.get(actor, projectId);
    const handle = await openFile(upload.path, "r");
    let head: Buffer;
    try {
      const buf = Buffer.alloc(Math.min(upload.sizeBytes, 1024 * 1024));
      await handle.read(buf, 0, buf.length, 0);
      head = buf;
    } finally {
      await handle.close();
    }
    try {
      readWavHeader(head, upload.sizeBytes);
    } catch (error) {
      if (error instanceof WavFormatError) throw new HttpError(415, "unsupported_media_type", `${error.message} Nothing was saved.`);
      throw error;
    }
    const stored = await files.store(actor, projectId, files.fromDisk(upload.path, upload));
    let measurement: Measurement;
    try {
      measurement = await dataSource.transaction(async (manager) => {
        const m = await manager.getRepository(Measurement).save(manager.getRepository(Measurement).create({
          organizationId: actor.organizationId, projectId, label: fields.label, kind: fields.kind, source: "recording", status: "processing", progress: 0,
          takenAt: new Date(fields.takenAt), roomId: fields.roomId, point: fields.pointX !== undefined && fields.pointY !== undefined ? { x: fields.pointX, y: fields.pointY } : null, device: fields.device, calibrationDb: fields.calibrationDb,
          leqDb: [], lmaxDb: null, fileId: stored.id, createdById: actor.userId, error: null,
          eventSettings: { marginDb: fields.marginDb, minDurationS: fields.minDurationS },
        }));
        await recordAudit(manager, { organizationId: actor.organizationId, actorUserId: actor.userId, action: "measurement.recording_uploaded", entityType: "measurement", entityId: m.id, data: { projectId, fileId: stored.id, sizeBytes: upload.sizeBytes } });
        return m;
      });
    } catch (error) {
      const cleanup = await dataSource.transaction((manager) => files.remove(manager, stored));
      await cleanup();
      throw error;
    }
    try {
      await jobs.send<RecordingJobData>(RECORDING_QUEUE, { measurementId: measurement.id });
    } catch {
      await repo.update({ id: measurement.id }, { status: "failed", error: "The analysis could not be queued; delete this measurement and upload the recording again." });
      throw new HttpError(503, "jobs_unavailable", "The recording was stored but its analysis could not be started. Delete it and try again in a minute.");
    }
    return measurementDto(measurement);
  }

  /** A WAV excerpt of the recording (for playing an event back), streamed from object storage. */
  async function audioExcerpt(actor: Actor, projectId: string, id: string, startS: number, durationS: number): Promise<{ header: Buffer; body: Readable | null }> {
    const m = await find(actor, projectId, id);
    if (m.source !== "recording" || !m.fileId) throw notFound("That measurement's recording");
    const file = await dataSource.getRepository(StoredFile).findOneBy({ id: m.fileId, organizationId: actor.organizationId });
    if (!file) throw notFound("That measurement's recording");
    const format = await storedWavFormat(files, file);
    const frames = Math.floor(format.dataBytes / format.blockAlign);
    const first = Math.min(frames, Math.floor(startS * format.sampleRateHz));
    const last = Math.min(frames, first + Math.ceil(durationS * format.sampleRateHz));
    if (first >= frames) throw new HttpError(400, "invalid_input", "Some fields need attention.", [{ path: "startS", message: `The recording is only ${Math.floor(format.durationS)} s long.` }]);
    const bytes = (last - first) * format.blockAlign;
    const start = format.dataOffset + first * format.blockAlign;
    return { header: wavHeaderFor(format, bytes), body: await files.open(file, { start, end: start + bytes - 1 }) };
  }

  return { list, get, create, update, remove, previewCsv, exportCsv, createFromRecording, audioExcerpt };
}

export type MeasurementsService = ReturnType<typeof createMeasurementsService>;
