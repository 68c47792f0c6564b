import { priceBookItemInputSchema, upgradeCostsSchema, type PriceBookItem, type PriceBookItemInput } from "@hushmark/schemas";
import {
  createColumnHelper, flexRender, getCoreRowModel, getFilteredRowModel, getSortedRowModel, useReactTable, type SortingState,
} from "@tanstack/react-table";
import { useMemo, useState } from "react";
import { z } from "zod";
import { isApiError } from "../../../lib/api-client";
import { NARROW, useMediaQuery } from "../../../lib/use-media-query";
import { useUpdatePriceBookItem } from "../api/price-book";
import { EditableCell } from "./editable-cell";
import { familyLabels, flagLabels, formatMoney } from "./money";

const shape = priceBookItemInputSchema.shape;
const costShape = upgradeCostsSchema.shape;
const col = createColumnHelper<PriceBookItem>();
const num = (t: string) => (t.trim() === "" ? Number.NaN : Number(t.replace(",", ".")));

function effectWords(item: PriceBookItem): string {
  const e = item.effect;
  const db = (v: number | number[]) => (Array.isArray(v) ? "by band" : `${v} dB`);
  switch (e.kind) {
    case "construction": return `becomes ${e.constructionId}`;
    case "added-layer": return `adds ${db(e.deltaTlDb)} TL`;
    case "sealed-gap": return `seals the ${e.gap} gap`;
    case "duct-attenuation": return `duct −${db(e.attenuationDb)}`;
    case "impact-improvement": return `impact ΔL ${db(e.deltaLDb)}`;
  }
}

