/** What one attempt to store the plan came to. */
export type SaveOutcome =
  | { kind: "saved"; version: number }
  | { kind: "conflict"; currentVersion: number }
  | { kind: "offline" }
  | { kind: "rejected"; message: string };

/** Sends a document to the server with the version it was based on (PUT with `baseVersion`). */
export interface SaveTransport {
  save(document: unknown, baseVersion: number): Promise<SaveOutcome>;
}

/** Timers, injected so tests run the machine on a fake clock. */
export interface Clock {
  now(): number;
  setTimeout(fn: () => void, ms: number): unknown;
  clearTimeout(handle: unknown): void;
}

/** An edit not yet confirmed by the server, kept on the device so a lost connection or a closed tab loses nothing. */
export interface PendingSave {
  document: unknown;
  baseVersion: number;
  /** Clock time of the edit, ms. */
  editedAt: number;
}

export interface PendingStore {
  read(): PendingSave | null;
  write(pending: PendingSave): void;
  clear(): void;
}

/** The save state the status line shows. */
export type SaveStatus =
  | { kind: "saved"; version: number; at: number | null }
  | { kind: "waiting" }
  | { kind: "saving" }
  | { kind: "offline"; attempt: number; retryAt: number }
  | { kind: "conflict"; currentVersion: number }
  | { kind: "rejected"; message: string };
