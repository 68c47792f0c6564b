import { z } from "zod";

/** The trade's families of upgrades. */
export const upgradeFamilySchema = z.enum(["sealing", "mass", "decoupling", "damping", "ducts", "impact"], "Pick a family: sealing, mass, decoupling, damping, ducts or impact.");
export type UpgradeFamily = z.infer<typeof upgradeFamilySchema>;

/** The plan elements an upgrade can be put on. */
export const upgradeTargetKindSchema = z.enum(["wall", "door", "window", "penetration", "floor", "ceiling", "vent"], "Pick what it applies to: wall, door, window, penetration, floor, ceiling or vent.");
export type UpgradeTargetKind = z.infer<typeof upgradeTargetKindSchema>;

/** What the client gives up for an upgrade (the engine's flags). */
export const upgradeFlagNameSchema = z.enum(["blocks-daylight", "reduces-ventilation", "structural-work", "neighbour-access", "changes-appearance"], "Unknown flag.");
export type UpgradeFlagName = z.infer<typeof upgradeFlagNameSchema>;

const db = z.number("Give the improvement in dB.").finite().min(0, "An improvement cannot be negative.").max(60, "More than 60 dB is beyond any single upgrade.");
/** One figure for every band, or 21 one-third-octave values (50–5000 Hz). */
export const bandDbSchema = z.union([db, z.array(db).length(21, "Give one value, or 21 one-third-octave values from 50 to 5000 Hz.")]);

/** The acoustic effect of an upgrade, in the engine's terms. */
export const upgradeEffectSchema = z.discriminatedUnion("kind", [
  /** The element's construction is replaced by one from the catalogue (a solid-core door, secondary glazing…). */
  z.object({ kind: z.literal("construction"), constructionId: z.string().trim().min(1, "Name the catalogue construction that replaces the element.").max(80) }),
  /** A layer is added: transmission loss improvement in dB. */
  z.object({ kind: z.literal("added-layer"), deltaTlDb: bandDbSchema }),
  /** A gap is sealed: under the door, around it, or a penetration's opening. */
  z.object({ kind: z.literal("sealed-gap"), gap: z.enum(["undercut", "perimeter", "opening"], "Say which gap it seals: undercut, perimeter or opening."), remainingOpenAreaM2: z.number().min(0).max(1).default(0) }),
  /** Duct attenuation added to a vent-and-duct link, dB. */
  z.object({ kind: z.literal("duct-attenuation"), attenuationDb: bandDbSchema }),
  /** An impact improvement ΔL on a floor, optionally with its airborne gain. */
  z.object({ kind: z.literal("impact-improvement"), deltaLDb: bandDbSchema, deltaTlDb: bandDbSchema.optional() }),
], "Pick an effect: construction, added-layer, sealed-gap, duct-attenuation or impact-improvement.");
export type UpgradeEffect = z.infer<typeof upgradeEffectSchema>;

const money = (what: string) => z.number(`Give the ${what} as a number.`).finite().min(0, `The ${what} cannot be negative.`).max(1_000_000, `The ${what} is more than a million.`);

export const upgradeCostsSchema = z.object({
  fixedMaterials: money("fixed materials cost").default(0),
  fixedLabour: money("fixed labour cost").default(0),
  perM2Materials: money("materials cost per m²").default(0),
  perM2Labour: money("labour cost per m²").default(0),
  perItemMaterials: money("materials cost per item").default(0),
  perItemLabour: money("labour cost per item").default(0),
});
export type UpgradeCosts = z.infer<typeof upgradeCostsSchema>;

export const priceBookCodeSchema = z.string().trim().regex(/^[a-z0-9][a-z0-9-]{1,59}$/, "Use 2 to 60 lower-case letters, digits and dashes for the code.");

export const priceBookItemInputSchema = z.object({
  code: priceBookCodeSchema,
  name: z.string().trim().min(2, "Give the upgrade a name of at least 2 characters.").max(120, "A name is at most 120 characters."),
  family: upgradeFamilySchema,
  appliesTo: z.array(upgradeTargetKindSchema).min(1, "Say what it applies to.").max(7),
  effect: upgradeEffectSchema,
  costs: upgradeCostsSchema.default({ fixedMaterials: 0, fixedLabour: 0, perM2Materials: 0, perM2Labour: 0, perItemMaterials: 0, perItemLabour: 0 }),
  labourHours: z.number("Give the labour in hours.").finite().min(0, "Labour cannot be negative.").max(1000, "More than 1000 hours for one upgrade is not plausible.").default(0),
  addedThicknessMm: z.number().finite().min(0, "A thickness cannot be negative.").max(500, "More than 500 mm is not a lining.").default(0),
  flags: z.array(upgradeFlagNameSchema).max(5).default([]),
  cautions: z.array(z.string().trim().min(1).max(400, "A caution is at most 400 characters.")).max(10).default([]),
  active: z.boolean().default(true),
});
export type PriceBookItemInput = z.input<typeof priceBookItemInputSchema>;

export const priceBookItemUpdateSchema = priceBookItemInputSchema.partial();

export const priceBookItemSchema = priceBookItemInputSchema.extend({ id: z.uuid(), updatedAt: z.string() });
export type PriceBookItem = z.infer<typeof priceBookItemSchema>;

export const priceBookSchema = z.object({ currency: z.string(), items: z.array(priceBookItemSchema) });
export type PriceBook = z.infer<typeof priceBookSchema>;

export const priceBookItemParamSchema = z.object({ itemId: z.uuid("That price book item id is not valid.") });

export const priceBookImportSchema = z.object({
  csv: z.string().min(1, "Paste or upload a CSV file.").max(200_000, "The CSV is larger than 200 kB; split it into parts."),
  /** "merge" updates items with the same code and adds the rest; "replace" also removes the others. */
  mode: z.enum(["merge", "replace"]).default("merge"),
});

export const priceBookImportResultSchema = z.object({ added: z.number().int(), updated: z.number().int(), removed: z.number().int() });

/** The firm's commercial settings used by proposals and deposits. */
export const firmSettingsSchema = z.object({
  currency: z.string().trim().regex(/^[A-Z]{3}$/, "Use a three-letter currency code such as USD."),
  taxRatePercent: z.number("Give the tax rate as a number.").finite().min(0, "A tax rate cannot be negative.").max(50, "A tax rate above 50% is not plausible."),
  depositPercent: z.number("Give the deposit as a percentage.").finite().min(0, "A deposit cannot be negative.").max(100, "A deposit cannot be more than the whole price."),
  validityDays: z.number().int("Validity is a whole number of days.").min(1, "A proposal is valid for at least a day.").max(365, "A proposal is valid for at most a year."),
  terms: z.string().trim().max(4000, "Terms are at most 4000 characters."),
});
export type FirmSettings = z.infer<typeof firmSettingsSchema>;
