import { BANDS_HZ } from "./bands.js";
import type { Construction, ConstructionCategory } from "./types.js";

/** A problem with an uploaded band table, by line (1-based; 0 for the file as a whole). */
export interface CsvProblem {
  line: number;
  message: string;
}

export type CsvResult<T> = { ok: true; value: T; notes: string[] } | { ok: false; problems: CsvProblem[] };

/** Parses a CSV band table with a header row; columns are picked by name (no unit). */
export function bandTableFromCsv(text: string, columns: readonly string[]): CsvResult<Map<number, Record<string, number>>> {
  const lines = text.replace(/^\uFEFF/, "").split(/\r?\n/);
  const problems: CsvProblem[] = [];
  const header = (lines[0] ?? "").split(/[,;\t]/).map((h) => h.trim().toLowerCase());
  const fi = header.indexOf("frequency_hz");
  if (fi < 0) return { ok: false, problems: [{ line: 1, message: "The first row must name the columns, starting with frequency_hz." }] };
  const idx = columns.map((c) => header.indexOf(c));
  columns.forEach((c, k) => {
    if (idx[k]! < 0) problems.push({ line: 1, message: `Column ${c} is missing.` });
  });
  if (problems.length > 0) return { ok: false, problems };
  const table = new Map<number, Record<string, number>>();
  for (let n = 1; n < lines.length; n++) {
    const raw = lines[n]!.trim();
    if (raw === "" || raw.startsWith("#")) continue;
    const cells = raw.split(/[,;\t]/).map((c) => c.trim());
    const f = Number(cells[fi]);
    if (!BANDS_HZ.includes(f)) {
      problems.push({ line: n + 1, message: `${cells[fi]} Hz is not a one-third-octave band between 50 and 5000 Hz.` });
      continue;
    }
    if (table.has(f)) {
      problems.push({ line: n + 1, message: `${f} Hz appears twice.` });
      continue;
    }
    const row: Record<string, number> = {};
    columns.forEach((c, k) => {
      const v = Number(cells[idx[k]!]);
      if (cells[idx[k]!] === undefined || cells[idx[k]!] === "" || !Number.isFinite(v)) problems.push({ line: n + 1, message: `${c} at ${f} Hz is not a number.` });
      else row[c] = v;
    });
    table.set(f, row);
  }
  return problems.length > 0 ? { ok: false, problems } : { ok: true, value: table, notes: [] };
}

/** Rating bands a lab curve must cover: STC needs 125–4000 Hz, Rw 100–3150 Hz. */
export const REQUIRED_LAB_BANDS_HZ = BANDS_HZ.filter((f) => f >= 100 && f <= 4000);

/**
 * A firm's construction from a CSV of lab data (`frequency_hz,tl_db` and, for floors, `ln_db`),
 * dB per band. 100–4000 Hz must be present; missing outer bands are held at the nearest measured
 * value and said so in the notes.
 */
export function constructionFromCsv(
  text: string,
  meta: { id: string; name: string; category: ConstructionCategory; thicknessMm: number; surfaceDensityKgM2: number; sourceNote: string },
): CsvResult<Construction> {
  const columns = meta.category === "floor" ? ["tl_db", "ln_db"] : ["tl_db"];
  const parsed = bandTableFromCsv(text, columns);
  if (!parsed.ok) return parsed;
  const missing = REQUIRED_LAB_BANDS_HZ.filter((f) => !parsed.value.has(f));
  if (missing.length > 0) return { ok: false, problems: [{ line: 0, message: `Bands ${missing.join(", ")} Hz are missing; ratings need every band from 100 to 4000 Hz.` }] };
  const notes: string[] = [];
  const curve = (col: string): number[] => {
    const held: number[] = [];
    const out = BANDS_HZ.map((f) => {
      const row = parsed.value.get(f);
      if (row) return row[col]!;
      held.push(f);
      const nearest = [...parsed.value.keys()].sort((a, b) => Math.abs(Math.log(a / f)) - Math.abs(Math.log(b / f)))[0]!;
      return parsed.value.get(nearest)![col]!;
    });
    if (held.length > 0) notes.push(`${col}: ${held.join(", ")} Hz not measured, held at the nearest measured band.`);
    return out;
  };
  const tlDb = curve("tl_db");
  if (tlDb.some((v) => v < 0)) return { ok: false, problems: [{ line: 0, message: "A transmission loss below 0 dB cannot be right; check the column." }] };
  const construction: Construction = {
    id: meta.id, name: meta.name, category: meta.category, thicknessMm: meta.thicknessMm, surfaceDensityKgM2: meta.surfaceDensityKgM2, tlDb,
    ...(meta.category === "floor" ? { impactLnDb: curve("ln_db") } : {}),
    source: { kind: "published", note: [meta.sourceNote, ...notes].join(" ") },
  };
  return { ok: true, value: construction, notes };
}

/** A measurement file `frequency_hz,leq_db,lmax_db` as band arrays, dB (bands not measured are null). */
export function measurementFromCsv(text: string): CsvResult<{ leqDb: Array<number | null>; lmaxDb: Array<number | null> }> {
  const parsed = bandTableFromCsv(text, ["leq_db", "lmax_db"]);
  if (!parsed.ok) return parsed;
  const leqDb = BANDS_HZ.map((f) => parsed.value.get(f)?.leq_db ?? null);
  const lmaxDb = BANDS_HZ.map((f) => parsed.value.get(f)?.lmax_db ?? null);
  const problems = BANDS_HZ.flatMap((f, i) => (leqDb[i] !== null && lmaxDb[i] !== null && lmaxDb[i]! < leqDb[i]! ? [{ line: 0, message: `At ${f} Hz Lmax is below Leq.` }] : []));
  return problems.length > 0 ? { ok: false, problems } : { ok: true, value: { leqDb, lmaxDb }, notes: [] };
}
