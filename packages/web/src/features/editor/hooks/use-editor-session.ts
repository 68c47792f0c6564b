import { useEffect, useState, useSyncExternalStore } from "react";
import { useQueryClient, type QueryClient } from "@tanstack/react-query";
import { projectKeys } from "../../projects/api/keys";
import { Autosave, EditorStore, pendingAlreadyStored, storagePendingStore, type SaveStatus } from "@hushmark/editor-core";
import { parsePlan } from "@hushmark/floorplan";
import type { PlanResponse } from "@hushmark/schemas";
import { planTransport } from "../api/save-plan";
import { openPlan } from "../model/open-plan";

const browserClock = {
  now: () => Date.now(),
  setTimeout: (fn: () => void, ms: number) => window.setTimeout(fn, ms),
  clearTimeout: (h: unknown) => window.clearTimeout(h as number),
};

export interface EditorSession {
  store: EditorStore;
  autosave: Autosave;
  /** Set when the stored document could not be read and a blank plan was opened instead. */
  loadProblem: string | null;
  /** True when edits from an earlier visit, never confirmed by the server, were put back. */
  restoredPending: boolean;
}

function createSession(projectId: string, response: PlanResponse, title: string, readOnly: boolean, queryClient: QueryClient): EditorSession {
  const opened = openPlan(response.document, projectId, title);
  // Marks for the editor benchmark's breakdown of opening a plan (cheap; read by nothing else).
  performance.mark("hushmark:plan-parsed");
  const store = new EditorStore(opened.plan);
  const pending = storagePendingStore(window.localStorage, projectId);
  let baseVersion = response.version;
  let restoredPending = false;
  let kept = readOnly ? null : pending.read();
  if (kept && pendingAlreadyStored(kept, response)) {
    // Its save reached the server but the answer was lost (say, sent as the page unloaded).
    pending.clear();
    kept = null;
  }
  if (kept) {
    const parsed = parsePlan(kept.document);
    if (parsed.ok) {
      store.load(parsed.plan);
      baseVersion = kept.baseVersion;
      restoredPending = true;
    } else {
      pending.clear();
    }
  }
  const autosave = new Autosave({ transport: planTransport(projectId, (saved) => queryClient.setQueryData(projectKeys.plan(projectId), saved)), clock: browserClock, baseVersion, pending, debounceMs: 700 });
  if (restoredPending) autosave.edited(store.plan);
  if (!readOnly) {
    store.subscribe((s) => {
      if (s.lastChange === "edit" || s.lastChange === "undo" || s.lastChange === "redo") autosave.edited(s.plan);
    });
  }
  return { store, autosave, loadProblem: opened.problem, restoredPending };
}

/** One editing session over the loaded plan: the store, and autosave wired to it and to the connection. */
export function useEditorSession(projectId: string, response: PlanResponse, title: string, readOnly: boolean): EditorSession {
  const queryClient = useQueryClient();
  const [session] = useState(() => createSession(projectId, response, title, readOnly, queryClient));
  useEffect(() => {
    const { autosave } = session;
    const online = () => autosave.online();
    const leave = () => autosave.flush();
    window.addEventListener("online", online);
    window.addEventListener("pagehide", leave);
    return () => {
      window.removeEventListener("online", online);
      window.removeEventListener("pagehide", leave);
      autosave.flush();
    };
  }, [session]);
  return session;
}

export function useSaveStatus(autosave: Autosave): SaveStatus {
  return useSyncExternalStore((cb) => autosave.subscribe(cb), () => autosave.status);
}
