import type { Brief } from "./intake.js";
import type { UpgradeFlagName } from "./price-book.js";
import type { SearchLimitsInput } from "./scenarios.js";

/** Which of the client's "accepts losing" answers allows which upgrade flag. */
const FLAG_OF_ACCEPT: Record<UpgradeFlagName, keyof Brief["accepts"]> = {
  "blocks-daylight": "daylight",
  "reduces-ventilation": "ventilation",
  "changes-appearance": "doorLook",
  "structural-work": "structuralWork",
  "neighbour-access": "neighbourAccess",
};

/**
 * The limits "best within limits" works to, from the brief: the budget when one is set and the
 * flags the client accepts (an upgrade with any other flag is left out). Limits the planner sets
 * on the search itself win over these.
 */
export function searchLimitsOfBrief(brief: Pick<Brief, "budget" | "accepts">): SearchLimitsInput {
  const allowedFlags = (Object.keys(FLAG_OF_ACCEPT) as UpgradeFlagName[]).filter((flag) => brief.accepts[FLAG_OF_ACCEPT[flag]] === true);
  return { ...(brief.budget.amount !== null ? { budget: brief.budget.amount } : {}), allowedFlags };
}

/** The planner's limits, with the brief's filling in what the planner left out. */
export function mergeSearchLimits(fromRequest: SearchLimitsInput, fromBrief: SearchLimitsInput): SearchLimitsInput {
  return { ...fromBrief, ...Object.fromEntries(Object.entries(fromRequest).filter(([, v]) => v !== undefined)) };
}
