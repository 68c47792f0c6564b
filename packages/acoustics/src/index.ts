/** Public API of @hushmark/acoustics. */
export {
  THIRD_OCTAVE,
  OCTAVE,
  OCTAVE_RATIO_G,
  bandSet,
  bandCount,
  bandIndexOf,
  bandMidFrequencyHz,
  bandEdgesHz,
} from "./bands/bands.js";
export type { BandSet, BandSetId } from "./bands/bands.js";

export {
  NETWORK_FORMAT,
  NETWORK_FORMAT_VERSION,
  networkSchema,
  networkShapeSchema,
  spaceSchema,
  spaceKindSchema,
  partSchema,
  partKindSchema,
  tlPartSchema,
  openPartSchema,
  dnePartSchema,
  linkSchema,
  partitionLinkSchema,
  ventLinkSchema,
  floorLinkSchema,
  flankingLinkSchema,
  flankingElementSchema,
  impactDataSchema,
  attenuationPartSchema,
  sourceSchema,
  airborneSourceSchema,
  impactSourceSchema,
  buildingSchema,
  bandSetIdSchema,
  bandValuesSchema,
  bandValuesOrScalarSchema,
} from "./network/schema.js";
export type {
  Network,
  NetworkInput,
  Space,
  SpaceKind,
  Part,
  TlPart,
  OpenPart,
  DnePart,
  Link,
  LinkType,
  PartitionLink,
  VentLink,
  FloorLink,
  FlankingLink,
  FlankingElement,
  Source,
  AirborneSource,
  ImpactSource,
} from "./network/schema.js";
export { parseNetwork, jsonPath, inputIssues } from "./network/parse.js";
export type { InputIssue, ParseResult } from "./network/parse.js";

// Everything below is public API; the server's analysis API uses solveNetwork, the ratings and
// linkTransmittingArea — keep those when reorganising.
export { dbToEnergy, energyToDb, energySumDb, energyDifferenceDb, tauOfTl, tlOfTau, roundTo } from "./bands/levels.js";
export {
  spectrum,
  flatSpectrum,
  assertSameBands,
  zipSpectra,
  mapSpectrum,
  sumSpectra,
  totalLevelDb,
  thirdOctaveToOctave,
  valuesAtHz,
  BandMismatchError,
} from "./bands/spectrum.js";
export type { Spectrum } from "./bands/spectrum.js";
export {
  aWeightingDb,
  cWeightingDb,
  aWeightsDb,
  cWeightsDb,
  aWeightsLinear,
  aWeightedLevelDb,
  cWeightedLevelDb,
} from "./bands/weighting.js";

export { MissingBandsError, bandTableOf, missingBands, thirdOctaveRange } from "./ratings/band-data.js";
export type { BandTable, RatingInput } from "./ratings/band-data.js";
export type { CurveRating } from "./ratings/rating.js";
export { fitContour } from "./ratings/contour.js";
export type { ContourFit, ContourSpec } from "./ratings/contour.js";
export { ratingStc, ratingAstc, ratingNnic, STC_CONTOUR_DB, STC_BANDS_HZ, STC_SCOPE_NOTE } from "./ratings/stc.js";
export type { StcOptions } from "./ratings/stc.js";
export { ratingRw, aWeightedDifferenceDb, RW_REFERENCE_THIRD_DB, RW_REFERENCE_OCTAVE_DB } from "./ratings/rw.js";
export type { RwRating, RwOptions } from "./ratings/rw.js";
export { ratingOitc, OITC_BANDS_HZ, OITC_REFERENCE_DBA } from "./ratings/oitc.js";
export type { OitcRating } from "./ratings/oitc.js";
export { ratingLnw, ratingIic, ratingDeltaLw, impactAdaptationCi, LNW_REFERENCE_DB, IIC_CONTOUR_DB } from "./ratings/impact.js";
export type { LnwRating, IicOptions } from "./ratings/impact.js";
export { ratingNc, ncOfBand, ncCurveDb, NC_CURVES_DB } from "./ratings/nc.js";
export type { NcRating } from "./ratings/nc.js";
export {
  levelDifference,
  normalizedLevelDifference,
  standardizedLevelDifference,
  apparentSoundReductionIndex,
  standardizedFromApparent,
  facadeApparentReduction,
  sabineAbsorptionM2,
} from "./ratings/field.js";

