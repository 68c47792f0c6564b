/**
 * Upgrade options (the OPTIONS.json of the command line): what each option changes on one link,
 * what it costs (fixed + per m² + per item), labour, floor area lost, flags and cautions.
 * Money is in the firm's currency unit, areas in m², lengths and thicknesses in m, labour in h.
 */
import { z } from "zod";
import { bandValuesOrScalarSchema, bandValuesSchema } from "../network/schema.js";
import { targetSchema } from "../network/targets.js";

/** A part of a partition, by its id or its index in `parts`. */
export const partRefSchema = z.union([z.string().min(1), z.number().int().nonnegative()]);

export const upgradeActionSchema = z.discriminatedUnion("kind", [
  /** Replace a part's construction (e.g. hollow door → solid-core door): its new TL per band. */
  z.object({
    kind: z.literal("replace-part"),
    part: partRefSchema,
    tl_db: bandValuesSchema,
    construction: z.string().optional(),
    estimate: z.boolean().optional(),
  }),
  /** Add a layer (board, mass-loaded barrier, lining): TL improvement in dB; all TL parts when `part` is omitted. */
  z.object({ kind: z.literal("add-layer"), part: partRefSchema.optional(), delta_tl_db: bandValuesOrScalarSchema }),
  /** Seal a leak: the open part keeps `remaining_open_area_m2` (default 0). */
  z.object({ kind: z.literal("seal-leak"), part: partRefSchema, remaining_open_area_m2: z.number().nonnegative().default(0) }),
  /** Add duct attenuation (lining, baffles, silencer) to a vent link, dB. */
  z.object({ kind: z.literal("add-duct-attenuation"), attenuation_db: bandValuesOrScalarSchema }),
  /** Add an impact improvement ΔL to a floor (covering, floated floor, resilient ceiling), optionally with its airborne gain. */
  z.object({
    kind: z.literal("add-impact-improvement"),
    delta_l_db: bandValuesOrScalarSchema,
    delta_tl_db: bandValuesOrScalarSchema.optional(),
  }),
]);

export const upgradeFlagSchema = z.enum([
  "blocks-daylight",
  "reduces-ventilation",
  "structural-work",
  "neighbour-access",
  "changes-appearance",
]);

export const upgradeCostSchema = z.object({
  fixed: z.number().nonnegative().default(0),
  per_m2: z.number().nonnegative().default(0),
  per_item: z.number().nonnegative().default(0),
  items: z.number().nonnegative().default(1),
  /** Area the per-m² price applies to; default: the area the action touches. */
  area_m2: z.number().nonnegative().optional(),
});

export const upgradeOptionSchema = z.object({
  id: z.string().min(1),
  name: z.string().optional(),
  /** The link the option changes. */
  link: z.string().min(1),
  action: upgradeActionSchema,
  cost: upgradeCostSchema.default({ fixed: 0, per_m2: 0, per_item: 0, items: 1 }),
  labour_h: z.number().nonnegative().default(0),
  /** Added thickness of a lining (floor area lost = thickness × length). */
  added_thickness_m: z.number().nonnegative().optional(),
  /** Length of the lined wall; default: the link's length_m. */
  length_m: z.number().positive().optional(),
  /** Floor area lost, overriding thickness × length. */
  floor_area_lost_m2: z.number().nonnegative().optional(),
  flags: z.array(upgradeFlagSchema).default([]),
  cautions: z.array(z.string()).default([]),
});

export const upgradeLimitsSchema = z.object({
  budget: z.number().nonnegative().optional(),
  floor_area_m2: z.number().nonnegative().optional(),
  labour_h: z.number().nonnegative().optional(),
  /** Flags the client accepts; options with any other flag are left out. Omitted: every flag allowed. */
  allowed_flags: z.array(upgradeFlagSchema).optional(),
});

export const upgradeOptionsFileSchema = z.union([
  z.array(upgradeOptionSchema),
  z.object({
    options: z.array(upgradeOptionSchema),
    limits: upgradeLimitsSchema.optional(),
    target: targetSchema.optional(),
  }),
]);

export type UpgradeAction = z.output<typeof upgradeActionSchema>;
export type UpgradeFlag = z.output<typeof upgradeFlagSchema>;
export type UpgradeOption = z.output<typeof upgradeOptionSchema>;
export type UpgradeOptionInput = z.input<typeof upgradeOptionSchema>;
export type UpgradeLimits = z.output<typeof upgradeLimitsSchema>;
export type UpgradeOptionsFile = z.output<typeof upgradeOptionsFileSchema>;
