import PgBoss from "pg-boss";
import type { Logger } from "pino";

export interface JobContext<T> {
  id: string;
  data: T;
  /** How many times this job has been tried before (0 on the first run). */
  retryCount: number;
  retryLimit: number;
  /** Aborted when the server shuts down; the handler should stop and throw so the job is retried. */
  signal: AbortSignal;
}

export interface QueueSpec<T> {
  name: string;
  retryLimit: number;
  retryDelaySeconds: number;
  /** A job running longer than this is taken back and retried (covers a crash mid-job). */
  expireInSeconds: number;
  handler: (job: JobContext<T>) => Promise<void>;
}

export interface JobQueue {
  send<T extends object>(queue: string, data: T, options?: { expireInSeconds?: number }): Promise<string>;
  /** Resolves once the queue's tables exist and the workers are polling. */
  ready: Promise<void>;
  stop(): Promise<void>;
}

/**
 * Background jobs in PostgreSQL (pg-boss, in its own schema of the app's database). Jobs survive a
 * restart: on shutdown running handlers are aborted and fail, so pg-boss retries them after its
 * retry delay on whichever server is running then; a crashed server's jobs come back when they expire.
 */
export function createJobQueue(options: { databaseUrl: string; schema: string; logger: Logger; queues: QueueSpec<never>[] }): JobQueue {
  const boss = new PgBoss({ connectionString: options.databaseUrl, schema: options.schema, max: 4, maintenanceIntervalSeconds: 30 });
  const shutdown = new AbortController();
  const running = new Set<Promise<void>>();
  boss.on("error", (error: unknown) => options.logger.error({ err: error }, "job queue error"));

  const ready = (async () => {
    await boss.start();
    for (const q of options.queues) {
      await boss.createQueue(q.name, { name: q.name, retryLimit: q.retryLimit, retryDelay: q.retryDelaySeconds, expireInSeconds: q.expireInSeconds });
      await boss.work<object>(q.name, { batchSize: 1, pollingIntervalSeconds: 0.5, includeMetadata: true }, async (jobs) => {
        for (const job of jobs) {
          const run = q.handler({ id: job.id, data: job.data as never, retryCount: job.retryCount, retryLimit: job.retryLimit, signal: shutdown.signal });
          running.add(run);
          try {
            await run;
          } finally {
            running.delete(run);
          }
        }
      });
    }
  })();
  ready.catch((error: unknown) => options.logger.error({ err: error }, "the job queue did not start; recordings will not be analysed until it does"));

  return {
    ready,
    async send(queue, data, sendOptions) {
      await ready;
      const id = await boss.send(queue, data, sendOptions?.expireInSeconds ? { expireInSeconds: sendOptions.expireInSeconds } : {});
      if (!id) throw new Error(`the job queue refused a ${queue} job`);
      return id;
    },
    async stop() {
      shutdown.abort();
      await Promise.allSettled([...running]);
      await ready.catch(() => undefined);
      await boss.stop({ graceful: true, wait: true, timeout: 5000 });
    },
  };
}
