import type { Plan } from "../document/schema.js";
import { dxfConverter } from "./dxf-convert.js";
import type { DxfImport, DxfImportOptions, DxfImportResult } from "./dxf-import-types.js";
import { DxfChunkError, dxfSource } from "./dxf-read.js";
import type { DxfProblem } from "./dxf-scan.js";
import { dxfUnitsResolved, type DxfUnits } from "./dxf-units.js";

/** What the layer-mapping dialog needs before converting: units, layers with entity counts. */
export type DxfSurvey =
  | { ok: true; units: DxfUnits; layers: Array<{ name: string; entities: number }>; entityCount: number }
  | { ok: false; problem: DxfProblem };

/** Reads a DXF's units and layers without converting anything (counts of entities). */
export function dxfSurvey(text: string): DxfSurvey {
  const opened = dxfSource(text);
  if (!opened.ok) return opened;
  const s = opened.source;
  return { ok: true, units: s.units, layers: s.layerNames.map((name) => ({ name, entities: s.layerEntityCounts[name] ?? 0 })), entityCount: s.entityCount };
}

/**
 * Converts a DXF text file with the caller's layer roles, `chunkSize` entities at a time,
 * calling `onProgress(done, total)` after each chunk (entity counts). A missing unit answers
 * `dxf-units-missing` so the caller can ask; a damaged file answers `dxf-malformed`.
 */
export function importDxf(text: string, options: DxfImportOptions, onProgress?: (done: number, total: number) => void, chunkSize = 2000): DxfImportResult {
  const opened = dxfSource(text);
  if (!opened.ok) return opened;
  const source = opened.source;
  const units = dxfUnitsResolved(source.units, options.units);
  if (units.status === "missing") {
    return { ok: false, problem: { code: "dxf-units-missing", message: units.message }, units, layerNames: source.layerNames };
  }
  const converter = dxfConverter({ blocks: source.blocks, ...options }, units);
  try {
    for (const chunk of source.chunks(chunkSize)) {
      converter.add(chunk.entities);
      onProgress?.(chunk.done, chunk.total);
    }
  } catch (e) {
    if (e instanceof DxfChunkError) return { ok: false, problem: { code: "dxf-malformed", message: e.message } };
    throw e;
  }
  return { ok: true, imported: converter.finish() };
}

/**
 * A new plan with the imported rooms and openings added (the input plan is left as it was);
 * ids already in the plan get a numeric suffix, with the openings' wall refs following.
 */
export function planWithDxfImport(plan: Plan, imported: DxfImport): { ok: true; plan: Plan } | { ok: false; problem: DxfProblem } {
  const level = plan.elements[imported.underlay.levelId];
  if (!level || level.type !== "level") {
    return { ok: false, problem: { code: "dxf-level-unknown", message: `The plan has no level "${imported.underlay.levelId}" to import onto.` } };
  }
  const elements = { ...plan.elements };
  const renamed = new Map<string, string>();
  const free = (id: string): string => {
    let out = id;
    for (let k = 2; elements[out]; k++) out = `${id}-${k}`;
    return out;
  };
  for (const room of imported.rooms) {
    const id = free(room.id);
    renamed.set(room.id, id);
    elements[id] = { ...room, id, outline: room.outline.map((v) => ({ ...v })) };
  }
  for (const o of imported.openings) {
    const id = free(o.id);
    const [roomId, vertexId] = o.wallRef.split(":");
    const wallRef = `${renamed.get(roomId!) ?? roomId}:${vertexId}`;
    elements[id] = { ...o, id, wallRef };
  }
  return { ok: true, plan: { ...plan, elements } };
}

/** Imports a DXF into a plan in one step; on any problem the plan comes back unchanged (same object). */
export function planFromDxfText(plan: Plan, text: string, options: DxfImportOptions, onProgress?: (done: number, total: number) => void):
  | { ok: true; plan: Plan; imported: DxfImport }
  | { ok: false; plan: Plan; problem: DxfProblem } {
  const result = importDxf(text, options, onProgress);
  if (!result.ok) return { ok: false, plan, problem: result.problem };
  const merged = planWithDxfImport(plan, result.imported);
  if (!merged.ok) return { ok: false, plan, problem: merged.problem };
  return { ok: true, plan: merged.plan, imported: result.imported };
}
