import { useEffect, useId, useRef, useState } from "react";

/**
 * A text or number field that edits locally and commits on Enter or leaving the field, so typing
 * never waits on the plan and one edit is one undo step. Escape puts the stored value back.
 */
export function CommitInput({ label, value, onCommit, type = "text", suffix, min, step, hint, multiline }: {
  label: string;
  value: string;
  onCommit: (value: string) => void;
  type?: "text" | "number";
  suffix?: string;
  min?: number;
  step?: number | "any";
  hint?: string;
  multiline?: boolean;
}) {
  const id = useId();
  const [draft, setDraft] = useState(value);
  const focused = useRef(false);
  useEffect(() => {
    if (!focused.current) setDraft(value);
  }, [value]);
  const commit = () => {
    if (draft !== value) onCommit(draft);
  };
  const common = {
    id,
    value: draft,
    "aria-describedby": hint ? `${id}-hint` : undefined,
    onFocus: () => { focused.current = true; },
    onBlur: () => { focused.current = false; commit(); },
    className: "min-h-11 w-full rounded-md border border-rule bg-panel px-3 text-[15px] text-ink focus-visible:border-brand",
  };
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="text-sm font-medium">{label}</label>
      <div className="flex items-center gap-2">
        {multiline ? (
          <textarea {...common} rows={3} className={`${common.className} py-2`} onChange={(e) => setDraft(e.target.value)} onKeyDown={(e) => { if (e.key === "Escape") setDraft(value); }} />
        ) : (
          <input
            {...common}
            type={type}
            inputMode={type === "number" ? "decimal" : undefined}
            min={min}
            step={step ?? (type === "number" ? "any" : undefined)}
            onChange={(e) => setDraft(e.target.value)}
            onKeyDown={(e) => {
              if (e.key === "Enter") { commit(); }
              if (e.key === "Escape") setDraft(value);
            }}
          />
        )}
        {suffix ? <span className="shrink-0 text-sm text-muted">{suffix}</span> : null}
      </div>
      {hint ? <p id={`${id}-hint`} className="text-[13px] text-muted">{hint}</p> : null}
    </div>
  );
}

export function SelectField<T extends string>({ label, value, options, onChange }: { label: string; value: T; options: ReadonlyArray<{ value: T; label: string }>; onChange: (v: T) => void }) {
  const id = useId();
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="text-sm font-medium">{label}</label>
      <select id={id} value={value} onChange={(e) => onChange(e.target.value as T)} className="min-h-11 w-full rounded-md border border-rule bg-panel px-2 text-[15px]">
        {options.map((o) => <option key={o.value} value={o.value}>{o.label}</option>)}
      </select>
    </div>
  );
}

/** Reads a number a person typed ("12", "12.5", "12,5"), or null. */
export function readNumber(text: string): number | null {
  const n = Number(text.trim().replace(",", "."));
  return text.trim() !== "" && Number.isFinite(n) ? n : null;
}
