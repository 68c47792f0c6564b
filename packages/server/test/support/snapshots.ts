import type { DataSource } from "typeorm";

/**
 * A table to compare before and after a refused write: its name, or its name with the columns
 * to compare, leaving out columns a background job fills in later (a PDF, a search's progress).
 */
export type TableSpec = string | { table: string; columns: string[] };

/** One fingerprint per table (an md5 of every row, in a stable order). */
export async function snapshot(dataSource: DataSource, tables: TableSpec[]): Promise<Record<string, string>> {
  if (tables.length === 0) return {};
  const parts = tables.map((t) => {
    const name = typeof t === "string" ? t : t.table;
    const row = typeof t === "string" ? "t::text" : `row(${t.columns.map((c) => `t.${c}`).join(", ")})::text`;
    return `SELECT '${name}' AS name, count(*)::int AS n, md5(coalesce(string_agg(${row}, '|' ORDER BY ${row}), '')) AS hash FROM ${name} t`;
  });
  const rows: { name: string; n: number; hash: string }[] = await dataSource.query(parts.join(" UNION ALL "));
  return Object.fromEntries(rows.map((r) => [r.name, `${r.n}:${r.hash}`]));
}
