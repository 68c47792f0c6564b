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
 * Piscina first tries `require()` on the worker file. On Node 20.19+ that loads our ES module
 * through require(esm), and a pool closed while a thread is still loading it that way aborted the
 * whole process (a V8 fatal error, seen when a test closed its app straight after starting it).
 * Turning require(esm) off in the threads sends piscina to its `import()` path, which a
 * terminating thread abandons cleanly.
 */
function workerExecArgv(): string[] {
  const requireModule = (process.features as { require_module?: boolean }).require_module === true;
  return requireModule ? [...process.execArgv, "--no-experimental-require-module"] : [...process.execArgv];
}

/**
 * A worker-thread pool for analyses, so a large plan never blocks the event loop that answers
 * other requests. One thread fewer than the cores (at least one); the queue is bounded.
 */
export function createAnalysisPool(size = Math.max(1, availableParallelism() - 1)): AnalysisPool {
  const pool = new Piscina({
    filename: workerUrl(),
    execArgv: workerExecArgv(),
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
