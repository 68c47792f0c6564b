/**
 * The network JSON (`hushmark-network`, version 1): the contract between `@hushmark/floorplan`
 * (which builds networks from plans) and this engine (which solves them). This schema is the
 * authority; docs/network-format.md explains it. Changes are additive only: a new field is
 * optional or has a default; nothing is renamed or removed without a version bump.
 *
 * Units: levels in dB re 20 µPa, transmission losses and attenuations in dB, areas in m²,
 * volumes in m³, lengths in m, times in s. Per-band arrays have one number per band of the
 * network, ascending in frequency (checked in `checkNetwork`).
 */
import { z } from "zod";
import { checkNetwork } from "./schema-checks.js";

export const NETWORK_FORMAT = "hushmark-network";
export const NETWORK_FORMAT_VERSION = 1;

const idSchema = z.string().min(1, "an id must be a non-empty string");

/** One number per band (length checked against the network's bands). */
export const bandValuesSchema = z.array(z.number());
/** One number for every band, or one per band. */
export const bandValuesOrScalarSchema = z.union([z.number(), z.array(z.number())]);
const positiveOrBandsSchema = z.union([z.number().positive(), z.array(z.number().positive())]);

export const bandSetIdSchema = z.enum(["third-octave", "octave"]);

export const spaceKindSchema = z.enum([
  "room",
  "void",
  "attic",
  "crawlspace",
  "duct",
  "neighbour",
  "outdoors",
]);

export const spaceSchema = z.object({
  id: idSchema,
  kind: spaceKindSchema,
  name: z.string().optional(),
  /** Plan element this space came from (traceability). */
  ref: z.string().optional(),
  volume_m3: z.number().positive().optional(),
  /** Equivalent absorption area A in m², one number or one per band. */
  absorption_m2: positiveOrBandsSchema.optional(),
  /** Reverberation time T in s, one number or one per band; A = 0.16·V/T (Sabine). */
  rt60_s: positiveOrBandsSchema.optional(),
  /** A bedroom or other sleeping room: escape-opening cautions apply to its windows. */
  sleeping_room: z.boolean().optional(),
  /** Holds a fuel-burning appliance: combustion-air cautions apply to sealing its vents. */
  fuel_appliance: z.boolean().optional(),
});

export const partKindSchema = z.enum(["wall", "door", "window", "gap", "ceiling", "floor", "other"]);

const partCommon = {
  id: idSchema.optional(),
  ref: z.string().optional(),
  name: z.string().optional(),
  /** What the part is, for cautions and display. */
  kind: partKindSchema.optional(),
  /** Part of a fire-resistance-rated assembly. */
  fire_rated: z.boolean().optional(),
  area_m2: z.number().nonnegative(),
};

/** A part with its per-band transmission loss. */
export const tlPartSchema = z.object({
  ...partCommon,
  tl_db: bandValuesSchema,
  /** Catalogue construction id, informational. */
  construction: z.string().optional(),
  /** True when tl_db is a model estimate rather than measured or catalogue data. */
  estimate: z.boolean().optional(),
});

/** An open gap: τ = 1 over its area. */
export const openPartSchema = z.object({ ...partCommon, open: z.literal(true) });

/** A small element rated by Dn,e: τ·S = A0·10^(−Dn,e/10), A0 = 10 m² (area_m2 is its footprint). */
export const dnePartSchema = z.object({ ...partCommon, dne_db: bandValuesSchema });

export const partSchema = z.union([openPartSchema, dnePartSchema, tlPartSchema]);

const linkCommon = {
  id: idSchema,
  between: z.tuple([idSchema, idSchema]),
  name: z.string().optional(),
  ref: z.string().optional(),
  fire_rated: z.boolean().optional(),
};

export const partitionLinkSchema = z.object({
  ...linkCommon,
  type: z.literal("partition").default("partition"),
  parts: z.array(partSchema).min(1, "a partition needs at least one part"),
  /** Plan length of the partition in m (floor area lost by a lining = added thickness × length). */
  length_m: z.number().positive().optional(),
});

export const attenuationPartSchema = z.object({
  name: z.string(),
  attenuation_db: bandValuesSchema,
});

export const ventLinkSchema = z.object({
  ...linkCommon,
  type: z.literal("vent"),
  /** Grille or duct cross-section S_d in m². */
  open_area_m2: z.number().positive(),
  /** Total path attenuation ΔL per band in dB (lining, bends, silencers, end reflection). */
  attenuation_db: bandValuesSchema,
  attenuation_parts: z.array(attenuationPartSchema).optional(),
});

