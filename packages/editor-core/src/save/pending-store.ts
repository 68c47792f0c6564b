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

export function memoryStorage(): KeyValueStorage & { map: Map<string, string> } {
  const map = new Map<string, string>();
  return {
    map,
    getItem: (k) => map.get(k) ?? null,
    setItem: (k, v) => void map.set(k, v),
    removeItem: (k) => void map.delete(k),
  };
}
