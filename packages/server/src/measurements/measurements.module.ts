import type { Logger } from "pino";
import type { DataSource } from "typeorm";
import type { AppConfig } from "../config.js";
import { createFilesService, type FilesService } from "../files/files.service.js";
import { createObjectStorage, type ObjectStorage } from "../files/object-storage.js";
import type { RouteSpec } from "../http/routes.js";
import { createIntakeService } from "../intake/intake.service.js";
import { intakeRoutes } from "../intake/intake.routes.js";
import { createJobQueue, type JobQueue, type QueueSpec } from "../jobs/job-queue.js";
import type { ProjectsService } from "../projects/projects.service.js";
import { measurementRoutes } from "./measurements.routes.js";
import { createMeasurementsService } from "./measurements.service.js";
import { createPhotosService } from "./photos.service.js";
import { recordingQueue, type RecordingJobOptions } from "./recording-job.js";

export interface MeasurementsModuleOptions {
  storage?: ObjectStorage;
  recordingJob?: RecordingJobOptions;
}

/**
 * The brief, measurements, recordings and photos: their routes (under `/projects`), the object
 * store and the job queue that analyses recordings. `close` stops the queue and the store client.
 */
export function createMeasurementsModule(deps: { dataSource: DataSource; config: AppConfig; logger: Logger; projects: ProjectsService; options?: MeasurementsModuleOptions }): { routes: RouteSpec[]; jobs: JobQueue; files: FilesService; close: () => Promise<void> } {
  const { dataSource, config, logger, projects } = deps;
  const storage = deps.options?.storage ?? createObjectStorage(config.s3);
  const files = createFilesService(dataSource, storage);
  files.sweepUnfinished(3600_000).catch((error: unknown) => logger.warn({ err: error }, "could not sweep unfinished uploads"));
  const queue = recordingQueue(dataSource, files, logger, deps.options?.recordingJob);
  const jobs = createJobQueue({ databaseUrl: config.databaseUrl, schema: config.jobsSchema, logger, work: config.role !== "api", queues: [queue as QueueSpec<never>] });
  const measurements = createMeasurementsService(dataSource, projects, files, jobs);
  const photos = createPhotosService(dataSource, projects, files);
  const routes = [...intakeRoutes(createIntakeService(dataSource, projects)), ...measurementRoutes(measurements, photos, config.uploads)];
  return {
    routes,
    jobs,
    files,
    close: async () => {
      await jobs.stop();
      if (!deps.options?.storage) storage.close();
    },
  };
}
