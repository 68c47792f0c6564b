import type { IfcAPI } from "web-ifc";
import { IFC_CODES } from "./ifc-codes.js";
import type { Point } from "../document/schema.js";
import { polygonAreaM2 } from "../geometry/polygon.js";
import { ReportLines } from "./dxf-report.js";
import { bottomOutline, convexHull, wallAxisFromPoints, zRange, type WorldMesh } from "./ifc-geometry.js";
import { layerSetOf, lengthUnitOf } from "./ifc-materials.js";
import type { IfcModelRead, IfcOpeningRead, IfcProblem, IfcReadResult, IfcSpaceRead, IfcStoreyRead, IfcWallRead } from "./ifc-types.js";

/** Walls thicker than this, or whose outline fills less of their rectangle than `MIN_FILL`, are not taken as straight walls, m. */
const MAX_WALL_THICKNESS_M = 1.0;
const MIN_WALL_FILL = 0.9;
const MIN_SPACE_AREA_M2 = 0.01;

/* web-ifc answers loosely typed line objects; these helpers read the few fields used. */
type Line = Record<string, unknown> & { expressID: number; type: number };
const valueOf = (v: unknown): unknown => (v && typeof v === "object" && "value" in v ? (v as { value: unknown }).value : v);
const text = (v: unknown): string => (typeof valueOf(v) === "string" ? (valueOf(v) as string) : "");
const num = (v: unknown): number | undefined => {
  const n = valueOf(v);
  return typeof n === "number" && Number.isFinite(n) ? n : undefined;
};
const ref = (v: unknown): number | undefined => {
  const n = valueOf(v);
  return typeof n === "number" ? n : undefined;
};
const refs = (v: unknown): number[] => (Array.isArray(v) ? v.map(ref).filter((n): n is number => n !== undefined) : []);

function ids(api: IfcAPI, modelID: number, type: number, inherited = false): number[] {
  const v = api.GetLineIDsWithType(modelID, type, inherited);
  const out: number[] = [];
  for (let i = 0; i < v.size(); i++) out.push(v.get(i));
  return out;
}

/** A product's shape in world metres, z up (web-ifc hands geometry y-up and scaled to metres). */
function worldMesh(api: IfcAPI, modelID: number, expressID: number): WorldMesh | null {
  const flat = api.GetFlatMesh(modelID, expressID);
  const points: WorldMesh["points"] = [];
  const triangles: number[] = [];
  for (let g = 0; g < flat.geometries.size(); g++) {
    const placed = flat.geometries.get(g);
    const geo = api.GetGeometry(modelID, placed.geometryExpressID);
    const v = api.GetVertexArray(geo.GetVertexData(), geo.GetVertexDataSize());
    const idx = api.GetIndexArray(geo.GetIndexData(), geo.GetIndexDataSize());
    const m = placed.flatTransformation;
    const base = points.length;
    for (let k = 0; k + 5 < v.length; k += 6) {
      const x = v[k]!, y = v[k + 1]!, z = v[k + 2]!;
      const wx = m[0]! * x + m[4]! * y + m[8]! * z + m[12]!;
      const wy = m[1]! * x + m[5]! * y + m[9]! * z + m[13]!;
      const wz = m[2]! * x + m[6]! * y + m[10]! * z + m[14]!;
      points.push({ x: wx, y: -wz, z: wy });
    }
    for (const i of idx) triangles.push(base + i);
    // Embind objects are freed by hand; some builds hand back plain objects without delete.
    (geo as { delete?: () => void }).delete?.();
  }
  (flat as { delete?: () => void }).delete?.();
  return points.length > 0 ? { points, triangles } : null;
}

/** Origin and local x axis of a placement in world metres (web-ifc gives it in file units, z up). */
function placementFrame(api: IfcAPI, modelID: number, placementId: number | undefined, metres: number): { origin: { x: number; y: number; z: number }; xAxis: Point } | null {
  if (placementId === undefined) return null;
  try {
    const m = api.GetWorldTransformMatrix(modelID, placementId);
    const len = Math.hypot(m[0]!, m[1]!) || 1;
    return { origin: { x: m[12]! * metres, y: m[13]! * metres, z: m[14]! * metres }, xAxis: { x: m[0]! / len, y: m[1]! / len } };
  } catch {
    return null;
  }
}

