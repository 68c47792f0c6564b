/**
 * The price book as CSV: one upgrade a row; lists inside a cell are separated by `;`
 * (cautions by `|`, as they contain semicolons); band values as 21 numbers separated by `;`.
 */
import { priceBookItemInputSchema, type PriceBookItem, type UpgradeEffect } from "@hushmark/schemas";
import type { z } from "zod";

export const CSV_COLUMNS = [
  "code", "name", "family", "applies_to", "effect", "effect_value", "effect_extra",
  "fixed_materials", "fixed_labour", "per_m2_materials", "per_m2_labour", "per_item_materials", "per_item_labour",
  "labour_hours", "added_thickness_mm", "flags", "cautions", "active",
] as const;

type Row = Record<(typeof CSV_COLUMNS)[number], string>;

const cell = (v: string) => (/[",\n\r]/.test(v) ? `"${v.replace(/"/g, '""')}"` : v);
const bands = (v: number | number[]) => (Array.isArray(v) ? v.join(";") : String(v));

function effectCells(e: UpgradeEffect): [string, string, string] {
  switch (e.kind) {
    case "construction": return ["construction", e.constructionId, ""];
    case "added-layer": return ["added-layer", bands(e.deltaTlDb), ""];
    case "sealed-gap": return ["sealed-gap", e.gap, e.remainingOpenAreaM2 ? String(e.remainingOpenAreaM2) : ""];
    case "duct-attenuation": return ["duct-attenuation", bands(e.attenuationDb), ""];
    case "impact-improvement": return ["impact-improvement", bands(e.deltaLDb), e.deltaTlDb === undefined ? "" : bands(e.deltaTlDb)];
  }
}

/** The price book as CSV text with a header row. */
export function priceBookToCsv(items: readonly PriceBookItem[]): string {
  const lines = [CSV_COLUMNS.join(",")];
  for (const i of items) {
    const [effect, value, extra] = effectCells(i.effect);
    const c = i.costs;
    const row = [
      i.code, i.name, i.family, i.appliesTo.join(";"), effect, value, extra,
      c.fixedMaterials, c.fixedLabour, c.perM2Materials, c.perM2Labour, c.perItemMaterials, c.perItemLabour,
      i.labourHours, i.addedThicknessMm, i.flags.join(";"), i.cautions.join("|"), i.active ? "yes" : "no",
    ].map((v) => cell(String(v)));
    lines.push(row.join(","));
  }
  return `${lines.join("\n")}\n`;
}

/** RFC 4180 fields: quoted fields may hold commas, quotes ("") and line breaks. */
export function parseCsv(text: string): string[][] {
  const rows: string[][] = [];
  let row: string[] = [];
  let field = "";
  let quoted = false;
  const src = text.replace(/^\uFEFF/, "");
  for (let i = 0; i < src.length; i++) {
    const ch = src[i]!;
    if (quoted) {
      if (ch === '"' && src[i + 1] === '"') {
        field += '"';
        i++;
      } else if (ch === '"') quoted = false;
      else field += ch;
    } else if (ch === '"' && field === "") quoted = true;
    else if (ch === ",") {
      row.push(field);
      field = "";
    } else if (ch === "\n" || ch === "\r") {
      if (ch === "\r" && src[i + 1] === "\n") i++;
      row.push(field);
      rows.push(row);
      row = [];
      field = "";
    } else field += ch;
  }
  if (field !== "" || row.length > 0) {
    row.push(field);
    rows.push(row);
  }
  return rows.filter((r) => r.some((c) => c.trim() !== ""));
}

const list = (v: string, sep = ";") => v.split(sep).map((s) => s.trim()).filter(Boolean);
const num = (v: string) => (v.trim() === "" ? undefined : Number(v.trim()));
const bandValue = (v: string) => (v.includes(";") ? list(v).map(Number) : Number(v.trim()));

function effectOf(r: Row): unknown {
  switch (r.effect.trim()) {
    case "construction": return { kind: "construction", constructionId: r.effect_value.trim() };
    case "added-layer": return { kind: "added-layer", deltaTlDb: bandValue(r.effect_value) };
    case "sealed-gap": return { kind: "sealed-gap", gap: r.effect_value.trim(), ...(r.effect_extra.trim() ? { remainingOpenAreaM2: Number(r.effect_extra) } : {}) };
    case "duct-attenuation": return { kind: "duct-attenuation", attenuationDb: bandValue(r.effect_value) };
    case "impact-improvement": return { kind: "impact-improvement", deltaLDb: bandValue(r.effect_value), ...(r.effect_extra.trim() ? { deltaTlDb: bandValue(r.effect_extra) } : {}) };
    default: return { kind: r.effect.trim() };
  }
}

export type CsvImport =
  | { ok: true; items: z.output<typeof priceBookItemInputSchema>[] }
  | { ok: false; problems: { row: number; column: string; message: string }[] };

/** Reads a price book CSV; every problem names its row (1 = the header) and column. */
export function priceBookFromCsv(text: string): CsvImport {
  const rows = parseCsv(text);
  const header = (rows[0] ?? []).map((h) => h.trim().toLowerCase());
  const missing = CSV_COLUMNS.filter((c) => !header.includes(c) && !["effect_extra", "active", "cautions", "flags"].includes(c));
  if (rows.length === 0 || missing.length > 0) {
    return { ok: false, problems: [{ row: 1, column: missing.join(", ") || "(header)", message: `The header row must have the columns ${CSV_COLUMNS.join(", ")}; missing: ${missing.join(", ") || "all"}.` }] };
  }
  const problems: { row: number; column: string; message: string }[] = [];
  const items: z.output<typeof priceBookItemInputSchema>[] = [];
  const seen = new Set<string>();
  rows.slice(1).forEach((cells, k) => {
    const rowNo = k + 2;
    const r = Object.fromEntries(CSV_COLUMNS.map((c) => [c, cells[header.indexOf(c)] ?? ""])) as Row;
    const candidate = {
      code: r.code.trim(),
      name: r.name.trim(),
      family: r.family.trim(),
      appliesTo: list(r.applies_to),
      effect: effectOf(r),
      costs: {
        fixedMaterials: num(r.fixed_materials) ?? 0, fixedLabour: num(r.fixed_labour) ?? 0,
        perM2Materials: num(r.per_m2_materials) ?? 0, perM2Labour: num(r.per_m2_labour) ?? 0,
        perItemMaterials: num(r.per_item_materials) ?? 0, perItemLabour: num(r.per_item_labour) ?? 0,
      },
      labourHours: num(r.labour_hours) ?? 0,
      addedThicknessMm: num(r.added_thickness_mm) ?? 0,
      flags: list(r.flags),
      cautions: list(r.cautions, "|"),
      active: !["no", "false", "0"].includes(r.active.trim().toLowerCase()),
    };
    const parsed = priceBookItemInputSchema.safeParse(candidate);
    if (!parsed.success) {
      for (const issue of parsed.error.issues) problems.push({ row: rowNo, column: columnOf(issue.path), message: issue.message });
      return;
    }
    if (seen.has(parsed.data.code)) problems.push({ row: rowNo, column: "code", message: `The code “${parsed.data.code}” appears twice.` });
    seen.add(parsed.data.code);
    items.push(parsed.data);
  });
  return problems.length > 0 ? { ok: false, problems: problems.slice(0, 100) } : { ok: true, items };
}

function columnOf(path: readonly PropertyKey[]): string {
  const [head, sub] = path.map(String);
  const map: Record<string, string> = { appliesTo: "applies_to", effect: sub === "kind" || sub === undefined ? "effect" : "effect_value", labourHours: "labour_hours", addedThicknessMm: "added_thickness_mm" };
  if (head === "costs" && sub) return sub.replace(/[A-Z0-9]+/g, (m) => `_${m.toLowerCase()}`).replace("per_m2", "per_m2");
  return map[head ?? ""] ?? head ?? "(row)";
}
