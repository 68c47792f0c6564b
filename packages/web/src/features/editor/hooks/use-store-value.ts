import { useSyncExternalStore } from "react";
import type { EditorStore } from "@hushmark/editor-core";

/** Re-renders when the store changes and answers the plan (an immutable value, so cheap to compare). */
export function usePlan(store: EditorStore) {
  return useSyncExternalStore((cb) => store.subscribe(cb), () => store.plan);
}

export function useSelection(store: EditorStore) {
  return useSyncExternalStore((cb) => store.subscribe(cb), () => store.selection);
}

/** The undo and redo labels, for the buttons. */
export function useHistoryLabels(store: EditorStore) {
  const undo = useSyncExternalStore((cb) => store.subscribe(cb), () => store.undoLabel);
  const redo = useSyncExternalStore((cb) => store.subscribe(cb), () => store.redoLabel);
  return { undo, redo };
}
