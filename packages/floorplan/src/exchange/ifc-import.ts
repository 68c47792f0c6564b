import type { IfcAPI } from "web-ifc";
import type { Plan } from "../document/schema.js";
import { convertIfc } from "./ifc-convert.js";
import { readIfc } from "./ifc-read.js";
import type { IfcImport, IfcImportOptions, IfcProblem } from "./ifc-types.js";

/**
 * A ready IFC reader. `locateWasm(file)` says where `web-ifc.wasm` is served (a browser or a
 * worker passes its bundled asset URL; Node finds the file beside the package). Single-threaded,
 * so no cross-origin isolation is needed. web-ifc is loaded here and only here, so code that
 * merely converts or merges a read model never loads it.
 */
export async function ifcReader(locateWasm?: (file: string) => string): Promise<IfcAPI> {
  const { IfcAPI } = await import("web-ifc");
  const api = new IfcAPI();
  await api.Init(locateWasm ? (path: string) => (path.endsWith(".wasm") ? locateWasm(path) : path) : undefined, true);
  return api;
}

/** Reads and converts an IFC file in one step (see `readIfc` and `convertIfc`). */
export function importIfc(api: IfcAPI, bytes: Uint8Array, options: IfcImportOptions = {}, onProgress?: (done: number, total: number) => void):
  | { ok: true; imported: IfcImport }
  | { ok: false; problem: IfcProblem } {
  const read = readIfc(api, bytes, onProgress);
  if (!read.ok) return read;
  return { ok: true, imported: convertIfc(read.model, options) };
}

/**
 * A new plan with the imported levels, rooms, walls and openings added (the input is left as it
 * was). Ids already in the plan get a numeric suffix and references follow; a storey mapped onto
 * a level the plan does not have is refused.
 */
export function planWithIfcImport(plan: Plan, imported: IfcImport): { ok: true; plan: Plan } | { ok: false; problem: IfcProblem } {
  for (const l of imported.report.levels) {
    if (!l.added && plan.elements[l.levelId]?.type !== "level") {
      return { ok: false, problem: { code: "ifc-level-unknown", message: `The plan has no level "${l.levelId}" to put the storey "${l.name}" on.` } };
    }
  }
  const elements = { ...plan.elements };
  const renamed = new Map<string, string>();
  const free = (id: string): string => {
    let out = id;
    for (let k = 2; elements[out]; k++) out = `${id}-${k}`;
    renamed.set(id, out);
    return out;
  };
  const levelId = (id: string) => renamed.get(id) ?? id;
  for (const l of imported.levels) {
    const id = free(l.id);
    elements[id] = { ...l, id };
  }
  for (const w of imported.walls) {
    const id = free(w.id);
    elements[id] = { ...w, id, levelId: levelId(w.levelId), start: { ...w.start }, end: { ...w.end } };
  }
  for (const r of imported.rooms) {
    const id = free(r.id);
    elements[id] = { ...r, id, levelId: levelId(r.levelId), outline: r.outline.map((v) => ({ ...v })) };
  }
  for (const o of imported.openings) {
    const id = free(o.id);
    elements[id] = { ...o, id, wallRef: renamed.get(o.wallRef) ?? o.wallRef };
  }
  return { ok: true, plan: { ...plan, elements } };
}

/** Imports an IFC file into a plan in one step; on any problem the plan comes back unchanged (same object). */
export function planFromIfcBytes(api: IfcAPI, plan: Plan, bytes: Uint8Array, options: IfcImportOptions = {}, onProgress?: (done: number, total: number) => void):
  | { ok: true; plan: Plan; imported: IfcImport }
  | { ok: false; plan: Plan; problem: IfcProblem } {
  const result = importIfc(api, bytes, options, onProgress);
  if (!result.ok) return { ok: false, plan, problem: result.problem };
  const merged = planWithIfcImport(plan, result.imported);
  if (!merged.ok) return { ok: false, plan, problem: merged.problem };
  return { ok: true, plan: merged.plan, imported: result.imported };
}
