/** Parsing an options file against a network, with JSON-path issues. */
import { bandCount } from "../bands/bands.js";
import { inputIssues, type InputIssue, type ParseResult } from "../network/parse.js";
import type { Network } from "../network/schema.js";
import type { Target } from "../network/targets.js";
import { checkOption } from "./apply.js";
import { upgradeOptionsFileSchema, type UpgradeLimits, type UpgradeOption } from "./schema.js";

export interface UpgradeOptionsSet {
  readonly options: UpgradeOption[];
  readonly limits?: UpgradeLimits;
  readonly target?: Target;
}

/** Parse an options file (an array of options, or `{ options, limits?, target? }`) and check it against the network. */
export function parseUpgradeOptions(value: unknown, network: Network): ParseResult<UpgradeOptionsSet> {
  const r = upgradeOptionsFileSchema.safeParse(value);
  if (!r.success) return { ok: false, issues: inputIssues(r.error, value) };
  const set: UpgradeOptionsSet = Array.isArray(r.data) ? { options: r.data } : r.data;
  const prefix = Array.isArray(value) ? "$" : "$.options";
  const issues: InputIssue[] = [];
  const seen = new Set<string>();
  set.options.forEach((o, i) => {
    if (seen.has(o.id)) issues.push({ path: `${prefix}[${i}].id`, message: `duplicate option id "${o.id}"` });
    seen.add(o.id);
    issues.push(...checkOption(o, network, bandCount(network.bands), `${prefix}[${i}]`));
  });
  return issues.length > 0 ? { ok: false, issues } : { ok: true, value: set };
}
