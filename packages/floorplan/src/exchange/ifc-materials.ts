import { IFC_CODES } from "./ifc-codes.js";
import type { IfcLayerSet, IfcMaterialLayer } from "./ifc-types.js";

type Line = Record<string, unknown> & { expressID: number; type: number };
type GetLine = (id: number) => Line;
const valueOf = (v: unknown): unknown => (v && typeof v === "object" && "value" in v ? (v as { value: unknown }).value : v);
const text = (v: unknown): string => (typeof valueOf(v) === "string" ? (valueOf(v) as string) : "");
const ref = (v: unknown): number | undefined => (typeof valueOf(v) === "number" ? (valueOf(v) as number) : undefined);

/** SI prefixes as IFC spells them (ISO 16739-1, IfcSIPrefix). */
const SI_PREFIX: Record<string, number> = {
  EXA: 1e18, PETA: 1e15, TERA: 1e12, GIGA: 1e9, MEGA: 1e6, KILO: 1e3, HECTO: 1e2, DECA: 1e1,
  DECI: 1e-1, CENTI: 1e-2, MILLI: 1e-3, MICRO: 1e-6, NANO: 1e-9, PICO: 1e-12, FEMTO: 1e-15, ATTO: 1e-18,
};

function siMetres(unit: Line): number {
  const prefix = text(unit.Prefix);
  return prefix ? SI_PREFIX[prefix] ?? 1 : 1;
}

/** How many metres one length unit of the file is, from its unit assignment (metres if none is given). */
export function lengthUnitOf(assignments: readonly Line[], line: GetLine): { name: string; metres: number } {
  for (const a of assignments) {
    const units = Array.isArray(a.Units) ? a.Units : [];
    for (const u of units) {
      const id = ref(u);
      if (id === undefined) continue;
      const unit = line(id);
      if (text(unit.UnitType) !== "LENGTHUNIT") continue;
      if (unit.type === IFC_CODES.IFCSIUNIT) return { name: `${text(unit.Prefix).toLowerCase()}metre`, metres: siMetres(unit) };
      if (unit.type === IFC_CODES.IFCCONVERSIONBASEDUNIT) {
        const factorId = ref(unit.ConversionFactor);
        const factor = factorId !== undefined ? line(factorId) : undefined;
        const value = Number(valueOf(factor?.ValueComponent));
        const baseId = ref(factor?.UnitComponent);
        const base = baseId !== undefined ? line(baseId) : undefined;
        const metres = value * (base && base.type === IFC_CODES.IFCSIUNIT ? siMetres(base) : 1);
        if (Number.isFinite(metres) && metres > 0) return { name: text(unit.Name).toLowerCase() || "converted unit", metres };
      }
    }
  }
  return { name: "metre", metres: 1 };
}

function layersOf(set: Line, line: GetLine, metres: number): IfcMaterialLayer[] {
  const list = Array.isArray(set.MaterialLayers) ? set.MaterialLayers : [];
  return list.flatMap((h) => {
    const id = ref(h);
    if (id === undefined) return [];
    const layer = line(id);
    const matId = ref(layer.Material);
    const material = matId !== undefined ? text(line(matId).Name) : "";
    const t = Number(valueOf(layer.LayerThickness));
    return [{ material: material || text(layer.Name) || "unnamed material", thicknessM: Number.isFinite(t) ? t * metres : 0 }];
  });
}

/** A stable key telling layer sets apart: the name with each layer's material and thickness in mm. */
export function layerSetKey(name: string, layers: readonly IfcMaterialLayer[]): string {
  const body = layers.map((l) => `${l.material} ${Math.round(l.thicknessM * 10000) / 10}`).join(" / ");
  return name ? `${name} (${body})` : body;
}

function setFrom(name: string, layers: IfcMaterialLayer[]): IfcLayerSet {
  return { key: layerSetKey(name, layers), name: name || layers.map((l) => l.material).join(" + "), layers, totalThicknessM: layers.reduce((s, l) => s + l.thicknessM, 0) };
}

/**
 * The material layers of a wall from what its material relation points to: a layer set usage,
 * a layer set, a list of materials or one material (no thicknesses for the last two), m.
 */
export function layerSetOf(material: Line, line: GetLine, metres: number): IfcLayerSet | null {
  if (material.type === IFC_CODES.IFCMATERIALLAYERSETUSAGE) {
    const setId = ref(material.ForLayerSet);
    return setId !== undefined ? layerSetOf(line(setId), line, metres) : null;
  }
  if (material.type === IFC_CODES.IFCMATERIALLAYERSET) {
    const layers = layersOf(material, line, metres);
    return layers.length > 0 ? setFrom(text(material.LayerSetName), layers) : null;
  }
  if (material.type === IFC_CODES.IFCMATERIALLIST) {
    const mats = (Array.isArray(material.Materials) ? material.Materials : []).map(ref).filter((n): n is number => n !== undefined);
    const layers = mats.map((id) => ({ material: text(line(id).Name) || "unnamed material", thicknessM: 0 }));
    return layers.length > 0 ? setFrom("", layers) : null;
  }
  if (material.type === IFC_CODES.IFCMATERIAL) return setFrom("", [{ material: text(material.Name) || "unnamed material", thicknessM: 0 }]);
  return null;
}
