import { z } from "zod";
import { analysisSourceSchema, analysisTargetSchema } from "./analyses.js";
import { upgradeFlagNameSchema } from "./price-book.js";

/** What a scenario is evaluated against: the plan at a version, a source, the receiving room and its target. */
export const scenarioSetupSchema = z.object({
  planVersion: z.number("Send the plan version.").int("The plan version is a whole number.").nonnegative(),
  source: analysisSourceSchema,
  receiverId: z.string().min(1, "Pick the room that should be quiet.").max(120),
  target: analysisTargetSchema.optional(),
});
export type ScenarioSetup = z.infer<typeof scenarioSetupSchema>;

/** One upgrade from the price book put on one plan element. */
export const scenarioItemSchema = z.object({
  priceBookItemId: z.uuid("Pick an upgrade from the price book."),
  elementId: z.string().min(1, "Pick the element the upgrade goes on.").max(200),
});
export type ScenarioItem = z.infer<typeof scenarioItemSchema>;

export const scenarioInputSchema = z.object({
  name: z.string().trim().min(1, "Give the scenario a name.").max(120, "A name is at most 120 characters."),
  setup: scenarioSetupSchema,
  items: z.array(scenarioItemSchema).max(60, "A scenario has at most 60 upgrades."),
});
export type ScenarioInput = z.input<typeof scenarioInputSchema>;
export const scenarioUpdateSchema = scenarioInputSchema.partial();

export const scenarioParamSchema = z.object({ projectId: z.uuid("That project id is not valid."), scenarioId: z.uuid("That scenario id is not valid.") });

export const cautionSchema = z.object({ code: z.string(), text: z.string() });
export type CautionDto = z.infer<typeof cautionSchema>;

/** One priced line of a scenario: an upgrade on an element. */
export const scenarioLineSchema = z.object({
  priceBookItemId: z.string(),
  code: z.string(),
  name: z.string(),
  family: z.string(),
  elementId: z.string(),
  elementName: z.string(),
  areaM2: z.number(),
  materials: z.number(),
  labour: z.number(),
  total: z.number(),
  labourHours: z.number(),
  floorAreaLostM2: z.number(),
  flags: z.array(upgradeFlagNameSchema),
  cautions: z.array(cautionSchema),
});
export type ScenarioLine = z.infer<typeof scenarioLineSchema>;

export const levelsSummarySchema = z.object({ levelsDb: z.array(z.number()), dba: z.number(), nc: z.number() });

export const scenarioEvaluationSchema = z.object({
  bandsHz: z.array(z.number()),
  receiver: z.object({ id: z.string(), name: z.string() }),
  /** The source space's A-weighted level (0 for impact sources). */
  source: z.object({ id: z.string(), name: z.string(), dba: z.number() }),
  before: levelsSummarySchema,
  after: levelsSummarySchema.extend({ gainDb: z.number() }),
  target: z.object({ kind: z.string(), value: z.number(), met: z.boolean(), shortfallDb: z.number() }).nullable(),
  lines: z.array(scenarioLineSchema),
  totals: z.object({ materials: z.number(), labour: z.number(), cost: z.number(), labourHours: z.number(), floorAreaLostM2: z.number() }),
  flags: z.array(upgradeFlagNameSchema),
  cautions: z.array(cautionSchema),
  notes: z.array(z.string()),
});
export type ScenarioEvaluation = z.infer<typeof scenarioEvaluationSchema>;

export const scenarioSchema = z.object({
  id: z.uuid(),
  projectId: z.uuid(),
  name: z.string(),
  setup: scenarioSetupSchema,
  items: z.array(scenarioItemSchema),
  evaluation: scenarioEvaluationSchema.nullable(),
  updatedAt: z.string(),
});
export type Scenario = z.infer<typeof scenarioSchema>;
export const scenarioListSchema = z.object({ scenarios: z.array(scenarioSchema) });

/** The client's limits for "best within limits" (from the brief; any may be left open). */
export const searchLimitsSchema = z.object({
  budget: z.number().finite().min(0, "A budget cannot be negative.").optional(),
  floorAreaM2: z.number().finite().min(0, "Floor area cannot be negative.").optional(),
  labourHours: z.number().finite().min(0, "Labour cannot be negative.").optional(),
  /** Flags the client accepts; omitted: every flag. */
  allowedFlags: z.array(upgradeFlagNameSchema).optional(),
});
export type SearchLimitsInput = z.infer<typeof searchLimitsSchema>;

export const optionSearchInputSchema = z.object({
  setup: scenarioSetupSchema,
  /** The elements to try upgrades on (the weak links); every applicable price book upgrade is tried on each. */
  elementIds: z.array(z.string().min(1).max(200)).min(1, "Pick at least one element to upgrade.").max(40, "Pick at most 40 elements."),
  limits: searchLimitsSchema.default({}),
});
export type OptionSearchInput = z.input<typeof optionSearchInputSchema>;

export const searchParamSchema = z.object({ projectId: z.uuid("That project id is not valid."), searchId: z.uuid("That search id is not valid.") });

export const candidateSchema = z.object({ key: z.string(), priceBookItemId: z.string(), elementId: z.string(), name: z.string(), elementName: z.string() });

export const optionSearchResultSchema = z.object({
  base: levelsSummarySchema,
  ranking: z.array(candidateSchema.extend({ gainDb: z.number(), gainPerThousandDb: z.number().nullable(), cost: z.number(), dba: z.number() })),
  best: z.object({
    items: z.array(candidateSchema),
    dba: z.number(),
    gainDb: z.number(),
    cost: z.number(),
    labourHours: z.number(),
    floorAreaLostM2: z.number(),
    reachesTarget: z.boolean(),
    exact: z.boolean(),
    method: z.string(),
    excluded: z.array(z.object({ key: z.string(), name: z.string(), reason: z.string() })),
    /** Why the nearest alternatives on the frontier were not chosen. */
    alternatives: z.array(z.object({ items: z.array(z.string()), dba: z.number(), cost: z.number(), whyNot: z.string() })),
  }),
  frontier: z.object({ exact: z.boolean(), points: z.array(z.object({ cost: z.number(), dba: z.number(), items: z.array(z.string()) })) }),
  targetDba: z.number().nullable(),
});
export type OptionSearchResult = z.infer<typeof optionSearchResultSchema>;

export const optionSearchStatusSchema = z.object({
  id: z.uuid(),
  status: z.enum(["running", "done", "cancelled", "failed"]),
  progress: z.object({ phase: z.string(), done: z.number(), total: z.number() }),
  error: z.string().nullable(),
  result: optionSearchResultSchema.nullable(),
});
export type OptionSearchStatus = z.infer<typeof optionSearchStatusSchema>;
