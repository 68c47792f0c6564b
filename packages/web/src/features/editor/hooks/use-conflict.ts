import { useState } from "react";
import { parsePlan } from "@hushmark/floorplan";
import type { EditorSession } from "./use-editor-session";
import { getPlan } from "../../projects/api/get-plan";
import { savePlan } from "../api/save-plan";

/**
 * The two ways out of a conflict, neither losing anything: keep mine (saved on top of theirs,
 * which stays in the history), or load theirs after saving mine into the history first.
 */
export function useConflict(projectId: string, session: EditorSession) {
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const keepMine = (currentVersion: number) => {
    setError(null);
    session.autosave.keepMine(currentVersion);
  };
  const takeTheirs = async () => {
    setBusy(true);
    setError(null);
    try {
      const theirs = await getPlan(projectId);
      const parsed = parsePlan(theirs.document);
      const mine = session.store.plan;
      const kept = await savePlan(projectId, mine, theirs.version, "Set aside when the plan was changed elsewhere");
      const back = await savePlan(projectId, theirs.document, kept.version, "Their version, loaded after a conflict");
      if (parsed.ok) session.store.load(parsed.plan);
      session.autosave.takeTheirs(back.version);
    } catch (e) {
      setError(e instanceof Error ? e.message : "Their version could not be loaded.");
    } finally {
      setBusy(false);
    }
  };
  return { busy, error, keepMine, takeTheirs };
}
