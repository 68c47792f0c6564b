// One option search per worker thread: the thread is ended to cancel a search.
import { parentPort, workerData } from "node:worker_threads";
import { runOptionSearch, type OptionSearchTask } from "./option-search.js";

const { task, stepDelayMs } = workerData as { task: OptionSearchTask; stepDelayMs: number };
const pause = new Int32Array(new SharedArrayBuffer(4));
try {
  const outcome = runOptionSearch(task, (phase, done, total) => {
    parentPort?.postMessage({ type: "progress", phase, done, total });
    if (stepDelayMs > 0) Atomics.wait(pause, 0, 0, stepDelayMs);
  });
  parentPort?.postMessage({ type: "done", outcome });
} catch (e) {
  parentPort?.postMessage({ type: "error", message: (e as Error).message });
}
