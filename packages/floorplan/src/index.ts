/** Public API of @hushmark/floorplan: the plan document, planar geometry, validation, catalogue and the plan → network builder. */

// Document
export {
  PLAN_FORMAT, PLAN_SCHEMA_VERSION, planSchema, elementSchema, levelSchema, roomSchema, wallSchema,
  doorSchema, windowSchema, penetrationSchema, ventSchema, ductSchema, voidSchema, neighbourSchema,
  pinSchema, noteSchema, finishSchema, targetSchema, leaksSchema, facesSchema, wallSettingSchema,
  planDefaultsSchema, pointSchema, vertexSchema, roomUseSchema,
} from "./document/schema.js";
export type {
  Plan, PlanInput, PlanDefaults, Element, ElementType, ElementOf, Level, Room, FreeWall, Door, Window,
  Penetration, Opening, Vent, Duct, Void, Neighbour, Pin, Note, Finish, Target, Leaks, Faces,
  WallSetting, Point, Vertex, RoomUse,
} from "./document/schema.js";
export { underlaySchema } from "./document/underlays.js";
export type { Underlay } from "./document/underlays.js";
export { OUTDOORS_ID, elementIdSchema, edgeRef, edgeRefParts } from "./document/ids.js";
export { migratePlan, migrationsApplied, planMigrations, PlanMigrationError } from "./document/migrate.js";
export type { PlanMigration } from "./document/migrate.js";
export { parsePlan } from "./document/parse.js";
export type { PlanParseResult } from "./document/parse.js";
export { serializePlan, canonicalJson } from "./document/serialize.js";
export { elementsOfType, elementOfType, levelsByElevation } from "./document/elements.js";
export { formatLength, formatArea } from "./document/units.js";

// Geometry (planar, metres)
export {
  polygonAreaM2, polygonSignedAreaM2, polygonPerimeterM, polygonCentroid, polygonSelfIntersections,
  pointInPolygon, roomVolumeM3, distanceM, boundsM, segmentsIntersect,
} from "./geometry/polygon.js";
export { collinearOverlap, pointAlong, distanceToLineM, projectionAlongM } from "./geometry/segments.js";
export type { SegmentOverlap } from "./geometry/segments.js";
export { wallPieces, planWallPieces, sharedWalls, roomEdges } from "./geometry/walls.js";
export type { WallPiece, WallSide, RoomEdge } from "./geometry/walls.js";
export { wallJunctions, armsInline } from "./geometry/junctions.js";
export type { Junction, JunctionArm } from "./geometry/junctions.js";
export { polygonOverlapM2 } from "./geometry/overlap.js";
export { polygonIsConvex, convexClipAreaM2 } from "./geometry/clip.js";
export { stackedRooms, roomsCoveredByVoid, roomsAboveVoid, MIN_OVERLAP_M2 } from "./geometry/stacking.js";
export type { StackedPair } from "./geometry/stacking.js";
export { openingPlacement } from "./geometry/openings.js";
export type { OpeningPlacement } from "./geometry/openings.js";

// Validation
export { validatePlan, planIsAnalysable } from "./validation/validate.js";
export { PROBLEM_CODES } from "./validation/codes.js";
export type { ProblemCode } from "./validation/codes.js";
export type { Problem } from "./validation/problem.js";

// Catalogue and source library
export { constructionCatalogue } from "./catalogue/catalogue.js";
export { catalogueWith } from "./catalogue/types.js";
export type { Catalogue, Construction, ConstructionCategory, Covering, Silencer, SourceNote } from "./catalogue/types.js";
export { sourceLibrary, sourceSpectrum } from "./catalogue/sources.js";
export type { SourceSpectrum } from "./catalogue/sources.js";
export { finishPresets, finishPreset, ASSUMED_RT60_S } from "./catalogue/finishes.js";
export type { FinishPreset } from "./catalogue/finishes.js";
export { BANDS_HZ, thirdOctavesFromOctaves } from "./catalogue/bands.js";