export { AIR_DENSITY_KG_M3, SPEED_OF_SOUND_M_S, AIR_IMPEDANCE_RAYL } from "./constructions/air.js";
export {
  massLawNormalDb,
  massLawFieldDb,
  criticalFrequencyHz,
  criticalFrequencyFromProductHz,
  bendingStiffnessNm,
  singleLeafTlDb,
  H_FC_PRODUCTS_M_HZ,
} from "./constructions/single-leaf.js";
export type { SingleLeafInput } from "./constructions/single-leaf.js";
export { massAirMassResonanceHz, doubleLeafTlDb } from "./constructions/double-leaf.js";
export type { DoubleLeafInput } from "./constructions/double-leaf.js";
export { compositeTransmissionLossDb, partTransmittingAreaM2, DNE_REFERENCE_AREA_M2 } from "./constructions/composite.js";
export type { CompositePart } from "./constructions/composite.js";
export {
  vibrationReductionIndexDb,
  vibrationReductionIndexMinDb,
  flankingReductionIndexDb,
  apparentReductionIndexDb,
  massRatioM,
} from "./constructions/flanking.js";
export type { JunctionType, JunctionPath, FlankingPathInput } from "./constructions/flanking.js";
export { CONSTRUCTION_CATALOGUE, catalogueTl, stcShapedThirdOctaveTl, octaveFromThirdTl } from "./constructions/catalogue.js";
export type { CatalogueEntry, CatalogueTl } from "./constructions/catalogue.js";

export { compileNetwork, spaceAbsorptionAt } from "./network/compile.js";
export type { CompiledNetwork, CompileOptions } from "./network/compile.js";
export { linkTransmittingArea, linkAreaM2, flankingKijDb, flankingRijDb, impactSourceTerm } from "./network/transmission.js";
export { NetworkRequestError, NetworkSolveError, selectSources, buildExcitation } from "./network/excitation.js";
export { solveEnergies, overTransmittingSpaces } from "./network/gauss-seidel.js";
export type { SolveOptions, SolveStats } from "./network/gauss-seidel.js";
export { PerturbationEvaluator } from "./network/perturb.js";
export type { Perturbation, LinkWeightChange, InjectionChange, BaseSolution } from "./network/perturb.js";
export { strongestPaths } from "./network/paths.js";
export type { RankedPath } from "./network/paths.js";
export { linkShares } from "./network/shares.js";
export type { LinkShare } from "./network/shares.js";
export { solveNetwork, solveCompiled, solveBase, networkWarnings } from "./network/solve.js";
export type { SolveRequest, SolveResult, PathResult, LinkResult, SolvedNetwork } from "./network/solve.js";
export { targetSchema, shortfall, ncExcessDb } from "./network/targets.js";
export type { Target, Shortfall } from "./network/targets.js";

export {
  upgradeOptionSchema,
  upgradeOptionsFileSchema,
  upgradeActionSchema,
  upgradeFlagSchema,
  upgradeLimitsSchema,
  upgradeCostSchema,
  partRefSchema,
} from "./upgrades/schema.js";
export type { UpgradeOption, UpgradeOptionInput, UpgradeAction, UpgradeFlag, UpgradeLimits, UpgradeOptionsFile } from "./upgrades/schema.js";
export { parseUpgradeOptions } from "./upgrades/parse.js";
export type { UpgradeOptionsSet } from "./upgrades/parse.js";
export { applyAction, checkOption } from "./upgrades/apply.js";
export { upgradeCautions, CAUTION_TEXT } from "./upgrades/cautions.js";
export type { Caution } from "./upgrades/cautions.js";
export { optionCosts } from "./upgrades/costs.js";
export type { OptionCosts } from "./upgrades/costs.js";
export { UpgradePlanner } from "./upgrades/planner.js";
export type { UpgradeRequest, PreparedOption, CombinationResult } from "./upgrades/planner.js";
export type { SearchLimits } from "./upgrades/eligibility.js";
export { bestWithinLimits } from "./upgrades/search.js";
export type { BestResult, SearchOptions } from "./upgrades/search.js";
export { costLevelFrontier } from "./upgrades/pareto.js";
export type { Frontier, FrontierPoint } from "./upgrades/pareto.js";
export { evaluateUpgrades, evaluateCombination, optionsAlone } from "./upgrades/evaluate.js";
export type { UpgradeReport, UpgradeReportRequest, OptionAlone } from "./upgrades/evaluate.js";
export * from "./signal/index.js";
