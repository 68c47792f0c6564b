/** Output helpers: rounded numbers, JSON without non-finite numbers, plain text tables. */

/** Round for output; non-finite values become null (JSON has no −Infinity). */
export function num(v: number, decimals = 2): number | null {
  if (!Number.isFinite(v)) return null;
  const f = Math.pow(10, decimals);
  return Math.round(v * f) / f;
}

/** A level for text output: "—" when there is no energy. */
export function dbText(v: number, decimals = 1): string {
  return Number.isFinite(v) ? v.toFixed(decimals) : "—";
}

/** JSON text with a trailing newline. */
export function jsonText(value: unknown): string {
  return `${JSON.stringify(value, (_k, v) => (typeof v === "number" && !Number.isFinite(v) ? null : v), 2)}\n`;
}

/** A left-aligned text table. */
export function table(header: readonly string[], rows: readonly (readonly string[])[]): string {
  const widths = header.map((h, i) => Math.max(h.length, ...rows.map((r) => (r[i] ?? "").length)));
  const line = (r: readonly string[]) => r.map((c, i) => (c ?? "").padEnd(widths[i]!)).join("  ").trimEnd();
  return [line(header), line(widths.map((w) => "-".repeat(w))), ...rows.map(line)].join("\n") + "\n";
}
