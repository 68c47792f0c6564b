import type { PendingSave, PendingStore } from "./types.js";

/** The parts of Web Storage the pending store uses, so Node tests can pass a Map-backed fake. */
export interface KeyValueStorage {
  getItem(key: string): string | null;
  setItem(key: string, value: string): void;
  removeItem(key: string): void;
}

/** Keeps one project's unsent plan under `hushmark.pending-plan.<projectId>`. */
export function storagePendingStore(storage: KeyValueStorage, projectId: string): PendingStore {
  const key = `hushmark.pending-plan.${projectId}`;
  return {
    read() {
      const raw = storage.getItem(key);
      if (!raw) return null;
      try {
        const parsed = JSON.parse(raw) as Partial<PendingSave>;
        if (typeof parsed.baseVersion !== "number" || typeof parsed.editedAt !== "number" || parsed.document === undefined) return null;
        return parsed as PendingSave;
      } catch {
        return null;
      }
    },
    write(pending) {
      try {
        storage.setItem(key, JSON.stringify(pending));
      } catch {
        // Storage full or blocked (private mode): the in-memory copy still retries while the tab is open.
      }
    },
    clear() {
      storage.removeItem(key);
    },
  };
}

/** JSON with every object's keys sorted: the server's jsonb keeps its own key order, so plain text comparison would differ. */
function canonicalJson(value: unknown): string {
  if (value === null || typeof value !== "object") return JSON.stringify(value) ?? "null";
  if (Array.isArray(value)) return `[${value.map(canonicalJson).join(",")}]`;
  const o = value as Record<string, unknown>;
  return `{${Object.keys(o)
    .filter((k) => o[k] !== undefined)
    .sort()
    .map((k) => `${JSON.stringify(k)}:${canonicalJson(o[k])}`)
    .join(",")}}`;
}

/**
 * True when the server already holds the pending edit: its save went through but the answer never
 * came back (the connection dropped, the page was unloading). Putting it back would only conflict
 * with itself, so the caller drops it instead.
 */
export function pendingAlreadyStored(pending: PendingSave, server: { version: number; document: unknown }): boolean {
  return server.version > pending.baseVersion && canonicalJson(server.document) === canonicalJson(pending.document);
}

export function memoryStorage(): KeyValueStorage & { map: Map<string, string> } {
  const map = new Map<string, string>();
  return {
    map,
    getItem: (k) => map.get(k) ?? null,
    setItem: (k, v) => void map.set(k, v),
    removeItem: (k) => void map.delete(k),
  };
}
