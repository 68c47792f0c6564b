import type { Clock, PendingStore, SaveOutcome, SaveStatus, SaveTransport } from "./types.js";

export interface AutosaveOptions {
  transport: SaveTransport;
  clock: Clock;
  /** The server version the editor loaded. */
  baseVersion: number;
  pending?: PendingStore;
  /** Quiet time after the last edit before saving, ms. */
  debounceMs?: number;
  /** Waits between retries while offline, ms; the last one repeats. */
  retryMs?: readonly number[];
}

type Listener = (status: SaveStatus) => void;

/**
 * Autosave as a small machine: saved → waiting (debounce) → saving → saved, with offline →
 * retrying on a backoff, and conflict when the server has moved on. Nothing is dropped: the
 * latest document stays in memory and in the pending store until the server confirms it.
 */
export class Autosave {
  private statusValue: SaveStatus;
  private version: number;
  private latest: unknown = undefined;
  /** Bumped on each edit; the save in flight knows which edit it carries. */
  private editSeq = 0;
  private savedSeq = 0;
  private timer: unknown = null;
  private inFlight = false;
  private attempt = 0;
  private listeners = new Set<Listener>();
  private disposed = false;
  private readonly transport: SaveTransport;
  private readonly clock: Clock;
  private readonly pending: PendingStore | undefined;
  private readonly debounceMs: number;
  private readonly retryMs: readonly number[];

  constructor(options: AutosaveOptions) {
    this.transport = options.transport;
    this.clock = options.clock;
    this.pending = options.pending;
    this.version = options.baseVersion;
    this.debounceMs = options.debounceMs ?? 800;
    this.retryMs = options.retryMs ?? [1000, 2000, 5000, 10000, 30000];
    this.statusValue = { kind: "saved", version: options.baseVersion, at: null };
  }

  get status(): SaveStatus {
    return this.statusValue;
  }

  get baseVersion(): number {
    return this.version;
  }

  get hasUnsaved(): boolean {
    return this.editSeq !== this.savedSeq;
  }

  subscribe(listener: Listener): () => void {
    this.listeners.add(listener);
    return () => this.listeners.delete(listener);
  }

  /** A new document to save. It is kept on the device at once; the server gets it after a quiet spell. */
  edited(document: unknown): void {
    if (this.disposed) return;
    this.latest = document;
    this.editSeq++;
    this.pending?.write({ document, baseVersion: this.version, editedAt: this.clock.now() });
    if (this.statusValue.kind === "conflict") return;
    if (this.statusValue.kind === "offline") return;
    this.setStatus({ kind: "waiting" });
    this.schedule(this.debounceMs);
  }

  /** Saves now instead of waiting (leaving the page, pressing Save). */
  flush(): void {
    if (this.statusValue.kind === "conflict" || !this.hasUnsaved) return;
    this.schedule(0);
  }

  /** The browser says the connection is back: retry at once. */
  online(): void {
    if (this.statusValue.kind === "offline") this.schedule(0);
  }

  /** Conflict resolution: keep this device's plan, saved on top of the server's newer version. */
  keepMine(currentVersion: number): void {
    if (this.statusValue.kind !== "conflict") return;
    this.version = currentVersion;
    this.pending?.write({ document: this.latest, baseVersion: this.version, editedAt: this.clock.now() });
    this.setStatus({ kind: "waiting" });
    this.schedule(0);
  }

  /** Conflict resolution: take the server's version; this device's edits are dropped (after the UI kept a copy if asked). */
  takeTheirs(version: number): void {
    this.clearTimer();
    this.version = version;
    this.savedSeq = this.editSeq;
    this.latest = undefined;
    this.pending?.clear();
    this.setStatus({ kind: "saved", version, at: this.clock.now() });
  }

  dispose(): void {
    this.disposed = true;
    this.clearTimer();
    this.listeners.clear();
  }

  private schedule(ms: number): void {
    this.clearTimer();
    this.timer = this.clock.setTimeout(() => {
      this.timer = null;
      void this.send();
    }, ms);
  }

  private clearTimer(): void {
    if (this.timer !== null) this.clock.clearTimeout(this.timer);
    this.timer = null;
  }

  private async send(): Promise<void> {
    if (this.disposed || this.inFlight || !this.hasUnsaved) return;
    this.inFlight = true;
    const seq = this.editSeq;
    const document = this.latest;
    if (this.statusValue.kind !== "offline") this.setStatus({ kind: "saving" });
    let outcome: SaveOutcome;
    try {
      outcome = await this.transport.save(document, this.version);
    } catch {
      outcome = { kind: "offline" };
    }
    this.inFlight = false;
    if (this.disposed) return;
    this.settle(outcome, seq);
  }

  private settle(outcome: SaveOutcome, seq: number): void {
    switch (outcome.kind) {
      case "saved": {
        this.version = outcome.version;
        this.savedSeq = seq;
        this.attempt = 0;
        if (this.hasUnsaved) {
          // Edits arrived while saving: they go next, on the new version.
          this.pending?.write({ document: this.latest, baseVersion: this.version, editedAt: this.clock.now() });
          this.setStatus({ kind: "waiting" });
          this.schedule(this.debounceMs);
        } else {
          this.pending?.clear();
          this.setStatus({ kind: "saved", version: outcome.version, at: this.clock.now() });
        }
        return;
      }
      case "conflict":
        this.setStatus({ kind: "conflict", currentVersion: outcome.currentVersion });
        return;
      case "offline": {
        const wait = this.retryMs[Math.min(this.attempt, this.retryMs.length - 1)] ?? 30000;
        this.attempt++;
        this.setStatus({ kind: "offline", attempt: this.attempt, retryAt: this.clock.now() + wait });
        this.schedule(wait);
        return;
      }
      case "rejected":
        this.setStatus({ kind: "rejected", message: outcome.message });
        return;
    }
  }

  private setStatus(status: SaveStatus): void {
    this.statusValue = status;
    for (const l of this.listeners) l(status);
  }
}
