import { describe, expect, it } from "vitest";
import { Autosave } from "./autosave.js";
import { memoryStorage, storagePendingStore } from "./pending-store.js";
import type { SaveOutcome, SaveStatus } from "./types.js";
import { FakeClock } from "../../test/harness.js";

/** A server stand-in: keeps a version, answers conflicts for stale bases, can go offline. */
class FakeServer {
  version = 3;
  document: unknown = null;
  offline = false;
  calls: Array<{ document: unknown; baseVersion: number }> = [];
  async save(document: unknown, baseVersion: number): Promise<SaveOutcome> {
    this.calls.push({ document, baseVersion });
    if (this.offline) return { kind: "offline" };
    if (baseVersion !== this.version) return { kind: "conflict", currentVersion: this.version };
    this.version++;
    this.document = document;
    return { kind: "saved", version: this.version };
  }
}

function setup() {
  const clock = new FakeClock();
  const server = new FakeServer();
  const storage = memoryStorage();
  const pending = storagePendingStore(storage, "p1");
  const autosave = new Autosave({ transport: server, clock, baseVersion: 3, pending, debounceMs: 500, retryMs: [1000, 4000] });
  const seen: SaveStatus["kind"][] = [];
  autosave.subscribe((s) => seen.push(s.kind));
  return { clock, server, storage, pending, autosave, seen };
}

describe("Autosave", () => {
  it("waits for a quiet spell, then saves once with the base version", async () => {
    const { clock, server, autosave, seen } = setup();
    autosave.edited({ n: 1 });
    await clock.advance(300);
    autosave.edited({ n: 2 });
    await clock.advance(300);
    expect(server.calls).toHaveLength(0);
    await clock.advance(300);
    expect(server.calls).toEqual([{ document: { n: 2 }, baseVersion: 3 }]);
    expect(autosave.status).toMatchObject({ kind: "saved", version: 4 });
    expect(seen).toEqual(["waiting", "waiting", "saving", "saved"]);
  });

  it("keeps the edit on the device until the server has it", async () => {
    const { clock, pending, autosave } = setup();
    autosave.edited({ n: 1 });
    expect(pending.read()).toMatchObject({ document: { n: 1 }, baseVersion: 3 });
    await clock.advance(600);
    expect(pending.read()).toBeNull();
  });

  it("retries on a backoff while offline, and sends at once when told the connection is back", async () => {
    const { clock, server, autosave, pending } = setup();
    server.offline = true;
    autosave.edited({ n: 1 });
    await clock.advance(500);
    expect(autosave.status).toMatchObject({ kind: "offline", attempt: 1 });
    await clock.advance(1000);
    expect(autosave.status).toMatchObject({ kind: "offline", attempt: 2 });
    expect(server.calls).toHaveLength(2);
    autosave.edited({ n: 2 });
    expect(pending.read()).toMatchObject({ document: { n: 2 } });
    server.offline = false;
    autosave.online();
    await clock.advance(0);
    expect(server.document).toEqual({ n: 2 });
    expect(autosave.status.kind).toBe("saved");
  });

  it("stops on a conflict and keeps both sides until the person chooses", async () => {
    const { clock, server, autosave, pending } = setup();
    server.version = 7;
    autosave.edited({ mine: true });
    await clock.advance(500);
    expect(autosave.status).toEqual({ kind: "conflict", currentVersion: 7 });
    autosave.edited({ mine: "still" });
    await clock.advance(5000);
    expect(server.calls).toHaveLength(1);
    expect(pending.read()).toMatchObject({ document: { mine: "still" } });
    autosave.keepMine(7);
    await clock.advance(0);
    expect(server.document).toEqual({ mine: "still" });
    expect(autosave.status).toMatchObject({ kind: "saved", version: 8 });
  });

  it("taking theirs drops the unsent edit and moves to their version", async () => {
    const { clock, server, autosave, pending } = setup();
    server.version = 5;
    autosave.edited({ mine: true });
    await clock.advance(500);
    autosave.takeTheirs(5);
    expect(pending.read()).toBeNull();
    expect(autosave.hasUnsaved).toBe(false);
    autosave.edited({ next: 1 });
    await clock.advance(500);
    expect(server.calls.at(-1)).toEqual({ document: { next: 1 }, baseVersion: 5 });
  });

  it("edits made while a save is in flight go next, on the new version", async () => {
    const clock = new FakeClock();
    let release: (o: SaveOutcome) => void = () => {};
    const calls: number[] = [];
    const transport = {
      save: (_d: unknown, base: number) => { calls.push(base); return new Promise<SaveOutcome>((r) => { release = r; }); },
    };
    const autosave = new Autosave({ transport, clock, baseVersion: 1, debounceMs: 100 });
    autosave.edited({ n: 1 });
    await clock.advance(100);
    autosave.edited({ n: 2 });
    release({ kind: "saved", version: 2 });
    await clock.advance(0);
    expect(autosave.status.kind).toBe("waiting");
    await clock.advance(100);
    expect(calls).toEqual([1, 2]);
  });

  it("a pending store ignores what it cannot read", () => {
    const storage = memoryStorage();
    storage.setItem("hushmark.pending-plan.p1", "{not json");
    expect(storagePendingStore(storage, "p1").read()).toBeNull();
  });
});
