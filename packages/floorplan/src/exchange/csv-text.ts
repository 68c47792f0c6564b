/** One CSV field per RFC 4180: quoted when it holds a comma, quote or line break (no unit). */
export function csvField(value: string | number | null): string {
  if (value === null) return "";
  let s = typeof value === "number" ? String(value) : value;
  // A text cell starting with = + - @ would run as a formula in a spreadsheet.
  if (typeof value === "string" && /^[=+\-@\t\r]/.test(s)) s = `'${s}`;
  return /[",\r\n]/.test(s) ? `"${s.replace(/"/g, '""')}"` : s;
}

/** Rows as CSV text with CRLF line ends and a final line end, RFC 4180 (no unit). */
export function csvText(rows: ReadonlyArray<ReadonlyArray<string | number | null>>): string {
  return rows.map((r) => r.map(csvField).join(",")).join("\r\n") + "\r\n";
}
