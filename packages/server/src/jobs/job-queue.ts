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
  ready(): Promise<void>;
  stop(): Promise<void>;
}

const RESTART_AFTER_MS = 10_000;

/**
 * Background jobs in PostgreSQL (pg-boss, in its own schema of the app's database). Jobs survive a
 * restart: on shutdown running handlers are aborted and fail, so pg-boss retries them after its
 * retry delay on whichever server is running then; a crashed server's jobs come back when they
 * expire. If the queue cannot start (the database is away), it tries again every 10 s and on the
 * next send, so one bad moment at start-up does not leave recordings unanalysed until a restart.
 */
export function createJobQueue(options: {
  databaseUrl: string;
  schema: string;
  logger: Logger;
  queues: QueueSpec<never>[];
  /** False in a process that only queues jobs (an API process beside separate workers). */
  work?: boolean;
}): JobQueue {
  const shutdown = new AbortController();
  const running = new Set<Promise<void>>();
  let boss: PgBoss | null = null;
  let starting: Promise<PgBoss> | null = null;
  let retryTimer: ReturnType<typeof setTimeout> | null = null;

  async function startOnce(): Promise<PgBoss> {
    const b = new PgBoss({ connectionString: options.databaseUrl, schema: options.schema, max: 4, maintenanceIntervalSeconds: 30 });
    b.on("error", (error: unknown) => options.logger.error({ err: error }, "job queue error"));
    try {
      await b.start();
      for (const q of options.queues) {
        await b.createQueue(q.name, { name: q.name, retryLimit: q.retryLimit, retryDelay: q.retryDelaySeconds, expireInSeconds: q.expireInSeconds });
        if (options.work === false) continue;
        await b.work<object>(q.name, { batchSize: 1, pollingIntervalSeconds: 0.5, includeMetadata: true }, async (jobs) => {
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
    } catch (error) {
      await b.stop({ graceful: false, wait: false }).catch(() => undefined);
      throw error;
    }
    return b;
  }

  function start(): Promise<PgBoss> {
    if (shutdown.signal.aborted) return Promise.reject(new Error("the job queue is stopped"));
    starting ??= startOnce().then(
      (b) => {
        boss = b;
        return b;
      },
      (error: unknown) => {
        starting = null;
        options.logger.error({ err: error }, "the job queue did not start; trying again in 10 s");
        retryTimer ??= setTimeout(() => {
          retryTimer = null;
          start().catch(() => undefined);
        }, RESTART_AFTER_MS);
        retryTimer.unref();
        throw error;
      },
    );
    return starting;
  }
  start().catch(() => undefined);

  return {
    ready: async () => {
      await start();
    },
    async send(queue, data, sendOptions) {
      const b = await start();
      const id = await b.send(queue, data, sendOptions?.expireInSeconds ? { expireInSeconds: sendOptions.expireInSeconds } : {});
      if (!id) throw new Error(`the job queue refused a ${queue} job`);
      return id;
    },
    async stop() {
      shutdown.abort();
      if (retryTimer) clearTimeout(retryTimer);
      await Promise.allSettled([...running]);
      await starting?.catch(() => undefined);
      await boss?.stop({ graceful: true, wait: true, timeout: 5000 });
    },
  };
}
