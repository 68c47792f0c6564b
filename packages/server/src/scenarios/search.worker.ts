// One option search per worker thread: the thread is ended to cancel a search.
import { parentPort, workerData } from "node:worker_threads";
import { runOptionSearch, type OptionSearchTask } from "./option-search.js";

const task = workerData as OptionSearchTask;
try {
  const outcome = runOptionSearch(task, (phase, done, total) => parentPort?.postMessage({ type: "progress", phase, done, total }));
  parentPort?.postMessage({ type: "done", outcome });
} catch (e) {
  parentPort?.postMessage({ type: "error", message: (e as Error).message });
}
