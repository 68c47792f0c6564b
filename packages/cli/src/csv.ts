/**
 * The rating CSV: a header with `frequency_hz` and one of `tl_db` (airborne) or `ln_db` (impact),
 * then one row per one-third-octave band. Errors name the file and the line.
 */
import { InputError } from "./errors.js";

/** Nominal one-third-octave frequencies a rating file may contain, Hz. */
export const CSV_BANDS_HZ = [
  25, 31.5, 40, 50, 63, 80, 100, 125, 160, 200, 250, 315, 400, 500, 630, 800, 1000, 1250, 1600, 2000, 2500, 3150, 4000, 5000,
  6300, 8000, 10000,
];

export interface RatingCsv {
  readonly kind: "airborne" | "impact";
  readonly table: ReadonlyMap<number, number>;
}

function cells(line: string): string[] {
  const delimiter = line.includes(";") && !line.includes(",") ? ";" : line.includes("\t") && !line.includes(",") ? "\t" : ",";
  return line.split(delimiter).map((c) => c.trim().replace(/^"(.*)"$/, "$1").trim());
}

/** Parse the rating CSV text of `file`. */
export function parseRatingCsv(text: string, file: string): RatingCsv {
  const lines = text.replace(/^\uFEFF/, "").split(/\r?\n/);
  const headerAt = lines.findIndex((l) => l.trim() !== "" && !l.trim().startsWith("#"));
  if (headerAt < 0) throw new InputError("the file is empty (expected a header frequency_hz,tl_db or frequency_hz,ln_db)", file);
  const header = cells(lines[headerAt]!).map((h) => h.toLowerCase());
  const where = (i: number) => `${file}:${i + 1}`;
  const fi = header.indexOf("frequency_hz");
  const ti = header.indexOf("tl_db");
  const li = header.indexOf("ln_db");
  if (fi < 0) throw new InputError(`the header needs a frequency_hz column (found: ${header.join(", ")})`, where(headerAt));
  if ((ti < 0) === (li < 0)) throw new InputError("the header needs exactly one of tl_db (airborne) and ln_db (impact)", where(headerAt));
  const vi = ti >= 0 ? ti : li;
  const table = new Map<number, number>();
  for (let i = headerAt + 1; i < lines.length; i++) {
    const line = lines[i]!;
    if (line.trim() === "" || line.trim().startsWith("#")) continue;
    const row = cells(line);
    const f = Number(row[fi]);
    const v = Number(row[vi]);
    if (row[fi] === undefined || row[fi] === "" || !Number.isFinite(f)) throw new InputError(`frequency_hz "${row[fi] ?? ""}" is not a number`, where(i));
    if (!CSV_BANDS_HZ.includes(f)) throw new InputError(`${f} Hz is not a nominal one-third-octave band frequency`, where(i));
    if (row[vi] === undefined || row[vi] === "" || !Number.isFinite(v)) throw new InputError(`${header[vi]} "${row[vi] ?? ""}" is not a number`, where(i));
    if (table.has(f)) throw new InputError(`${f} Hz appears twice`, where(i));
    table.set(f, v);
  }
  if (table.size === 0) throw new InputError("no data rows after the header", where(headerAt));
  return { kind: ti >= 0 ? "airborne" : "impact", table };
}
