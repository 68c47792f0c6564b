/** Progress and failure replies every import worker sends beside its own answers. */
export type ProgressReply = { id: number; kind: "progress"; done: number; total: number };
export type FailedReply = { id: number; kind: "failed"; message: string };
export type OnProgress = (done: number, total: number) => void;

type WithoutId<T> = T extends unknown ? Omit<T, "id"> : never;

/**
 * Request/answer over a module worker: numbers each request, routes progress to the asker's
 * callback and answers the first other reply with the same number. A worker that fails to start
 * (its script or WebAssembly refused) answers every waiting request with `failed`.
 */
export function workerChannel<Request extends { id: number }, Reply extends { id: number; kind: string }>(worker: Worker, startFailure: string) {
  type Answer = Exclude<Reply, ProgressReply> | FailedReply;
  let seq = 0;
  const waiting = new Map<number, { resolve: (reply: Answer) => void; onProgress?: OnProgress }>();
  worker.onmessage = (event: MessageEvent<Reply | ProgressReply | FailedReply>) => {
    const reply = event.data;
    const asker = waiting.get(reply.id);
    if (!asker) return;
    if (reply.kind === "progress") {
      const { done, total } = reply as ProgressReply;
      asker.onProgress?.(done, total);
      return;
    }
    waiting.delete(reply.id);
    asker.resolve(reply as Answer);
  };
  worker.onerror = (event) => {
    for (const [id, asker] of waiting) asker.resolve({ id, kind: "failed", message: event.message || startFailure });
    waiting.clear();
  };
  return {
    ask(request: WithoutId<Request>, onProgress?: OnProgress): Promise<Answer> {
      const id = ++seq;
      return new Promise<Answer>((resolve) => {
        waiting.set(id, { resolve, ...(onProgress ? { onProgress } : {}) });
        worker.postMessage({ ...request, id });
      });
    },
    dispose: () => worker.terminate(),
  };
}