/** First characters of an IFC-SPF (ISO 10303-21) file, after a byte-order mark and blanks. */
function stepProblem(bytes: Uint8Array): IfcProblem | null {
  if (bytes.length === 0) return { code: "ifc-empty", message: "The file is empty." };
  const head = new TextDecoder().decode(bytes.subarray(0, 256)).replace(/^\uFEFF/, "").trimStart();
  if (head.startsWith("PK")) return { code: "ifc-not-step", message: "This is a zipped IFC (.ifczip). Unzip it and choose the .ifc file inside." };
  if (head.startsWith("<")) return { code: "ifc-not-step", message: "This is IFC in XML (.ifcxml). Save or export the model as an .ifc (STEP) file." };
  if (!head.startsWith("ISO-10303-21")) return { code: "ifc-not-step", message: "This is not an IFC file: it should begin with ISO-10303-21." };
  // web-ifc reads a cut-off file up to the cut without a word, so the closing line is checked here.
  const tail = new TextDecoder().decode(bytes.subarray(Math.max(0, bytes.length - 256))).trimEnd();
  if (!tail.endsWith("END-ISO-10303-21;")) {
    return { code: "ifc-malformed", message: "The IFC file ends before its closing line END-ISO-10303-21; it looks cut off. Save or download it again." };
  }
  return null;
}

/**
 * Reads storeys, spaces, walls, doors and windows from IFC-SPF bytes with an initialised
 * `IfcAPI` (m, the file's world frame with z up), calling `onProgress(done, total)` per element.
 * A damaged file answers a problem and reads nothing.
 */
export function readIfc(api: IfcAPI, bytes: Uint8Array, onProgress?: (done: number, total: number) => void): IfcReadResult {
  const bad = stepProblem(bytes);
  if (bad) return { ok: false, problem: bad };
  let modelID = -1;
  try {
    modelID = api.OpenModel(bytes, { COORDINATE_TO_ORIGIN: false });
  } catch (e) {
    return { ok: false, problem: { code: "ifc-malformed", message: `The IFC file could not be read (${e instanceof Error ? e.message : String(e)}). Check that it was saved completely.` } };
  }
  if (modelID < 0) return { ok: false, problem: { code: "ifc-malformed", message: "The IFC file could not be read. Check that it was saved completely." } };
  try {
    return readModel(api, modelID, onProgress);
  } catch (e) {
    return { ok: false, problem: { code: "ifc-malformed", message: `The IFC file has an entity that could not be read (${e instanceof Error ? e.message : String(e)}).` } };
  } finally {
    api.CloseModel(modelID);
  }
}

