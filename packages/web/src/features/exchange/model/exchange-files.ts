import { constructionCatalogue, elementScheduleCsv, planToDxf, planToGeoJson, serializePlan, type Plan, type SiteLocation } from "@hushmark/floorplan";

/** A file ready to download: its text, media type and name. */
export interface ExportFile {
  text: string;
  type: string;
  fileName: string;
}

/** Letters, digits and dashes for file names. */
function safeName(s: string): string {
  return s.normalize("NFKD").replace(/[^\w-]+/g, "-").replace(/-+/g, "-").replace(/^-|-$/g, "").toLowerCase() || "plan";
}

/** The shown level as a DXF drawing in metres, for the contractor's CAD. */
export function dxfFile(plan: Plan, levelId: string, title: string): ExportFile {
  const level = plan.elements[levelId];
  const levelName = level?.type === "level" ? level.name : levelId;
  return { text: planToDxf(plan, { levelId }), type: "application/dxf", fileName: `${safeName(title)}-${safeName(levelName)}.dxf` };
}

/** The shown level as GeoJSON: at the site when one is given, else in the documented local frame. */
export function geoJsonFile(plan: Plan, levelId: string, title: string, site?: SiteLocation): ExportFile & { frame: "site" | "local" } {
  const out = planToGeoJson(plan, site);
  const fc = out.levels.find((l) => l.hushmark.levelId === levelId) ?? out.levels[0];
  const levelName = fc?.hushmark.levelName ?? levelId;
  return { text: `${JSON.stringify(fc ?? { type: "FeatureCollection", features: [] }, null, 2)}\n`, type: "application/geo+json", fileName: `${safeName(title)}-${safeName(levelName)}.geojson`, frame: out.frame.kind };
}

/** The element schedule (every wall piece, opening, floor, vent and duct with quantities) as CSV. */
export function scheduleFile(plan: Plan, title: string): ExportFile {
  return { text: elementScheduleCsv(plan, constructionCatalogue), type: "text/csv", fileName: `${safeName(title)}-schedule.csv` };
}

/** The plan document itself (all levels, constructions and leaks), as Hushmark reads it back. */
export function planDocumentFile(plan: Plan, title: string): ExportFile {
  return { text: serializePlan(plan), type: "application/json", fileName: `${safeName(title)}.plan.json` };
}
