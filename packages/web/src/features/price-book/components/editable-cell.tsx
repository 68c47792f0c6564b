import { useEffect, useRef, useState } from "react";
import type { z } from "zod";

/**
 * A table cell that edits in place: Enter or leaving the field saves, Escape puts the old value
 * back; the value is checked with the same schema the server uses before anything is sent.
 */
export function EditableCell<T>({ value, schema, parse, format, display = format, label, editable, onSave }: {
  value: T;
  /** How the value reads when not being edited (default: as edited). */
  display?: (v: T) => string;
  schema: z.ZodType<T>;
  parse: (text: string) => unknown;
  format: (v: T) => string;
  label: string;
  editable: boolean;
  onSave: (v: T) => Promise<void>;
}) {
  const [editing, setEditing] = useState(false);
  const [text, setText] = useState(format(value));
  const [error, setError] = useState<string | null>(null);
  const [saving, setSaving] = useState(false);
  const input = useRef<HTMLInputElement>(null);
  useEffect(() => {
    if (!editing) setText(format(value));
  }, [value, editing, format]);
  useEffect(() => {
    if (editing) input.current?.select();
  }, [editing]);
  if (!editable) return <span>{display(value)}</span>;
  if (!editing) {
    return (
      <button type="button" className="min-h-9 w-full rounded px-1 text-left hover:bg-brand-soft focus-visible:bg-brand-soft" onClick={() => setEditing(true)} aria-label={`${label}: ${format(value)}. Edit`}>
        {display(value) || <span className="text-muted">—</span>}
      </button>
    );
  }
  async function commit() {
    const parsed = schema.safeParse(parse(text));
    if (!parsed.success) {
      setError(parsed.error.issues[0]?.message ?? "Not a valid value.");
      return;
    }
    if (format(parsed.data) === format(value)) {
      setEditing(false);
      setError(null);
      return;
    }
    setSaving(true);
    try {
      await onSave(parsed.data);
      setEditing(false);
      setError(null);
    } catch (e) {
      setError(e instanceof Error ? e.message : "Not saved.");
    } finally {
      setSaving(false);
    }
  }
  return (
    <span className="flex flex-col">
      <input
        ref={input}
        aria-label={label}
        aria-invalid={error ? true : undefined}
        className="min-h-9 w-full min-w-16 rounded border border-brand bg-panel px-1 aria-[invalid=true]:border-danger"
        value={text}
        disabled={saving}
        onChange={(e) => setText(e.target.value)}
        onBlur={() => void commit()}
        onKeyDown={(e) => {
          if (e.key === "Enter") void commit();
          if (e.key === "Escape") {
            setText(format(value));
            setError(null);
            setEditing(false);
          }
        }}
      />
      {error ? <span role="alert" className="text-xs font-medium text-danger">{error}</span> : null}
    </span>
  );
}
