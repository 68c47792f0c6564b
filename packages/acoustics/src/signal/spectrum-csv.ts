/**
 * Band spectra as CSV: a header row naming a frequency column and a level column (any order,
 * units allowed in the header), optionally a maximum column; comma, semicolon or tab separated;
 * decimal commas when the separator is not a comma. Rows that cannot be read are listed with
 * their line number and the reason; nothing is guessed silently.
 */
import { THIRD_OCTAVE } from "../bands/bands.js";
import { aWeightingDb } from "../bands/weighting.js";

export type CsvSeparator = "," | ";" | "\t";

export interface SpectrumCsvRow {
  line: number;
  bandHz: number;
  levelDb: number;
  maxDb: number | null;
}

export interface SpectrumCsvProblem {
  /** 1-based line in the file. */
  line: number;
  reason: string;
  text: string;
}

export interface SpectrumCsvResult {
  /** False when the file cannot be read at all (no usable header or no readable rows). */
  ok: boolean;
  separator: CsvSeparator;
  decimalComma: boolean;
  columns: { frequency: string; level: string; max: string | null } | null;
  rows: SpectrumCsvRow[];
  problems: SpectrumCsvProblem[];
  /** 21 one-third-octave levels 50–5000 Hz (null where the file has none). */
  leqDb: (number | null)[];
  lmaxDb: (number | null)[] | null;
  missingBandsHz: number[];
  notes: string[];
}

const FREQ_NAMES = /^(freq(uency)?|f|band|centre|center|mid(-?frequency)?|fm|hz)$/;
const MAX_NAMES = /^(l?max|lmax\w*|max(imum)?( level)?|peak( hold| level)?|l?peak|lf?max)$/;
const LEVEL_NAMES = /^(level|leq|l_?eq|spl|lp|l|db|value|band level|sound level|laeq|lzeq)$/;
const BAND_TOLERANCE = 0.03;

interface HeaderCell {
  name: string;
  unit: string;
}

/** Splits "Level (dB)", "level [dBA]", "level_db", "Frequency/Hz" into a name and a unit. */
function headerCell(raw: string): HeaderCell {
  const text = raw.trim().replace(/^"|"$/g, "").trim().toLowerCase();
  const bracket = /^(.*?)[\s_]*[([]\s*([^)\]]*)\s*[)\]]\s*$/.exec(text);
  if (bracket) return { name: bracket[1]!.trim(), unit: bracket[2]!.trim() };
  const slash = /^(.*?)\s*\/\s*(\S+)$/.exec(text);
  if (slash) return { name: slash[1]!.trim(), unit: slash[2]!.trim() };
  const suffix = /^(.*?)[\s_]+(hz|khz|db|dba|dbz|db\(a\)|db\(z\))$/.exec(text);
  if (suffix) return { name: suffix[1]!.trim(), unit: suffix[2]!.trim() };
  if (text === "hz" || text === "khz" || text === "db" || text === "dba") return { name: text, unit: text };
  return { name: text, unit: "" };
}

function splitLine(line: string, sep: CsvSeparator): string[] {
  const cells: string[] = [];
  let cur = "";
  let quoted = false;
  for (let i = 0; i < line.length; i++) {
    const ch = line[i]!;
    if (ch === '"') {
      if (quoted && line[i + 1] === '"') {
        cur += '"';
        i++;
      } else quoted = !quoted;
    } else if (ch === sep && !quoted) {
      cells.push(cur.trim());
      cur = "";
    } else cur += ch;
  }
  cells.push(cur.trim());
  return cells;
}

function pickSeparator(header: string): CsvSeparator {
  const count = (c: string) => header.split(c).length - 1;
  if (count("\t") > 0) return "\t";
  if (count(";") > 0) return ";";
  return ",";
}

function parseNumber(cell: string | undefined, decimalComma: boolean): number | null {
  if (cell === undefined) return null;
  let s = cell.replace(/^"|"$/g, "").trim().replace(/\s+/g, "");
  if (s === "") return null;
  if (decimalComma) s = s.replace(/\./g, s.includes(",") ? "" : ".").replace(",", ".");
  if (!/^[-+]?(\d+\.?\d*|\.\d+)(e[-+]?\d+)?$/i.test(s)) return null;
  return Number(s);
}

/** The nominal band (Hz) a frequency names: a nominal value or within 3 % of an exact mid-frequency. */
export function nominalBandOf(frequencyHz: number): number | null {
  for (let i = 0; i < THIRD_OCTAVE.nominalHz.length; i++) {
    const nominal = THIRD_OCTAVE.nominalHz[i]!;
    const exact = THIRD_OCTAVE.exactHz[i]!;
    if (frequencyHz === nominal || Math.abs(frequencyHz / exact - 1) <= BAND_TOLERANCE) return nominal;
  }
  return null;
}

const empty = (separator: CsvSeparator, decimalComma: boolean, problems: SpectrumCsvProblem[]): SpectrumCsvResult => ({
  ok: false, separator, decimalComma, columns: null, rows: [], problems, leqDb: THIRD_OCTAVE.nominalHz.map(() => null), lmaxDb: null, missingBandsHz: [...THIRD_OCTAVE.nominalHz], notes: [],
});

