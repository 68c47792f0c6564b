import { projectStatusSchema, type Project, type ProjectStatus } from "@hushmark/schemas";
import {
  createColumnHelper,
  flexRender,
  getCoreRowModel,
  getFilteredRowModel,
  getSortedRowModel,
  useReactTable,
  type FilterFn,
  type SortingState,
} from "@tanstack/react-table";
import { useMemo, useState } from "react";
import { Link } from "react-router-dom";
import { EmptyState } from "../../../components/ui/empty-state";
import { Input, Select } from "../../../components/ui/field";
import { paths } from "../../../config/paths";
import { formatDate, formatDateTime, statusLabels } from "../../../lib/format";
import { ProjectStatusBadge } from "./project-status-badge";

const statusOrder = new Map<ProjectStatus, number>(projectStatusSchema.options.map((status, index) => [status, index]));

const column = createColumnHelper<Project>();

// Searching covers what someone would type to find a job: its title, where it is, who it is for.
const matchesText: FilterFn<Project> = (row, _columnId, value: string) => {
  const needle = value.trim().toLowerCase();
  if (!needle) return true;
  const project = row.original;
  const haystack = [project.title, project.siteAddress, ...project.clients.map((client) => client.displayName)].join(" ").toLowerCase();
  return haystack.includes(needle);
};

const columns = [
  column.accessor("title", {
    header: "Title",
    cell: (info) => (
      <Link to={paths.project(info.row.original.id)} className="-my-1 inline-flex min-h-11 items-center font-medium text-brand-strong underline-offset-2 hover:underline">
        {info.getValue()}
      </Link>
    ),
  }),
  column.accessor("siteAddress", {
    header: "Site",
    enableSorting: false,
    cell: (info) => info.getValue() || <span className="text-muted">No address yet</span>,
  }),
  column.accessor("status", {
    header: "Status",
    sortingFn: (a, b) => (statusOrder.get(a.original.status) ?? 0) - (statusOrder.get(b.original.status) ?? 0),
    filterFn: "equals",
    cell: (info) => <ProjectStatusBadge status={info.getValue()} />,
  }),
  column.accessor((project) => project.clients.map((client) => client.displayName).join(", "), {
    id: "clients",
    header: "Clients",
    enableSorting: false,
    cell: (info) => info.getValue() || <span className="text-muted">None</span>,
  }),
  column.accessor("updatedAt", {
    header: "Updated",
    sortingFn: "datetime",
    sortDescFirst: true,
    cell: (info) => (
      <time dateTime={info.getValue()} title={formatDateTime(info.getValue())} className="whitespace-nowrap">
        {formatDate(info.getValue())}
      </time>
    ),
  }),
];

/** Columns left out where the table would not fit: clients below desktop width, the site on a phone (the project page shows it). */
function hiddenBelow(columnId: string): string {
  if (columnId === "clients") return "hidden lg:table-cell";
  if (columnId === "siteAddress") return "hidden sm:table-cell";
  return "";
}

const sortLabels: Record<string, string> = { title: "title", status: "status", updatedAt: "last update" };

const statusFilterOptions = [{ value: "", label: "All statuses" }, ...projectStatusSchema.options.map((status) => ({ value: status, label: statusLabels[status] }))];

/** The firm's projects, sortable by title, status and last update, filtered by text and status. */
export function ProjectsTable({ projects, showClients = true }: { projects: Project[]; showClients?: boolean }) {
  const [sorting, setSorting] = useState<SortingState>([{ id: "updatedAt", desc: true }]);
  const [search, setSearch] = useState("");
  const [status, setStatus] = useState("");
  const columnFilters = useMemo(() => (status ? [{ id: "status", value: status }] : []), [status]);

  const table = useReactTable({
    data: projects,
    columns,
    // A client seeing their own name in every row learns nothing; the column is for the firm.
    state: { sorting, globalFilter: search, columnFilters, columnVisibility: { clients: showClients } },
    onSortingChange: setSorting,
    globalFilterFn: matchesText,
    getColumnCanGlobalFilter: () => true,
    getCoreRowModel: getCoreRowModel(),
    getFilteredRowModel: getFilteredRowModel(),
    getSortedRowModel: getSortedRowModel(),
  });

  const rows = table.getRowModel().rows;
  const filtered = search.trim() !== "" || status !== "";

  return (
    <div className="flex flex-col gap-4">
      <div className="grid gap-3 sm:grid-cols-[minmax(0,1fr)_14rem]">
        <Input label="Search projects" type="search" placeholder="Title, site or client" value={search} onChange={(event) => setSearch(event.target.value)} />
        <Select label="Status" options={statusFilterOptions} value={status} onChange={(event) => setStatus(event.target.value)} />
      </div>
      <p className="text-sm text-muted" aria-live="polite">
        {filtered ? `${rows.length} of ${projects.length} projects shown` : `${projects.length} ${projects.length === 1 ? "project" : "projects"}`}
      </p>
      {rows.length === 0 ? (
        <EmptyState title="No project matches">Try fewer words, or pick "All statuses".</EmptyState>
      ) : (
        <div className="overflow-x-auto rounded-lg border border-rule bg-panel">
          <table className="w-full border-collapse text-left text-[15px]">
            <caption className="sr-only">Projects</caption>
            <thead className="bg-paper/70">
              {table.getHeaderGroups().map((group) => (
                <tr key={group.id} className="border-b border-rule">
                  {group.headers.map((header) => {
                    const sorted = header.column.getIsSorted();
                    const hideOnTablet = hiddenBelow(header.column.id);
                    return (
                      <th
                        key={header.id}
                        scope="col"
                        aria-sort={sorted === "asc" ? "ascending" : sorted === "desc" ? "descending" : undefined}
                        className={`px-3 py-2 text-sm font-semibold text-muted sm:px-4 ${hideOnTablet}`}
                      >
                        {header.column.getCanSort() ? (
                          <button
                            type="button"
                            onClick={header.column.getToggleSortingHandler()}
                            aria-label={`Sort by ${sortLabels[header.column.id] ?? header.column.id}`}
                            className="-mx-2 inline-flex min-h-11 items-center gap-1 rounded px-2 hover:text-ink"
                          >
                            {flexRender(header.column.columnDef.header, header.getContext())}
                            <span aria-hidden="true" className="w-3 text-xs">
                              {sorted === "asc" ? "▲" : sorted === "desc" ? "▼" : "↕"}
                            </span>
                          </button>
                        ) : (
                          flexRender(header.column.columnDef.header, header.getContext())
                        )}
                      </th>
                    );
                  })}
                </tr>
              ))}
            </thead>
            <tbody>
              {rows.map((row) => (
                <tr key={row.id} className="border-b border-rule last:border-b-0 hover:bg-paper/60">
                  {row.getVisibleCells().map((cell) => (
                    <td key={cell.id} className={`px-3 py-3 align-middle sm:px-4 ${hiddenBelow(cell.column.id)}`}>
                      {flexRender(cell.column.columnDef.cell, cell.getContext())}
                    </td>
                  ))}
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
    </div>
  );
}
