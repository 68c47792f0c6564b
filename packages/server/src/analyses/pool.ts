import { availableParallelism } from "node:os";
import { Piscina } from "piscina";
import type { AnalysisOutcome } from "./compute.js";
import type { AnalysisTask } from "./worker.js";

export interface AnalysisPool {
  run(task: AnalysisTask): Promise<AnalysisOutcome & { computeMs: number }>;
  close(): Promise<void>;
}

/** The compiled worker; when this module runs from source (tests), the built copy in dist/. */
function workerUrl(): string {
  const here = import.meta.url;
  return here.endsWith(".ts") ? new URL("../../dist/analyses/worker.js", here).href : new URL("./worker.js", here).href;
}

/**
 * A worker-thread pool for analyses, so a large plan never blocks the event loop that answers
 * other requests. One thread fewer than the cores (at least one); the queue is bounded.
 */
export function createAnalysisPool(size = Math.max(1, availableParallelism() - 1)): AnalysisPool {
  const pool = new Piscina({
    filename: workerUrl(),
    minThreads: 1,
    maxThreads: size,
    maxQueue: 200,
    idleTimeout: 60_000,
  });
  return {
    run: (task) => pool.run(task),
    close: () => pool.destroy(),
  };
}