/** Reads a band spectrum from CSV text (see the module comment for what is accepted). */
export function parseSpectrumCsv(text: string): SpectrumCsvResult {
  const lines = text.replace(/^\uFEFF/, "").split(/\r\n|\n|\r/);
  const headerIndex = lines.findIndex((l) => l.trim() !== "" && !l.trim().startsWith("#"));
  if (headerIndex < 0) return empty(",", false, [{ line: 1, reason: "The file is empty.", text: "" }]);
  const headerLine = lines[headerIndex]!;
  const separator = pickSeparator(headerLine);
  const decimalComma = separator !== ",";
  const cells = splitLine(headerLine, separator).map(headerCell);
  const problems: SpectrumCsvProblem[] = [];
  const headerLineNo = headerIndex + 1;
  const fi = cells.findIndex((c) => FREQ_NAMES.test(c.name) || /^k?hz$/.test(c.unit));
  const mi = cells.findIndex((c, i) => i !== fi && MAX_NAMES.test(c.name));
  const li = cells.findIndex((c, i) => i !== fi && i !== mi && (LEVEL_NAMES.test(c.name) || /^db/.test(c.unit)));
  if (fi < 0 || li < 0) {
    const missing = [fi < 0 ? "a frequency column (for example “frequency (Hz)”)" : null, li < 0 ? "a level column (for example “level (dB)”)" : null].filter(Boolean).join(" and ");
    return empty(separator, decimalComma, [{ line: headerLineNo, reason: `The first row must name the columns; it needs ${missing}.`, text: headerLine }]);
  }
  const freqScale = cells[fi]!.unit === "khz" ? 1000 : 1;
  const aWeighted = /a/.test(cells[li]!.unit.replace(/^db/, "")) || /^la/.test(cells[li]!.name);
  const notes: string[] = [];
  if (aWeighted) notes.push("The levels are marked A-weighted; they were converted back to unweighted band levels.");
  const rows: SpectrumCsvRow[] = [];
  const seen = new Map<number, number>();
  for (let n = headerIndex + 1; n < lines.length; n++) {
    const raw = lines[n]!;
    const line = n + 1;
    if (raw.trim() === "" || raw.trim().startsWith("#")) continue;
    const row = splitLine(raw, separator);
    const bad = (reason: string) => problems.push({ line, reason, text: raw });
    const fCell = row[fi];
    const f = parseNumber(fCell, decimalComma);
    if (f === null) {
      bad(fCell ? `The frequency “${fCell}” is not a number.` : "The frequency is missing.");
      continue;
    }
    const band = nominalBandOf(f * freqScale);
    if (band === null) {
      bad(`${f * freqScale} Hz is not a one-third-octave band between 50 and 5000 Hz.`);
      continue;
    }
    const lCell = row[li];
    const level = parseNumber(lCell, decimalComma);
    if (level === null) {
      bad(lCell ? `The level “${lCell}” at ${band} Hz is not a number.` : `The level at ${band} Hz is missing.`);
      continue;
    }
    if (level < -20 || level > 180) {
      bad(`The level ${level} dB at ${band} Hz is outside −20…180 dB; check the column or the unit.`);
      continue;
    }
    let max: number | null = null;
    if (mi >= 0) {
      const mCell = row[mi];
      max = parseNumber(mCell, decimalComma);
      if (mCell && max === null) {
        bad(`The maximum “${mCell}” at ${band} Hz is not a number.`);
        continue;
      }
      if (max !== null && max < level) {
        bad(`The maximum ${max} dB at ${band} Hz is below its level ${level} dB.`);
        continue;
      }
    }
    const previous = seen.get(band);
    if (previous !== undefined) {
      bad(`${band} Hz already appears on line ${previous}.`);
      continue;
    }
    seen.set(band, line);
    const unweight = aWeighted ? -aWeightingDb(THIRD_OCTAVE.exactHz[THIRD_OCTAVE.nominalHz.indexOf(band)]!) : 0;
    rows.push({ line, bandHz: band, levelDb: round2(level + unweight), maxDb: max === null ? null : round2(max + unweight) });
  }
  const byBand = new Map(rows.map((r) => [r.bandHz, r]));
  const leqDb = THIRD_OCTAVE.nominalHz.map((f) => byBand.get(f)?.levelDb ?? null);
  const hasMax = rows.some((r) => r.maxDb !== null);
  const lmaxDb = hasMax ? THIRD_OCTAVE.nominalHz.map((f) => byBand.get(f)?.maxDb ?? null) : null;
  const missingBandsHz = THIRD_OCTAVE.nominalHz.filter((f) => !byBand.has(f));
  if (rows.length === 0) problems.push({ line: headerLineNo, reason: "No row could be read as a band level.", text: headerLine });
  return {
    ok: rows.length > 0,
    separator,
    decimalComma,
    columns: { frequency: cells[fi]!.name, level: cells[li]!.name, max: mi >= 0 ? cells[mi]!.name : null },
    rows,
    problems,
    leqDb,
    lmaxDb,
    missingBandsHz,
    notes,
  };
}

/** Writes a band spectrum as CSV in the format parseSpectrumCsv reads (unweighted dB, 50–5000 Hz). */
export function spectrumToCsv(spectrum: { leqDb: readonly (number | null)[]; lmaxDb?: readonly (number | null)[] | null }, separator: CsvSeparator = ","): string {
  const withMax = Boolean(spectrum.lmaxDb && spectrum.lmaxDb.some((v) => v !== null));
  const fmt = (v: number | null | undefined) => (v === null || v === undefined ? "" : separator === "," ? v.toFixed(1) : v.toFixed(1).replace(".", ","));
  const header = ["frequency (Hz)", "Leq (dB)", ...(withMax ? ["Lmax (dB)"] : [])].join(separator);
  const lines = THIRD_OCTAVE.nominalHz.flatMap((f, i) => {
    const leq = spectrum.leqDb[i];
    if (leq === null || leq === undefined) return [];
    return [[String(f), fmt(leq), ...(withMax ? [fmt(spectrum.lmaxDb?.[i])] : [])].join(separator)];
  });
  return `${header}\n${lines.join("\n")}\n`;
}

function round2(v: number): number {
  return Math.round(v * 100) / 100;
}
