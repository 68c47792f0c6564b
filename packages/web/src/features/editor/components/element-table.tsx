import { memo, useState } from "react";
import type { EditorStore } from "@hushmark/editor-core";
import { deleteElements, levelOf, renameElement, wallPiecesOf } from "@hushmark/editor-core";
import { formatArea, polygonAreaM2, type Plan } from "@hushmark/floorplan";
import { elementTitle, typeName } from "../panels/element-title";
import { constructionName } from "../panels/construction-ratings";

const PAGE = 200;

function summary(plan: Plan, id: string): string {
  const el = plan.elements[id];
  if (!el) {
    const s = plan.wallSettings[id];
    return constructionName(s?.constructionId ?? (id.includes("|") && !id.match(/\|\d+$/) ? plan.defaults.interiorWallConstructionId : plan.defaults.exteriorWallConstructionId));
  }
  switch (el.type) {
    case "room": return `${formatArea(polygonAreaM2(el.outline), plan.displayUnit)}, ${el.use}`;
    case "door": case "window": return `${constructionName(el.constructionId)}${el.type === "door" && el.leaks?.undercutMm ? `, undercut ${el.leaks.undercutMm} mm` : ""}`;
    case "wall": return constructionName(el.constructionId);
    case "vent": return `${Math.round(el.openAreaM2 * 1e4)} cm² open`;
    case "duct": return `${el.lengthM} m, ${el.lining}`;
    case "penetration": return `${Math.round(el.openAreaM2 * 1e4 * 10) / 10} cm² open`;
    default: return "";
  }
}

/**
 * Every element of the level as a table — the keyboard and screen-reader way to the same edits
 * as the canvas: select, rename, delete.
 */
export const ElementTable = memo(function ElementTable({ plan, levelId, selection, store, readOnly = false }: { plan: Plan; levelId: string; selection: readonly string[]; store: EditorStore; readOnly?: boolean }) {
  const ids = Object.values(plan.elements).filter((e) => e.type !== "level" && e.type !== "neighbour" && levelOf(plan, e.id) === levelId).map((e) => e.id);
  const pieces = wallPiecesOf(plan).filter((p) => p.levelId === levelId).map((p) => p.id);
  const all = [...ids, ...pieces];
  // A large plan lists in pages so opening the list never stalls; the selection always shows.
  const [limit, setLimit] = useState(PAGE);
  const rows = all.length > limit ? [...new Set([...selection.filter((id) => all.includes(id)), ...all.slice(0, limit)])] : all;
  return (
    <table className="w-full text-left text-[14px]" aria-label="Elements on this level">
      <thead className="sticky top-0 bg-panel text-[12px] uppercase tracking-wide text-muted">
        <tr><th scope="col" className="px-2 py-1.5">Kind</th><th scope="col" className="px-2 py-1.5">Name</th><th scope="col" className="px-2 py-1.5">Details</th><th scope="col" className="px-2 py-1.5"><span className="sr-only">Actions</span></th></tr>
      </thead>
      <tbody>
        {rows.map((id) => {
          const el = plan.elements[id];
          const selected = selection.includes(id);
          const nameable = !readOnly && el && (el.type === "room" || el.type === "door" || el.type === "window" || el.type === "void" || el.type === "vent" || el.type === "duct" || el.type === "penetration");
          const title = elementTitle(plan, id);
          return (
            <tr key={id} aria-selected={selected} className={`border-t border-rule ${selected ? "bg-brand-soft" : ""}`}>
              <td className="px-2 py-1 text-muted">{el ? typeName(el.type) : "Wall"}</td>
              <td className="px-2 py-1">
                {nameable ? (
                  <input
                    aria-label={`Name of ${title}`}
                    defaultValue={"name" in el ? (el.name ?? "") : ""}
                    key={`${id}-${"name" in el ? el.name : ""}`}
                    onBlur={(e) => { if (e.target.value !== ("name" in el ? (el.name ?? "") : "")) store.run(renameElement(id, e.target.value)); }}
                    onKeyDown={(e) => { if (e.key === "Enter") (e.target as HTMLInputElement).blur(); }}
                    className="min-h-9 w-full rounded border border-transparent bg-transparent px-1 hover:border-rule focus-visible:border-brand"
                  />
                ) : title}
              </td>
              <td className="px-2 py-1 text-muted">{summary(plan, id)}</td>
              <td className="whitespace-nowrap px-2 py-1 text-right">
                <button type="button" className="min-h-9 rounded px-2 font-medium text-brand-strong hover:bg-brand-soft" aria-label={`Select ${title}`} onClick={() => store.select([id])}>Select</button>
                {el && !readOnly ? <button type="button" className="min-h-9 rounded px-2 text-danger hover:bg-danger/5" aria-label={`Delete ${title}`} onClick={() => store.run(deleteElements([id], plan))}>Delete</button> : null}
              </td>
            </tr>
          );
        })}
        {rows.length === 0 ? <tr><td colSpan={4} className="px-2 py-3 text-muted">Nothing drawn on this level yet.</td></tr> : null}
        {all.length > rows.length ? (
          <tr><td colSpan={4} className="px-2 py-2"><button type="button" className="min-h-11 rounded px-3 font-medium text-brand-strong hover:bg-brand-soft" onClick={() => setLimit((l) => l + PAGE * 4)}>Show more ({all.length - rows.length} not listed)</button></td></tr>
        ) : null}
      </tbody>
    </table>
  );
});