/** The price book: sortable, filterable, and edited in place by owners (the server checks again). */
export function PriceBookTable({ items, currency, editable }: { items: PriceBookItem[]; currency: string; editable: boolean }) {
  const [sorting, setSorting] = useState<SortingState>([{ id: "family", desc: false }]);
  const [filter, setFilter] = useState("");
  const [family, setFamily] = useState("");
  const update = useUpdatePriceBookItem();
  const narrow = useMediaQuery(NARROW);
  const save = (id: string, patch: Partial<PriceBookItemInput>) =>
    update.mutateAsync({ id, patch }).then(() => undefined).catch((e: unknown) => {
      throw new Error(isApiError(e) ? (e.fieldIssues[0]?.message ?? e.message) : "Not saved.");
    });

  const money = (key: keyof PriceBookItem["costs"], header: string) =>
    col.accessor((r) => r.costs[key], {
      id: key,
      header,
      cell: (c) => (
        <EditableCell value={c.getValue()} schema={costShape[key] as unknown as z.ZodType<number>} parse={num} format={String} display={(v) => (v ? String(v) : "")} label={`${header} of ${c.row.original.name}`} editable={editable}
          onSave={(v) => save(c.row.original.id, { costs: { ...c.row.original.costs, [key]: v } })} />
      ),
      meta: { numeric: true },
    });

  const columns = useMemo(() => [
    col.accessor("name", {
      header: "Upgrade",
      cell: (c) => <EditableCell value={c.getValue()} schema={shape.name as z.ZodType<string>} parse={(t) => t} format={(v) => v} label={`Name of ${c.row.original.code}`} editable={editable} onSave={(v) => save(c.row.original.id, { name: v })} />,
    }),
    col.accessor("family", { header: "Family", cell: (c) => familyLabels[c.getValue()] ?? c.getValue(), filterFn: "equalsString" }),
    col.accessor((r) => r.appliesTo.join(", "), { id: "appliesTo", header: "Applies to" }),
    col.accessor((r) => effectWords(r), { id: "effect", header: "Effect", enableSorting: false }),
    money("fixedMaterials", "Fixed materials"),
    money("fixedLabour", "Fixed labour"),
    money("perM2Materials", "Materials / m²"),
    money("perM2Labour", "Labour / m²"),
    money("perItemMaterials", "Materials / item"),
    money("perItemLabour", "Labour / item"),
    col.accessor("labourHours", {
      header: "Labour h",
      cell: (c) => <EditableCell value={c.getValue()} schema={shape.labourHours as unknown as z.ZodType<number>} parse={num} format={String} label={`Labour hours of ${c.row.original.name}`} editable={editable} onSave={(v) => save(c.row.original.id, { labourHours: v })} />,
    }),
    col.accessor("addedThicknessMm", {
      header: "Adds mm",
      cell: (c) => <EditableCell value={c.getValue()} schema={shape.addedThicknessMm as unknown as z.ZodType<number>} parse={num} format={String} label={`Added thickness of ${c.row.original.name}`} editable={editable} onSave={(v) => save(c.row.original.id, { addedThicknessMm: v })} />,
    }),
    col.accessor((r) => r.flags.map((f) => flagLabels[f] ?? f).join(", "), { id: "flags", header: "Gives up", enableSorting: false }),
    col.accessor((r) => r.cautions.length, { id: "cautions", header: "Cautions" }),
  ], [editable]);

  const table = useReactTable({
    data: items,
    columns,
    state: { sorting, globalFilter: filter, columnFilters: family ? [{ id: "family", value: family }] : [] },
    onSortingChange: setSorting,
    onGlobalFilterChange: setFilter,
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getFilteredRowModel: getFilteredRowModel(),
    globalFilterFn: "includesString",
  });

  return (
    <div className="flex flex-col gap-3">
      <div className="flex flex-wrap items-end gap-3">
        <label className="flex min-w-56 flex-1 flex-col gap-1 text-sm font-medium">
          Find
          <input className="min-h-11 rounded-md border border-rule bg-panel px-3 text-[15px]" placeholder="name, element, effect…" value={filter} onChange={(e) => setFilter(e.target.value)} />
        </label>
        <label className="flex flex-col gap-1 text-sm font-medium">
          Family
          <select className="min-h-11 rounded-md border border-rule bg-panel px-3" value={family} onChange={(e) => setFamily(e.target.value)}>
            <option value="">All</option>
            {Object.entries(familyLabels).map(([k, v]) => <option key={k} value={k}>{v}</option>)}
          </select>
        </label>
        {narrow ? <SortChoice table={table} /> : null}
        <p className="text-sm text-muted">{table.getRowModel().rows.length} of {items.length} · prices in {currency}{editable ? " · click a value to change it" : ""}</p>
      </div>
      {narrow ? <ItemCards table={table} editable={editable} /> : (
      <div className="overflow-x-auto rounded-lg border border-rule bg-panel">
        <table className="w-full min-w-[1280px] text-sm tabular-nums">
          <thead>
            {table.getHeaderGroups().map((g) => (
              <tr key={g.id} className="border-b border-rule text-left">
                {g.headers.map((h) => (
                  <th key={h.id} scope="col" className="px-2 py-2 align-bottom font-medium text-muted" aria-sort={h.column.getIsSorted() === "asc" ? "ascending" : h.column.getIsSorted() === "desc" ? "descending" : undefined}>
                    {h.column.getCanSort() ? (
                      <button type="button" className="flex min-h-9 items-center gap-1 text-left hover:text-ink" onClick={h.column.getToggleSortingHandler()}>
                        {flexRender(h.column.columnDef.header, h.getContext())}
                        <span aria-hidden="true">{h.column.getIsSorted() === "asc" ? "▲" : h.column.getIsSorted() === "desc" ? "▼" : ""}</span>
                      </button>
                    ) : flexRender(h.column.columnDef.header, h.getContext())}
                  </th>
                ))}
              </tr>
            ))}
          </thead>
          <tbody>
            {table.getRowModel().rows.map((r) => (
              <tr key={r.id} className={`border-b border-rule/60 ${r.original.active ? "" : "text-muted"}`}>
                {r.getVisibleCells().map((c) => <td key={c.id} className={`px-2 py-1 align-top ${c.column.id === "name" ? "min-w-56" : c.column.id === "effect" ? "min-w-40" : ""}`}>{flexRender(c.column.columnDef.cell, c.getContext())}</td>)}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      )}
      <p className="text-xs text-muted">Example: a 10 m² wall with “{formatMoney(14, currency)}/m² materials + {formatMoney(22, currency)}/m² labour + {formatMoney(120, currency)} fixed labour” costs {formatMoney(14 * 10 + 22 * 10 + 120, currency)}.</p>
    </div>
  );
}

type ItemTable = ReturnType<typeof useReactTable<PriceBookItem>>;

/** On a phone the column headers are out of sight, so the order is a choice of its own. */
function SortChoice({ table }: { table: ItemTable }) {
  const sorted = table.getState().sorting[0];
  const value = sorted ? `${sorted.id}:${sorted.desc ? "desc" : "asc"}` : "";
  const sortable = table.getAllLeafColumns().filter((c) => c.getCanSort());
  return (
    <label className="flex flex-col gap-1 text-sm font-medium">
      Order by
      <select className="min-h-11 rounded-md border border-rule bg-panel px-3" value={value} onChange={(e) => {
        const [id, dir] = e.target.value.split(":");
        table.setSorting(id ? [{ id, desc: dir === "desc" }] : []);
      }}>
        {sortable.flatMap((c) => {
          const header = typeof c.columnDef.header === "string" ? c.columnDef.header : c.id;
          return [<option key={`${c.id}:asc`} value={`${c.id}:asc`}>{header} ▲</option>, <option key={`${c.id}:desc`} value={`${c.id}:desc`}>{header} ▼</option>];
        })}
      </select>
    </label>
  );
}

/**
 * The same rows as the table, one card each, for widths where thirteen columns cannot fit: the
 * name on top, then each value under its column's name, edited in place as in the table. A
 * reader who cannot edit is not shown the costs that do not apply (zero).
 */
function ItemCards({ table, editable }: { table: ItemTable; editable: boolean }) {
  return (
    <ul className="flex flex-col gap-2" aria-label="Upgrades">
      {table.getRowModel().rows.map((r) => {
        const [name, ...cells] = r.getVisibleCells();
        const rest = editable ? cells : cells.filter((c) => c.getValue() !== 0 && c.getValue() !== "");
        return (
          <li key={r.id} className={`rounded-lg border border-rule bg-panel p-3 text-sm tabular-nums ${r.original.active ? "" : "text-muted"}`}>
            <div className="text-[15px] font-medium">{name ? flexRender(name.column.columnDef.cell, name.getContext()) : null}</div>
            <dl className="mt-2 grid grid-cols-[auto_1fr] items-baseline gap-x-3 gap-y-1">
              {rest.map((c) => (
                <div key={c.id} className="contents">
                  <dt className="text-muted">{typeof c.column.columnDef.header === "string" ? c.column.columnDef.header : c.column.id}</dt>
                  <dd className="min-w-0 break-words">{flexRender(c.column.columnDef.cell, c.getContext())}</dd>
                </div>
              ))}
            </dl>
          </li>
        );
      })}
    </ul>
  );
}
