import { useState } from "react";
import { addLevel, renameElement, type EditorStore } from "@hushmark/editor-core";
import { levelsByElevation, type Plan } from "@hushmark/floorplan";

/** Level switcher with add and rename; the level below shows faintly for stacking rooms. */
export function LevelBar({ plan, levelId, onLevel, store, readOnly }: { plan: Plan; levelId: string; onLevel: (id: string) => void; store: EditorStore; readOnly: boolean }) {
  const levels = levelsByElevation(plan);
  const current = levels.find((l) => l.id === levelId);
  const add = () => {
    const top = levels.at(-1);
    const id = store.ids.next("level");
    const elevation = top ? top.elevationM + (top.heightM ?? 2.7) + 0.3 : 0;
    if (store.run(addLevel(id, `Level ${levels.length + 1}`, Math.round(elevation * 100) / 100, 2.6))) onLevel(id);
  };
  const [editing, setEditing] = useState<string | null>(null);
  const finish = (commit: boolean) => {
    if (commit && current && editing && editing.trim() && editing !== current.name) store.run(renameElement(current.id, editing.trim()));
    setEditing(null);
  };
  if (editing !== null) {
    return (
      <div className="flex items-center gap-1">
        <label className="sr-only" htmlFor="level-name">Name of this level</label>
        <input
          id="level-name"
          autoFocus
          value={editing}
          onChange={(e) => setEditing(e.target.value)}
          onKeyDown={(e) => { if (e.key === "Enter") finish(true); if (e.key === "Escape") finish(false); }}
          onBlur={() => finish(true)}
          className="min-h-9 w-44 rounded-md border border-brand px-2 text-[14px]"
        />
      </div>
    );
  }
  return (
    <div className="flex items-center gap-1">
      <label className="sr-only" htmlFor="level-select">Level</label>
      <select id="level-select" value={levelId} onChange={(e) => onLevel(e.target.value)} className="min-h-9 rounded-md border border-rule bg-panel px-2 text-[14px]">
        {levels.map((l) => <option key={l.id} value={l.id}>{l.name}</option>)}
      </select>
      {!readOnly ? (
        <>
          <button type="button" onClick={() => setEditing(current?.name ?? "")} className="min-h-9 rounded-md px-2 text-[13px] text-muted hover:bg-ink/5">Rename</button>
          <button type="button" onClick={add} className="min-h-9 rounded-md px-2 text-[13px] font-medium text-brand-strong hover:bg-brand-soft">Add level</button>
        </>
      ) : null}
    </div>
  );
}

/** The level just below this one by elevation, if any. */
export function levelBelow(plan: Plan, levelId: string): string | null {
  const levels = levelsByElevation(plan);
  const i = levels.findIndex((l) => l.id === levelId);
  return i > 0 ? levels[i - 1]!.id : null;
}
