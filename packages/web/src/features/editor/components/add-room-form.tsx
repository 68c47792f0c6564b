import { useId, useState } from "react";
import { addRoomRectangle, parseLength, planBounds, type EditorStore } from "@hushmark/editor-core";
import type { Plan } from "@hushmark/floorplan";

/** Adds a rectangular room by typing its size — the keyboard way to what the Room tool draws. */
export function AddRoomForm({ plan, levelId, store }: { plan: Plan; levelId: string; store: EditorStore }) {
  const id = useId();
  const [width, setWidth] = useState("");
  const [depth, setDepth] = useState("");
  const [error, setError] = useState<string | null>(null);
  const unit = plan.displayUnit;
  const submit = (e: React.FormEvent) => {
    e.preventDefault();
    const w = parseLength(width, unit), d = parseLength(depth, unit);
    if (!w || !d || w <= 0 || d <= 0) { setError(`Give both sizes, e.g. ${unit === "metric" ? "4.2 and 3" : "12' 6\" and 10'"}.`); return; }
    // New rooms go to the right of what is drawn, on the same baseline, so nothing overlaps.
    const b = planBounds(plan, levelId);
    const x = b ? Math.ceil(b.maxX + 1) : 0, y = b ? Math.floor(b.minY + plan.defaults.wallThicknessM / 2) : 0;
    const roomId = store.ids.next("room");
    const n = Object.values(plan.elements).filter((el) => el.type === "room").length + 1;
    if (store.run(addRoomRectangle({ id: roomId, levelId, name: `Room ${n}` }, { x, y }, { x: x + w, y: y + d }))) {
      store.select([roomId]);
      setWidth(""); setDepth(""); setError(null);
    }
  };
  return (
    <form onSubmit={submit} aria-label="Add a room by size" className="flex flex-wrap items-end gap-2 border-b border-rule p-2">
      <div className="flex flex-col gap-0.5">
        <label htmlFor={`${id}-w`} className="text-[12px] font-medium">Width</label>
        <input id={`${id}-w`} value={width} onChange={(e) => setWidth(e.target.value)} inputMode="decimal" placeholder={unit === "metric" ? "4.2" : "12' 6\""} className="min-h-11 w-24 rounded-md border border-rule px-2" />
      </div>
      <div className="flex flex-col gap-0.5">
        <label htmlFor={`${id}-d`} className="text-[12px] font-medium">Depth</label>
        <input id={`${id}-d`} value={depth} onChange={(e) => setDepth(e.target.value)} inputMode="decimal" placeholder={unit === "metric" ? "3" : "10'"} className="min-h-11 w-24 rounded-md border border-rule px-2" />
      </div>
      <button type="submit" className="min-h-11 rounded-md bg-brand px-3 text-[14px] font-medium text-white hover:bg-brand-strong">Add room</button>
      {error ? <p role="alert" className="w-full text-[13px] text-danger">{error}</p> : null}
    </form>
  );
}