function readModel(api: IfcAPI, modelID: number, onProgress?: (done: number, total: number) => void): IfcReadResult {
  const line = (id: number): Line => api.GetLine(modelID, id) as Line;
  const skipped = new ReportLines();
  const byType: IfcModelRead["byType"] = {};
  const count = (type: string, what: "read" | "used" | "skipped") => {
    const c = (byType[type] ??= { read: 0, used: 0, skipped: 0 });
    c[what]++;
  };
  const unitAssignments = ids(api, modelID, IFC_CODES.IFCUNITASSIGNMENT);
  const lengthUnit = lengthUnitOf(unitAssignments.map(line), line);
  const metres = lengthUnit.metres;

  const storeyIds = ids(api, modelID, IFC_CODES.IFCBUILDINGSTOREY);
  if (storeyIds.length === 0) {
    return { ok: false, problem: { code: "ifc-no-storeys", message: "The IFC file has no building storeys, so there is nothing to put on plan levels." } };
  }
  // Which storey an element belongs to: containment and aggregation, followed upwards.
  const parent = new Map<number, number>();
  for (const r of ids(api, modelID, IFC_CODES.IFCRELAGGREGATES).map(line)) for (const c of refs(r.RelatedObjects)) parent.set(c, ref(r.RelatingObject)!);
  for (const r of ids(api, modelID, IFC_CODES.IFCRELCONTAINEDINSPATIALSTRUCTURE).map(line)) for (const c of refs(r.RelatedElements)) parent.set(c, ref(r.RelatingStructure)!);
  const storeySet = new Set(storeyIds);
  const storeyOf = (id: number): number | undefined => {
    for (let cur: number | undefined = parent.get(id), n = 0; cur !== undefined && n < 16; cur = parent.get(cur), n++) if (storeySet.has(cur)) return cur;
    return undefined;
  };
  const materialOf = new Map<number, number>();
  for (const r of ids(api, modelID, IFC_CODES.IFCRELASSOCIATESMATERIAL).map(line)) for (const o of refs(r.RelatedObjects)) materialOf.set(o, ref(r.RelatingMaterial)!);
  const typeOf = new Map<number, number>();
  for (const r of ids(api, modelID, IFC_CODES.IFCRELDEFINESBYTYPE).map(line)) for (const o of refs(r.RelatedObjects)) typeOf.set(o, ref(r.RelatingType)!);
  const wallOfOpening = new Map<number, number>();
  for (const r of ids(api, modelID, IFC_CODES.IFCRELVOIDSELEMENT).map(line)) wallOfOpening.set(ref(r.RelatedOpeningElement)!, ref(r.RelatingBuildingElement)!);
  const openingOfFilling = new Map<number, number>();
  for (const r of ids(api, modelID, IFC_CODES.IFCRELFILLSELEMENT).map(line)) openingOfFilling.set(ref(r.RelatedBuildingElement)!, ref(r.RelatingOpeningElement)!);

  const globalId = (l: Line) => text(l.GlobalId) || `#${l.expressID}`;
  const storeyGid = new Map<number, string>();
  const storeysRaw = storeyIds.map((id) => {
    const l = line(id);
    const frame = placementFrame(api, modelID, ref(l.ObjectPlacement), metres);
    const elevation = num(l.Elevation);
    storeyGid.set(id, globalId(l));
    return { id, globalId: globalId(l), name: text(l.LongName) || text(l.Name) || `Storey ${id}`, elevationM: elevation !== undefined ? elevation * metres : frame?.origin.z ?? 0 };
  }).sort((a, b) => a.elevationM - b.elevationM);
  const storeyByZ = (z: number): string => {
    let best = storeysRaw[0]!;
    for (const s of storeysRaw) if (s.elevationM <= z + 0.05) best = s;
    return best.globalId;
  };

  const wallIds = [...new Set([...ids(api, modelID, IFC_CODES.IFCWALL, true), ...ids(api, modelID, IFC_CODES.IFCWALLSTANDARDCASE)])];
  const spaceIds = ids(api, modelID, IFC_CODES.IFCSPACE);
  const doorIds = ids(api, modelID, IFC_CODES.IFCDOOR, true);
  const windowIds = ids(api, modelID, IFC_CODES.IFCWINDOW, true);
  const total = wallIds.length + spaceIds.length + doorIds.length + windowIds.length;
  let done = 0;
  const tick = () => {
    done++;
    if (done % 50 === 0 || done === total) onProgress?.(done, total);
  };

  const spaces: IfcSpaceRead[] = [];
  for (const id of spaceIds) {
    const l = line(id);
    const gid = globalId(l);
    count("IfcSpace", "read");
    const mesh = worldMesh(api, modelID, id);
    const outline = mesh ? bottomOutline(mesh) : null;
    const why = !mesh ? "a space has no shape to take its floor outline from"
      : !outline ? "a space has no flat floor face"
      : polygonAreaM2(outline) < MIN_SPACE_AREA_M2 ? `a space's floor is under ${MIN_SPACE_AREA_M2} m²` : null;
    if (why || !mesh || !outline) {
      skipped.add(why!, "IfcSpace", [gid]);
      count("IfcSpace", "skipped");
    } else {
      const { minZ, maxZ } = zRange(mesh);
      spaces.push({ globalId: gid, name: text(l.Name), longName: text(l.LongName), storeyId: storeyGid.get(storeyOf(id) ?? -1) ?? storeyByZ(minZ), footprint: outline, heightM: maxZ - minZ, bottomZM: minZ });
      count("IfcSpace", "used");
    }
    tick();
  }

  const walls: IfcWallRead[] = [];
  const wallGid = new Map<number, string>();
  for (const id of wallIds) {
    const l = line(id);
    const gid = globalId(l);
    const typeName = api.GetNameFromTypeCode(l.type);
    count(typeName, "read");
    const mesh = worldMesh(api, modelID, id);
    const pts = mesh ? mesh.points.map((p) => ({ x: p.x, y: p.y })) : [];
    const axis = mesh ? wallAxisFromPoints(pts) : null;
    const fill = axis && axis.lengthM * axis.thicknessM > 0 ? polygonAreaM2(convexHull(pts)) / (axis.lengthM * axis.thicknessM) : 0;
    const why = !mesh ? "a wall has no shape"
      : !axis || axis.lengthM < 0.05 ? "a wall is shorter than 5 cm"
      : axis.thicknessM > MAX_WALL_THICKNESS_M || fill < MIN_WALL_FILL ? "a wall is not straight (curved, angled or L-shaped); draw it in the Sketch" : null;
    if (why || !mesh || !axis) {
      skipped.add(why!, typeName, [gid]);
      count(typeName, "skipped");
    } else {
      const { minZ, maxZ } = zRange(mesh);
      const material = materialOf.get(id) ?? (typeOf.has(id) ? materialOf.get(typeOf.get(id)!) : undefined);
      walls.push({
        globalId: gid, ifcType: typeName, name: text(l.Name), storeyId: storeyGid.get(storeyOf(id) ?? -1) ?? storeyByZ(minZ),
        start: axis.start, end: axis.end, thicknessM: axis.thicknessM, heightM: maxZ - minZ, bottomZM: minZ,
        layerSet: material !== undefined ? layerSetOf(line(material), line, metres) : null,
      });
      wallGid.set(id, gid);
      count(typeName, "used");
    }
    tick();
  }

  const openings: IfcOpeningRead[] = [];
  for (const [kind, list] of [["door", doorIds], ["window", windowIds]] as const) {
    for (const id of list) {
      const l = line(id);
      const gid = globalId(l);
      const typeName = api.GetNameFromTypeCode(l.type);
      count(typeName, "read");
      const voidId = openingOfFilling.get(id);
      const mesh = worldMesh(api, modelID, id) ?? (voidId !== undefined && line(voidId).type === IFC_CODES.IFCOPENINGELEMENT ? worldMesh(api, modelID, voidId) : null);
      const rect = mesh ? wallAxisFromPoints(mesh.points.map((p) => ({ x: p.x, y: p.y }))) : null;
      const w = num(l.OverallWidth), h = num(l.OverallHeight);
      const widthM = w !== undefined ? w * metres : rect?.lengthM;
      const z = mesh ? zRange(mesh) : null;
      const heightM = h !== undefined ? h * metres : z ? z.maxZ - z.minZ : undefined;
      const frame = placementFrame(api, modelID, ref(l.ObjectPlacement), metres);
      const centre = rect ? { x: (rect.start.x + rect.end.x) / 2, y: (rect.start.y + rect.end.y) / 2 }
        : frame && widthM !== undefined ? { x: frame.origin.x + (frame.xAxis.x * widthM) / 2, y: frame.origin.y + (frame.xAxis.y * widthM) / 2 } : null;
      const bottomZM = z?.minZ ?? frame?.origin.z;
      if (widthM === undefined || heightM === undefined || !centre || bottomZM === undefined || widthM <= 0 || heightM <= 0) {
        skipped.add(`a ${kind} has neither its overall size nor a shape to measure`, typeName, [gid]);
        count(typeName, "skipped");
      } else {
        const hostId = voidId !== undefined ? wallOfOpening.get(voidId) : undefined;
        const storey = storeyOf(id);
        openings.push({
          kind, globalId: gid, ifcType: typeName, name: text(l.Name), storeyId: storey !== undefined ? storeyGid.get(storey) ?? null : null,
          centre, widthM, heightM, bottomZM, hostWallId: hostId !== undefined ? wallGid.get(hostId) ?? null : null,
        });
        count(typeName, "used");
      }
      tick();
    }
  }

  // A storey's height: its tallest space, else the rise to the next storey, else its tallest wall.
  const storeys: IfcStoreyRead[] = storeysRaw.map((s, i) => {
    const spaceH = Math.max(0, ...spaces.filter((x) => x.storeyId === s.globalId).map((x) => x.heightM));
    const next = storeysRaw[i + 1];
    const wallH = Math.max(0, ...walls.filter((x) => x.storeyId === s.globalId).map((x) => x.heightM));
    const [heightM, heightFrom]: [number | undefined, IfcStoreyRead["heightFrom"]] = spaceH > 0 ? [spaceH, "spaces"]
      : next && next.elevationM > s.elevationM ? [next.elevationM - s.elevationM, "next storey"]
      : wallH > 0 ? [wallH, "walls"] : [undefined, "none"];
    return { globalId: s.globalId, name: s.name, elevationM: s.elevationM, heightM, heightFrom };
  });
  onProgress?.(total, total);
  return {
    ok: true,
    model: { schema: api.GetModelSchema(modelID), lengthUnit, entitiesRead: api.GetAllLines(modelID).size(), storeys, spaces, walls, openings, skipped: skipped.lines(), byType },
  };
}
