import { useId, useMemo, useState } from "react";
import type { ConstructionCategory } from "@hushmark/floorplan";
import { constructionsOf, rated, sourceKindLabel } from "./construction-ratings";
import { constructionCatalogue } from "@hushmark/floorplan";

/** A searchable list of catalogue constructions with their ratings and where each curve comes from. */
export function ConstructionPicker({ category, value, onPick, label = "Construction" }: { category: ConstructionCategory; value: string; onPick: (id: string) => void; label?: string }) {
  const id = useId();
  const [query, setQuery] = useState("");
  const [open, setOpen] = useState(false);
  const all = useMemo(() => constructionsOf(category), [category]);
  const words = query.toLowerCase().split(/\s+/).filter(Boolean);
  const shown = all.filter((r) => words.every((w) => `${r.construction.name} ${r.construction.id}`.toLowerCase().includes(w)));
  const current = constructionCatalogue.constructions[value];
  const currentRated = current ? rated(current) : null;
  return (
    <div className="flex flex-col gap-1">
      <span id={`${id}-label`} className="text-sm font-medium">{label}</span>
      <button
        type="button"
        aria-expanded={open}
        aria-controls={`${id}-list`}
        aria-labelledby={`${id}-label ${id}-current`}
        onClick={() => setOpen((o) => !o)}
        className="flex min-h-11 w-full flex-col items-start rounded-md border border-rule bg-panel px-3 py-2 text-left hover:border-muted"
      >
        <span id={`${id}-current`} className="text-[15px]">{current?.name ?? "Not chosen"}</span>
        {currentRated ? <Ratings r={currentRated} /> : null}
      </button>
      {current ? <p className="text-[12px] text-muted">{sourceKindLabel[current.source.kind]}: {current.source.note}</p> : null}
      {open ? (
        <div className="rounded-md border border-rule bg-panel p-2 shadow-sm">
          <input
            type="search"
            aria-label={`Search ${category} constructions`}
            placeholder="Search, e.g. stud insulated"
            value={query}
            autoFocus
            onChange={(e) => setQuery(e.target.value)}
            className="mb-2 min-h-11 w-full rounded-md border border-rule px-3"
          />
          <ul id={`${id}-list`} role="listbox" aria-label={`${label} choices`} className="max-h-64 overflow-y-auto">
            {shown.map((r) => (
              <li key={r.construction.id} role="option" aria-selected={r.construction.id === value}>
                <button
                  type="button"
                  onClick={() => { onPick(r.construction.id); setOpen(false); setQuery(""); }}
                  className={`flex w-full flex-col items-start rounded px-2 py-2 text-left hover:bg-brand-soft ${r.construction.id === value ? "bg-brand-soft" : ""}`}
                >
                  <span className="text-[14px]">{r.construction.name}</span>
                  <Ratings r={r} />
                </button>
              </li>
            ))}
            {shown.length === 0 ? <li className="px-2 py-2 text-sm text-muted">Nothing matches “{query}”.</li> : null}
          </ul>
        </div>
      ) : null}
    </div>
  );
}

function Ratings({ r }: { r: ReturnType<typeof rated> }) {
  return (
    <span className="numeric mt-0.5 flex flex-wrap gap-x-3 text-[12px] text-muted">
      {r.stc !== null ? <span>STC {r.stc}</span> : null}
      {r.rw !== null ? <span>Rw {r.rw}</span> : null}
      {r.oitc !== null ? <span>OITC {r.oitc}</span> : null}
      <span>{r.construction.thicknessMm} mm</span>
      <span>{Math.round(r.construction.surfaceDensityKgM2)} kg/m²</span>
    </span>
  );
}
