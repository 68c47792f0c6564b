import { describe, expect, it } from "vitest";
import { workerChannel } from "./worker-channel";

type Req = { id: number; kind: "double"; n: number };
type Reply = { id: number; kind: "doubled"; n: number } | { id: number; kind: "progress"; done: number; total: number } | { id: number; kind: "failed"; message: string };

/** A stand-in worker: answers each request after reporting progress, in reverse order of arrival. */
function fakeWorker() {
  const sent: Req[] = [];
  const worker = {
    onmessage: null as ((e: MessageEvent) => void) | null,
    onerror: null as ((e: ErrorEvent) => void) | null,
    postMessage: (m: Req) => void sent.push(m),
    terminate: () => undefined,
  };
  const deliver = (data: Reply) => worker.onmessage?.({ data } as MessageEvent);
  return { worker: worker as unknown as Worker, sent, deliver, fail: (message: string) => worker.onerror?.({ message } as ErrorEvent) };
}

describe("workerChannel", () => {
  it("numbers requests and answers each asker with its own reply, progress going to its callback", async () => {
    const fake = fakeWorker();
    const channel = workerChannel<Req, Reply>(fake.worker, "could not start");
    const progress: number[] = [];
    const first = channel.ask({ kind: "double", n: 2 }, (done) => progress.push(done));
    const second = channel.ask({ kind: "double", n: 5 });
    expect(fake.sent.map((r) => r.id)).toEqual([1, 2]);
    fake.deliver({ id: 1, kind: "progress", done: 1, total: 2 });
    fake.deliver({ id: 2, kind: "doubled", n: 10 });
    fake.deliver({ id: 1, kind: "doubled", n: 4 });
    await expect(first).resolves.toEqual({ id: 1, kind: "doubled", n: 4 });
    await expect(second).resolves.toEqual({ id: 2, kind: "doubled", n: 10 });
    expect(progress).toEqual([1]);
  });

  it("answers every waiting request with a failure when the worker cannot start", async () => {
    const fake = fakeWorker();
    const channel = workerChannel<Req, Reply>(fake.worker, "The reader could not start.");
    const pending = [channel.ask({ kind: "double", n: 1 }), channel.ask({ kind: "double", n: 2 })];
    fake.fail("");
    const replies = await Promise.all(pending);
    expect(replies).toEqual([
      { id: 1, kind: "failed", message: "The reader could not start." },
      { id: 2, kind: "failed", message: "The reader could not start." },
    ]);
  });
});
