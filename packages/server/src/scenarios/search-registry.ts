import { randomUUID } from "node:crypto";
import { Worker } from "node:worker_threads";
import type { OptionSearchResult, OptionSearchStatus } from "@hushmark/schemas";
import type { OptionSearchTask } from "./option-search.js";

interface Entry {
  organizationId: string;
  projectId: string;
  status: OptionSearchStatus;
  worker: Worker | null;
  finishedAt: number | null;
}

/** The compiled worker; when this module runs from source (tests), the built copy in dist/. */
function workerUrl(): URL {
  const here = import.meta.url;
  return here.endsWith(".ts") ? new URL("../../dist/scenarios/search.worker.js", here) : new URL("./search.worker.js", here);
}

const KEEP_MS = 15 * 60_000;
const MAX_RUNNING = 4;

/**
 * Option searches in worker threads, kept in memory for a quarter of an hour after they end.
 * A search is lost on restart; the client starts it again (it is a pure computation).
 */
export function createSearchRegistry() {
  const entries = new Map<string, Entry>();

  function sweep(now: number) {
    for (const [id, e] of entries) if (e.finishedAt !== null && now - e.finishedAt > KEEP_MS) entries.delete(id);
  }

  function finish(e: Entry, patch: Partial<OptionSearchStatus>) {
    e.status = { ...e.status, ...patch };
    e.finishedAt = Date.now();
    const w = e.worker;
    e.worker = null;
    if (w) void w.terminate();
  }

  return {
    running: () => [...entries.values()].filter((e) => e.worker !== null).length,
    start(organizationId: string, projectId: string, task: OptionSearchTask): OptionSearchStatus | null {
      sweep(Date.now());
      if ([...entries.values()].filter((e) => e.worker !== null).length >= MAX_RUNNING) return null;
      const id = randomUUID();
      const worker = new Worker(workerUrl(), { workerData: task });
      const entry: Entry = { organizationId, projectId, worker, finishedAt: null, status: { id, status: "running", progress: { phase: "starting", done: 0, total: 1 }, error: null, result: null } };
      entries.set(id, entry);
      worker.on("message", (m: { type: string; phase?: string; done?: number; total?: number; outcome?: { ok: boolean; result?: OptionSearchResult; message?: string }; message?: string }) => {
        if (entry.status.status !== "running") return;
        if (m.type === "progress") entry.status = { ...entry.status, progress: { phase: m.phase ?? "", done: m.done ?? 0, total: m.total ?? 1 } };
        else if (m.type === "done" && m.outcome?.ok) finish(entry, { status: "done", result: m.outcome.result ?? null, progress: { phase: "done", done: 1, total: 1 } });
        else finish(entry, { status: "failed", error: m.outcome?.message ?? m.message ?? "The search stopped unexpectedly." });
      });
      worker.on("error", (err) => entry.status.status === "running" && finish(entry, { status: "failed", error: err.message }));
      worker.on("exit", () => entry.status.status === "running" && finish(entry, { status: "failed", error: "The search stopped unexpectedly." }));
      return entry.status;
    },
    get(organizationId: string, projectId: string, id: string): OptionSearchStatus | null {
      const e = entries.get(id);
      return e && e.organizationId === organizationId && e.projectId === projectId ? e.status : null;
    },
    cancel(organizationId: string, projectId: string, id: string): OptionSearchStatus | null {
      const e = entries.get(id);
      if (!e || e.organizationId !== organizationId || e.projectId !== projectId) return null;
      if (e.status.status === "running") finish(e, { status: "cancelled" });
      return e.status;
    },
    async close() {
      await Promise.all([...entries.values()].map((e) => e.worker?.terminate()));
      entries.clear();
    },
  };
}

export type SearchRegistry = ReturnType<typeof createSearchRegistry>;