// Builder and result mapping
export { buildNetwork } from "./builder/build-network.js";
export type { BuildOptions, BuildResult, LinkTrace, SpaceTrace } from "./builder/types.js";
export { leakAreasM2, CRACKED_SEAL_GAP_MM } from "./builder/wall-parts.js";
export { ductAttenuationParts, endReflectionDb, LINED_DUCT_DB_PER_M, BARE_DUCT_DB_PER_M, BEND_DB } from "./builder/ducts.js";
export { NEIGHBOUR_DEFAULTS } from "./builder/spaces.js";
export { mapResultToPlan } from "./result/map-result.js";
export { CollisionGrid, overlaps, type LabelBox } from "./result/label-grid.js";
export { placePathTags, pointAlongPolyline, type PathTagInput } from "./result/path-tags.js";
export { SHARE_COLOURS, SHARE_EDGES, SHARE_LEGEND, shareBin, shareColour, sharePercent } from "./result/share-scale.js";
export type { ElementResult, PathOnPlan, PathStep, PathPoint, PlanResult, SolveResultLike } from "./result/types.js";

// Demo plans and synthetic buildings
export { demoPlans } from "./demo/demo-plans.js";
export type { DemoPlan } from "./demo/demo-plans.js";
export { fernhollowStudioPlan } from "./demo/fernhollow-studio.js";
export { cinemaUnderNurseryPlan } from "./demo/cinema-under-nursery.js";
export { generateSyntheticBuilding } from "./synthetic/generate.js";
export type { SyntheticOptions } from "./synthetic/generate.js";
export { seededRandom } from "./synthetic/random.js";
export { constructionFromCsv, measurementFromCsv, bandTableFromCsv, REQUIRED_LAB_BANDS_HZ } from "./catalogue/csv.js";
export type { CsvProblem, CsvResult } from "./catalogue/csv.js";
export { constructionRatings, coveringDeltaLwDb } from "./catalogue/ratings.js";
export { ANALYSIS_REQUEST_PROBLEM, engineTargetOf, preparePlanNetwork, solvePlan } from "./analysis/analyse.js";
export type { AnalysisSource, PreparedPlanNetwork, SolvePlanRequest, SolvePlanResult } from "./analysis/analyse.js";
export { emptyPlan } from "./document/empty-plan.js";

// Exchange: DXF import
export { importDxf, dxfSurvey, planWithDxfImport, planFromDxfText } from "./exchange/dxf-import.js";
export type { DxfSurvey } from "./exchange/dxf-import.js";
export { dxfConverter, DXF_IMPORT_DEFAULTS } from "./exchange/dxf-convert.js";
export type { DxfConverter } from "./exchange/dxf-convert.js";
export { dxfSource, DxfChunkError } from "./exchange/dxf-read.js";
export type { DxfSource, DxfEntity } from "./exchange/dxf-read.js";
export type { DxfProblem } from "./exchange/dxf-scan.js";
export { dxfUnitsFromHeader, dxfUnitsResolved, DXF_UNIT_CHOICES } from "./exchange/dxf-units.js";
export type { DxfUnits, DxfUnitChoice } from "./exchange/dxf-units.js";
export type { DxfImport, DxfImportOptions, DxfImportReport, DxfImportResult, DxfLayerRole, DxfReportLine, DxfUnderlay } from "./exchange/dxf-import-types.js";
export type { TracedPath } from "./exchange/dxf-loops.js";
export { arcPoints, bulgePoints, arcSegmentCount } from "./exchange/arc-flatten.js";
export { exactPartGainsDb } from "./analysis/exact-gains.js";
// Exchange: DXF export
export { planToDxf, dxfExportLayerRoles, DXF_EXPORT_LAYERS } from "./exchange/dxf-export.js";
export type { DxfExportOptions } from "./exchange/dxf-export.js";
export { interiorPointM, bandCornersM } from "./exchange/plan-points.js";
// Exchange: GeoJSON export
export { planToGeoJson } from "./exchange/geojson-export.js";
export type { LevelFeatureCollection, PlanFeature } from "./exchange/geojson-export.js";
export { geoFrame, planToLonLat, lonLatToPlan, wgs84RadiiM } from "./exchange/geo-frame.js";
export type { GeoFrame, SiteLocation } from "./exchange/geo-frame.js";
// Exchange: element schedule and the published JSON Schema
export { elementSchedule } from "./exchange/element-schedule.js";
export type { ScheduleRow } from "./exchange/element-schedule.js";
export { elementScheduleCsv, SCHEDULE_COLUMNS } from "./exchange/schedule-csv.js";
export { csvField, csvText } from "./exchange/csv-text.js";
export { planJsonSchema, planJsonSchemaText, PLAN_JSON_SCHEMA_PATH } from "./exchange/plan-json-schema.js";
export type { DxfBlock } from "./exchange/dxf-import-types.js";
export { insertMaps } from "./exchange/dxf-blocks.js";
export type { Affine } from "./exchange/dxf-blocks.js";
