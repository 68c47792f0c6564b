/** A small argument parser: positionals, `--name value` options and `--flag` switches. */
import { UsageError } from "./errors.js";

export interface ArgSpec {
  /** Names of positional arguments, in order (all required). */
  readonly positionals: readonly string[];
  /** Options taking a value. */
  readonly options: readonly string[];
  /** Switches without a value. */
  readonly flags: readonly string[];
}

export interface ParsedArgs {
  readonly positionals: readonly string[];
  readonly options: ReadonlyMap<string, string>;
  readonly flags: ReadonlySet<string>;
}

/** Parse argv against a spec; UsageError for anything unexpected. */
export function parseArgs(argv: readonly string[], spec: ArgSpec, command: string): ParsedArgs {
  const positionals: string[] = [];
  const options = new Map<string, string>();
  const flags = new Set<string>();
  for (let i = 0; i < argv.length; i++) {
    const a = argv[i] as string;
    if (!a.startsWith("--") || a === "--") {
      positionals.push(a);
      continue;
    }
    const [name, inline] = a.slice(2).split(/=(.*)/s, 2) as [string, string | undefined];
    if (spec.flags.includes(name)) {
      if (inline !== undefined) throw new UsageError(`--${name} takes no value`, command);
      flags.add(name);
    } else if (spec.options.includes(name)) {
      const value = inline ?? argv[++i];
      if (value === undefined || (inline === undefined && value.startsWith("--"))) throw new UsageError(`--${name} needs a value`, command);
      options.set(name, value);
    } else {
      throw new UsageError(`unknown option --${name}`, command);
    }
  }
  if (positionals.length < spec.positionals.length) {
    throw new UsageError(`missing ${spec.positionals.slice(positionals.length).join(" and ")}`, command);
  }
  if (positionals.length > spec.positionals.length) throw new UsageError(`unexpected argument "${positionals[spec.positionals.length]}"`, command);
  return { positionals, options, flags };
}

/** A numeric option, or undefined when absent; UsageError when it is not a finite number (≥ min). */
export function numberOption(args: ParsedArgs, name: string, command: string, min = -Infinity): number | undefined {
  const raw = args.options.get(name);
  if (raw === undefined) return undefined;
  const v = Number(raw);
  if (raw.trim() === "" || !Number.isFinite(v) || v < min) {
    throw new UsageError(`--${name} must be a number${min > -Infinity ? ` ≥ ${min}` : ""}, got "${raw}"`, command);
  }
  return v;
}

/** A required option. */
export function requiredOption(args: ParsedArgs, name: string, command: string): string {
  const v = args.options.get(name);
  if (v === undefined) throw new UsageError(`missing --${name}`, command);
  return v;
}