export const impactDataSchema = z.object({
  /** Normalized impact sound pressure level Ln of the floor as built, per band. */
  ln_db: bandValuesSchema,
  /** Improvement ΔL of a covering, per band. */
  delta_l_db: bandValuesSchema.optional(),
});

/** A floor/ceiling: between[0] is the space above, between[1] the space below. */
export const floorLinkSchema = z.object({
  ...linkCommon,
  type: z.literal("floor"),
  area_m2: z.number().positive(),
  tl_db: bandValuesSchema,
  impact: impactDataSchema.optional(),
  /** True when tl_db is a model estimate. */
  estimate: z.boolean().optional(),
});

export const flankingElementSchema = z.object({
  ref: z.string().optional(),
  tl_db: bandValuesSchema,
  area_m2: z.number().positive(),
  mass_kg_m2: z.number().positive(),
});

/** One flanking path across a junction, simplified ISO 12354-1 model. */
export const flankingLinkSchema = z.object({
  ...linkCommon,
  type: z.literal("flanking"),
  /** Ff (flanking to flanking, straight across the junction) or Df/Fd (around the corner). */
  path: z.enum(["Ff", "Df", "Fd"]).default("Ff"),
  junction: z.enum(["cross", "t"]),
  element_i: flankingElementSchema,
  element_j: flankingElementSchema,
  mass_perpendicular_kg_m2: z.number().positive(),
  coupling_length_m: z.number().positive(),
  separating_area_m2: z.number().positive(),
  /** Vibration reduction index K_ij in dB, overriding the formula. */
  kij_db: bandValuesOrScalarSchema.optional(),
  /** Lining improvements ΔR_i + ΔR_j in dB. */
  delta_r_db: bandValuesOrScalarSchema.optional(),
});

export const linkSchema = z.discriminatedUnion("type", [
  partitionLinkSchema,
  ventLinkSchema,
  floorLinkSchema,
  flankingLinkSchema,
]);

/** A space whose band levels are fixed (measured or assumed source-room spectrum). */
export const airborneSourceSchema = z.object({
  type: z.literal("airborne").default("airborne"),
  id: idSchema.optional(),
  name: z.string().optional(),
  space: idSchema,
  levels_db: bandValuesSchema,
});

/** An impact source (tapping-machine-like) on a floor link. */
export const impactSourceSchema = z.object({
  type: z.literal("impact"),
  id: idSchema.optional(),
  name: z.string().optional(),
  floor: idSchema,
  /** Defaults to the floor's impact.ln_db. */
  ln_db: bandValuesSchema.optional(),
});

export const sourceSchema = z.discriminatedUnion("type", [airborneSourceSchema, impactSourceSchema]);

export const buildingSchema = z.object({
  /** Year of construction (pre-1978: lead-paint cautions; older finishes: asbestos cautions). */
  year_built: z.number().int().optional(),
});

export const networkShapeSchema = z.object({
  format: z.literal(NETWORK_FORMAT).optional(),
  version: z.literal(NETWORK_FORMAT_VERSION).default(NETWORK_FORMAT_VERSION),
  bands: bandSetIdSchema.default("third-octave"),
  name: z.string().optional(),
  building: buildingSchema.optional(),
  spaces: z.array(spaceSchema).min(1, "a network needs at least one space"),
  links: z.array(linkSchema).default([]),
  sources: z.array(sourceSchema).default([]),
});

/** The full network schema: shape plus cross-field checks (ids, references, band counts). */
export const networkSchema = networkShapeSchema.superRefine(checkNetwork);

export type NetworkInput = z.input<typeof networkSchema>;
export type Network = z.output<typeof networkSchema>;
export type Space = z.output<typeof spaceSchema>;
export type SpaceKind = z.output<typeof spaceKindSchema>;
export type Part = z.output<typeof partSchema>;
export type TlPart = z.output<typeof tlPartSchema>;
export type OpenPart = z.output<typeof openPartSchema>;
export type DnePart = z.output<typeof dnePartSchema>;
export type Link = z.output<typeof linkSchema>;
export type LinkType = Link["type"];
export type PartitionLink = z.output<typeof partitionLinkSchema>;
export type VentLink = z.output<typeof ventLinkSchema>;
export type FloorLink = z.output<typeof floorLinkSchema>;
export type FlankingLink = z.output<typeof flankingLinkSchema>;
export type FlankingElement = z.output<typeof flankingElementSchema>;
export type Source = z.output<typeof sourceSchema>;
export type AirborneSource = z.output<typeof airborneSourceSchema>;
export type ImpactSource = z.output<typeof impactSourceSchema>;
