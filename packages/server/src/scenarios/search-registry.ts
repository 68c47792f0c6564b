import { randomUUID } from "node:crypto";
import { Worker } from "node:worker_threads";
import type { DataSource } from "typeorm";
import { optionSearchResultSchema, type OptionSearchResult, type OptionSearchStatus } from "@hushmark/schemas";
import type { OptionSearchTask } from "./option-search.js";
import { OptionSearchRow } from "./option-search.entity.js";

/** The compiled worker; when this module runs from source (tests), the built copy in dist/. */
function workerUrl(): URL {
  const here = import.meta.url;
  return here.endsWith(".ts") ? new URL("../../dist/scenarios/search.worker.js", here) : new URL("./search.worker.js", here);
}

export interface SearchRegistryOptions {
  /** How often the running process writes progress and looks for a cancel (ms). */
  beatMs?: number;
  /** A running search whose process has not beaten for this long is answered as failed (ms). */
  staleMs?: number;
  /** How long a finished search stays readable (ms). */
  keepMs?: number;
  /** Searches one process runs at once (each takes a core). */
  maxRunning?: number;
  /** Test knob: the worker pauses this long after each step, so a search is still running when it is cancelled. */
  stepDelayMs?: number;
}

interface Local {
  worker: Worker;
  timer: ReturnType<typeof setInterval>;
  progress: OptionSearchStatus["progress"] | null;
}

type WorkerMessage = { type: string; phase?: string; done?: number; total?: number; outcome?: { ok: boolean; result?: OptionSearchResult; message?: string }; message?: string };

export const SEARCH_KEEP_MINUTES = 15;

function dto(r: OptionSearchRow): OptionSearchStatus {
  const result = r.result ? optionSearchResultSchema.safeParse(r.result) : null;
  return { id: r.id, status: r.status, progress: r.progress, error: r.error, result: result?.success ? result.data : null };
}

/**
 * Option searches: each runs in a worker thread of the process that took the request, and its
 * state (status, progress, result, cancel request) is a row of `option_searches`. Any process
 * answers a poll from the row and takes a cancel by writing it there; the running process sees
 * the cancel on its next beat and ends the thread. A process that dies stops beating, and its
 * searches are answered as failed once the beat is stale.
 */
export function createSearchRegistry(dataSource: DataSource, options: SearchRegistryOptions = {}) {
  const beatMs = options.beatMs ?? 300;
  const staleMs = options.staleMs ?? 15_000;
  const keepMs = options.keepMs ?? SEARCH_KEEP_MINUTES * 60_000;
  const maxRunning = options.maxRunning ?? 4;
  const repo = dataSource.getRepository(OptionSearchRow);
  const local = new Map<string, Local>();

  function stop(id: string) {
    const l = local.get(id);
    if (!l) return;
    local.delete(id);
    clearInterval(l.timer);
    void l.worker.terminate();
  }

  /** Writes the end of a search unless another process cancelled it first; ends the thread. */
  async function finish(id: string, patch: Partial<Pick<OptionSearchRow, "status" | "error" | "result" | "progress">>) {
    stop(id);
    await repo
      .createQueryBuilder()
      .update()
      .set({ ...(patch as object), finishedAt: () => "now()" })
      .where("id = :id AND status = 'running'", { id })
      .execute();
  }

  async function beat(id: string) {
    const l = local.get(id);
    if (!l) return;
    const res = await repo
      .createQueryBuilder()
      .update()
      .set({ heartbeatAt: () => "now()", ...(l.progress ? { progress: l.progress } : {}) })
      .where("id = :id AND status = 'running' AND NOT cancel_requested", { id })
      .execute();
    if (res.affected === 0) stop(id);
  }

  async function sweep() {
    await repo
      .createQueryBuilder()
      .delete()
      .where("finished_at < now() - (:ms * interval '1 millisecond') OR (status = 'running' AND heartbeat_at < now() - (:ms * interval '1 millisecond'))", { ms: keepMs })
      .execute();
  }

  async function find(organizationId: string, projectId: string, id: string): Promise<OptionSearchRow | null> {
    return repo.findOne({ where: { id, organizationId, projectId } });
  }

  return {
    running: () => local.size,
    async start(organizationId: string, projectId: string, createdById: string | null, task: OptionSearchTask): Promise<OptionSearchStatus | null> {
      await sweep();
      if (local.size >= maxRunning) return null;
      const id = randomUUID();
      await repo.insert({ id, organizationId, projectId, status: "running", progress: { phase: "starting", done: 0, total: 1 }, error: null, result: null, heartbeatAt: new Date(), createdById });
      const worker = new Worker(workerUrl(), { workerData: { task, stepDelayMs: options.stepDelayMs ?? 0 } });
      const entry: Local = { worker, progress: null, timer: setInterval(() => void beat(id).catch(() => undefined), beatMs) };
      entry.timer.unref();
      local.set(id, entry);
      const failed = (message: string) => (local.has(id) ? finish(id, { status: "failed", error: message }).catch(() => undefined) : undefined);
      worker.on("message", (m: WorkerMessage) => {
        if (!local.has(id)) return;
        if (m.type === "progress") entry.progress = { phase: m.phase ?? "", done: m.done ?? 0, total: m.total ?? 1 };
        else if (m.type === "done" && m.outcome?.ok) void finish(id, { status: "done", result: (m.outcome.result ?? null) as never, progress: { phase: "done", done: 1, total: 1 } }).catch(() => undefined);
        else void failed(m.outcome?.message ?? m.message ?? "The search stopped unexpectedly.");
      });
      worker.on("error", (err) => void failed(err.message));
      worker.on("exit", () => void failed("The search stopped unexpectedly."));
      return dto((await repo.findOneByOrFail({ id })));
    },
    async get(organizationId: string, projectId: string, id: string): Promise<OptionSearchStatus | null> {
      // A search whose process stopped beating will never finish: say so rather than "running" for ever.
      await repo
        .createQueryBuilder()
        .update()
        .set({ status: "failed", error: "The server running this search stopped; start the search again.", finishedAt: () => "now()" })
        .where("id = :id AND organization_id = :org AND status = 'running' AND heartbeat_at < now() - (:ms * interval '1 millisecond')", { id, org: organizationId, ms: staleMs })
        .execute();
      const row = await find(organizationId, projectId, id);
      return row ? dto(row) : null;
    },
    async cancel(organizationId: string, projectId: string, id: string): Promise<OptionSearchStatus | null> {
      await repo
        .createQueryBuilder()
        .update()
        .set({ status: "cancelled", cancelRequested: true, finishedAt: () => "now()" })
        .where("id = :id AND organization_id = :org AND project_id = :project AND status = 'running'", { id, org: organizationId, project: projectId })
        .execute();
      stop(id);
      const row = await find(organizationId, projectId, id);
      return row ? dto(row) : null;
    },
    async close() {
      const ids = [...local.keys()];
      await Promise.all(ids.map((id) => finish(id, { status: "failed", error: "The server stopped during the search; start the search again." }).catch(() => undefined)));
    },
  };
}

export type SearchRegistry = ReturnType<typeof createSearchRegistry>;
