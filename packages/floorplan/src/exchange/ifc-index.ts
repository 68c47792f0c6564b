/** Entry `@hushmark/floorplan/ifc`: IFC import, kept apart so the WebAssembly reader loads only where it is used. */
export { ifcReader, importIfc, planWithIfcImport, planFromIfcBytes } from "./ifc-import.js";
export { readIfc } from "./ifc-read.js";
export { convertIfc, ifcSurvey, IFC_IMPORT_DEFAULTS } from "./ifc-convert.js";
export { outlineOnWallAxes } from "./ifc-outline.js";
export { layerSetKey } from "./ifc-materials.js";
export type {
  IfcImport, IfcImportOptions, IfcImportReport, IfcLayerSet, IfcMaterialLayer, IfcModelRead, IfcOpeningRead,
  IfcProblem, IfcReadResult, IfcSpaceRead, IfcStoreyRead, IfcSurvey, IfcWallLayersLine, IfcWallRead,
} from "./ifc-types.js";
