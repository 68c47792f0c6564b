import { setTimeout as sleep } from "node:timers/promises";
import type { Logger } from "pino";
import type { DataSource } from "typeorm";
import { BandAnalyzer, detectEvents } from "@hushmark/acoustics";
import type { FilesService } from "../files/files.service.js";
import { StoredFile } from "../files/stored-file.entity.js";
import { WavFormatError, WavSampleDecoder, readWavHeader, type WavFormat } from "../files/wav-header.js";
import type { QueueSpec } from "../jobs/job-queue.js";
import { Measurement } from "./measurement.entity.js";

export const RECORDING_QUEUE = "recording-analysis";
const HEAD_BYTES = 1024 * 1024;
// Per-band 1 s history beyond this many seconds would make the row too large; the A-weighted history is always kept.
const MAX_BAND_HISTORY_S = 6 * 3600;
const PROGRESS_EVERY_MS = 400;

export interface RecordingJobData {
  measurementId: string;
}

export interface RecordingJobOptions {
  /** Pause after each chunk (tests use it to catch a job mid-way). */
  chunkDelayMs?: number;
}

async function readAll(stream: AsyncIterable<unknown>): Promise<Buffer> {
  const parts: Buffer[] = [];
  for await (const chunk of stream) parts.push(chunk as Buffer);
  return Buffer.concat(parts);
}

/** Reads the WAV header of a stored file from its first megabyte. */
export async function storedWavFormat(files: FilesService, file: StoredFile): Promise<WavFormat> {
  const head = await readAll(await files.open(file, { start: 0, end: Math.min(file.sizeBytes, HEAD_BYTES) - 1 }));
  return readWavHeader(head, file.sizeBytes);
}

/** The recording-analysis queue: streams the WAV from object storage through the band analyzer. */
export function recordingQueue(dataSource: DataSource, files: FilesService, logger: Logger, options: RecordingJobOptions = {}): QueueSpec<RecordingJobData> {
  const repo = dataSource.getRepository(Measurement);
  const fail = (id: string, message: string) => repo.update({ id }, { status: "failed", error: message });

  return {
    name: RECORDING_QUEUE,
    retryLimit: 5,
    retryDelaySeconds: 1,
    expireInSeconds: 3 * 3600,
    handler: async (job) => {
      const m = await repo.findOneBy({ id: job.data.measurementId });
      if (!m || m.status !== "processing" || !m.fileId) return;
      const file = await dataSource.getRepository(StoredFile).findOneBy({ id: m.fileId });
      if (!file) return void (await fail(m.id, "The recording's file is gone."));
      try {
        const format = await storedWavFormat(files, file);
        await repo.update({ id: m.id }, { progress: 0, error: null });
        const analyzer = new BandAnalyzer({ sampleRateHz: format.sampleRateHz, calibrationDb: m.calibrationDb });
        const decoder = new WavSampleDecoder(format);
        const stream = await files.open(file, { start: format.dataOffset, end: format.dataOffset + format.dataBytes - 1 });
        let done = 0;
        let lastSave = performance.now();
        for await (const chunk of stream) {
          if (job.signal.aborted) {
            stream.destroy();
            throw new Error("the server is shutting down; the analysis will be retried");
          }
          const buf = chunk as Buffer;
          analyzer.feed(decoder.decode(buf));
          done += buf.length;
          if (performance.now() - lastSave > PROGRESS_EVERY_MS) {
            lastSave = performance.now();
            await repo.update({ id: m.id }, { progress: Math.min(0.99, done / format.dataBytes) });
          }
          if (options.chunkDelayMs) await sleep(options.chunkDelayMs);
        }
        const r = analyzer.finish();
        // Below any converter's noise floor a band holds digital silence, not a level.
        const heard = (levels: (number | null)[]) => levels.map((v) => (v === null || v - m.calibrationDb < -150 ? null : v));
        const settings = m.eventSettings ?? { marginDb: 10, minDurationS: 2 };
        const events = r.history && r.la90Db !== null ? detectEvents(r.history, { backgroundDb: r.la90Db, ...settings }) : [];
        const history = r.history ? { ...r.history, bandsDb: r.history.laeqDb.length <= MAX_BAND_HISTORY_S ? r.history.bandsDb : null } : null;
        await repo.update(
          { id: m.id, status: "processing" },
          {
            status: "ready", progress: 1, error: null, leqDb: heard(r.leqDb), lmaxDb: heard(r.lmaxDb), l10Db: heard(r.l10Db), l90Db: heard(r.l90Db),
            summary: { laeqDb: r.laeqDb, lafmaxDb: r.lafmaxDb, la10Db: r.la10Db, la90Db: r.la90Db, durationS: r.durationS, sampleRateHz: format.sampleRateHz, channels: format.channels },
            timeHistory: history as never, events: events as never,
          },
        );
        logger.info({ measurementId: m.id, seconds: Math.round(r.durationS), events: events.length }, "recording analysed");
      } catch (error) {
        if (error instanceof WavFormatError) return void (await fail(m.id, error.message));
        if (job.retryCount >= job.retryLimit) await fail(m.id, "The recording could not be analysed after several tries. Upload it again, or ask for help if it keeps failing.");
        throw error;
      }
    },
  };
}
