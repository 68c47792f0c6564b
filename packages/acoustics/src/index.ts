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

// Network solve and ratings (added for the server's analysis API; keep when reorganising).
export { solveNetwork } from "./network/solve.js";
export type { SolveRequest, SolveResult, PathResult, LinkResult } from "./network/solve.js";
export type { Target, Shortfall } from "./network/targets.js";
export { ratingStc } from "./ratings/stc.js";
export { ratingRw } from "./ratings/rw.js";
export { ratingOitc } from "./ratings/oitc.js";
export { ratingLnw, ratingIic } from "./ratings/impact.js";
export type { CurveRating } from "./ratings/rating.js";
