import { useCallback, useEffect, useRef, useState } from "react";
import { isApiError } from "../../../lib/api-client";

export type SaveState =
  | { kind: "saved"; at: Date | null }
  | { kind: "pending" }
  | { kind: "saving" }
  | { kind: "invalid" }
  | { kind: "conflict" }
  | { kind: "failed"; message: string };

/**
 * Saves a little after the last change, one save at a time; a change made while a save runs is
 * saved right after it. The version sent is always the one the last save answered.
 */
export function useAutosave<T>(options: { version: number; delayMs?: number; validate: () => Promise<T | null>; save: (value: T, baseVersion: number) => Promise<number> }) {
  const [state, setState] = useState<SaveState>({ kind: "saved", at: null });
  const version = useRef(options.version);
  const timer = useRef<ReturnType<typeof setTimeout> | null>(null);
  const running = useRef(false);
  const again = useRef(false);
  const latest = useRef(options);
  latest.current = options;

  const run = useCallback(async () => {
    if (running.current) {
      again.current = true;
      return;
    }
    running.current = true;
    try {
      do {
        again.current = false;
        const value = await latest.current.validate();
        if (value === null) {
          setState({ kind: "invalid" });
          break;
        }
        setState({ kind: "saving" });
        try {
          version.current = await latest.current.save(value, version.current);
          setState({ kind: "saved", at: new Date() });
        } catch (error) {
          if (isApiError(error) && error.status === 409) setState({ kind: "conflict" });
          else setState({ kind: "failed", message: error instanceof Error ? error.message : "The brief was not saved." });
          break;
        }
      } while (again.current);
    } finally {
      running.current = false;
    }
  }, []);

  const changed = useCallback(() => {
    setState((s) => (s.kind === "conflict" ? s : { kind: "pending" }));
    if (timer.current) clearTimeout(timer.current);
    timer.current = setTimeout(() => {
      timer.current = null;
      void run();
    }, latest.current.delayMs ?? 700);
  }, [run]);

  // Leaving the screen with a change still waiting saves it rather than dropping it.
  useEffect(
    () => () => {
      if (!timer.current) return;
      clearTimeout(timer.current);
      timer.current = null;
      void run();
    },
    [run],
  );

  return { state, changed, saveNow: run };
}

export function saveStateText(state: SaveState): string {
  switch (state.kind) {
    case "saved":
      return state.at ? `All changes saved at ${state.at.toLocaleTimeString("en-GB", { hour: "2-digit", minute: "2-digit" })}` : "Up to date";
    case "pending":
      return "Unsaved changes…";
    case "saving":
      return "Saving…";
    case "invalid":
      return "Not saved: fix the fields marked in red";
    case "conflict":
      return "Changed elsewhere since you opened it — reload to see the newer brief";
    case "failed":
      return `Not saved: ${state.message}`;
  }
}
