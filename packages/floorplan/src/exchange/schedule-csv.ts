import type { Catalogue } from "../catalogue/types.js";
import type { Plan } from "../document/schema.js";
import { csvText } from "./csv-text.js";
import { elementSchedule, type ScheduleRow } from "./element-schedule.js";

/** Columns of the schedule CSV: header text and how a row fills it (lengths to the mm, areas to 0.001 m²). */
export const SCHEDULE_COLUMNS: ReadonlyArray<readonly [string, (r: ScheduleRow) => string | number | null]> = [
  ["level", (r) => r.level],
  ["kind", (r) => r.kind],
  ["id", (r) => r.id],
  ["name", (r) => r.name],
  ["between", (r) => r.between],
  ["length_m", (r) => fixed(r.lengthM, 3)],
  ["width_m", (r) => fixed(r.widthM, 3)],
  ["height_m", (r) => fixed(r.heightM, 3)],
  ["thickness_m", (r) => fixed(r.thicknessM, 3)],
  ["gross_area_m2", (r) => fixed(r.grossAreaM2, 3)],
  ["net_area_m2", (r) => fixed(r.netAreaM2, 3)],
  ["construction_id", (r) => r.constructionId],
  ["construction", (r) => r.construction],
  ["stc", (r) => r.stc],
  ["rw_db", (r) => r.rw],
  ["leak", (r) => r.leak],
  ["open_area_m2", (r) => fixed(r.openAreaM2, 5)],
];

function fixed(v: number | null, digits: number): string | null {
  return v === null ? null : v.toFixed(digits);
}

/** The element schedule as CSV text (RFC 4180, CRLF; lengths m to 3 decimals, areas m² to 3, open areas m² to 5). */
export function elementScheduleCsv(plan: Plan, catalogue: Catalogue): string {
  const rows = elementSchedule(plan, catalogue);
  return csvText([SCHEDULE_COLUMNS.map(([h]) => h), ...rows.map((r) => SCHEDULE_COLUMNS.map(([, f]) => f(r)))]);
}
