import type { SaveStatus } from "@hushmark/editor-core";

export function saveStatusText(status: SaveStatus): { text: string; tone: "good" | "muted" | "caution" | "danger" } {
  switch (status.kind) {
    case "saved": return { text: status.at ? "All changes saved" : "Saved", tone: "good" };
    case "waiting": return { text: "Unsaved changes", tone: "muted" };
    case "saving": return { text: "Saving…", tone: "muted" };
    case "offline": return { text: "Offline — kept on this device, retrying", tone: "caution" };
    case "conflict": return { text: "Changed elsewhere — choose a version", tone: "danger" };
    case "rejected": return { text: `Not saved: ${status.message}`, tone: "danger" };
  }
}

const toneClass = { good: "text-good", muted: "text-muted", caution: "text-caution", danger: "text-danger" } as const;
const dotClass = { good: "bg-good", muted: "bg-muted", caution: "bg-caution", danger: "bg-danger" } as const;

/** The line under the canvas: save state, units, zoom, problems, and the tool's hint. */
export function StatusLine({ status, unit, onUnit, scale, problems, onProblems, hint, onConflict }: {
  status: SaveStatus | null;
  /** Reopens the choice when the plan was changed elsewhere. */
  onConflict?: () => void;
  unit: "metric" | "imperial";
  onUnit?: (u: "metric" | "imperial") => void;
  scale: number;
  problems: { errors: number; warnings: number };
  onProblems: () => void;
  hint?: string | undefined;
}) {
  const s = status ? saveStatusText(status) : null;
  return (
    <div className="flex h-10 shrink-0 flex-nowrap items-center gap-x-3 overflow-x-auto whitespace-nowrap border-t border-rule bg-panel px-3 text-[13px] sm:gap-x-4">
      {s ? (
        <span role="status" aria-live="polite" data-testid="save-state" data-state={status?.kind} className={`inline-flex items-center gap-1.5 font-medium ${toneClass[s.tone]}`}>
          <span aria-hidden="true" className={`h-2 w-2 rounded-full ${dotClass[s.tone]}`} />
          {s.text}
        </span>
      ) : null}
      {status?.kind === "conflict" && onConflict ? <button type="button" onClick={onConflict} className="min-h-9 rounded px-2 font-medium text-danger underline">Choose a version</button> : null}
      {onUnit ? (
        <label className="inline-flex items-center gap-1 text-muted">
          <span className="sr-only sm:not-sr-only">Units</span>
          <select value={unit} onChange={(e) => onUnit(e.target.value as "metric" | "imperial")} className="rounded border border-rule bg-panel px-1 py-0.5 text-ink">
            <option value="metric">metres</option>
            <option value="imperial">feet and inches</option>
          </select>
        </label>
      ) : (
        <span className="text-muted">{unit === "metric" ? "metres" : "feet and inches"}</span>
      )}
      <span className="numeric hidden text-muted sm:inline" aria-label="Zoom">{Math.round(scale)} px/m</span>
      <button type="button" onClick={onProblems} className={`numeric min-h-9 rounded px-1 font-medium ${problems.errors ? "text-danger" : problems.warnings ? "text-caution" : "text-good"}`}>
        {problems.errors || problems.warnings ? `${problems.errors} problem${problems.errors === 1 ? "" : "s"}, ${problems.warnings} note${problems.warnings === 1 ? "" : "s"}` : "No problems"}
      </button>
      {hint ? <span className="min-w-0 flex-1 truncate text-right text-muted">{hint}</span> : null}
    </div>
  );
}
