/** Loading the engine's inputs from files, turning every problem into an InputError that says where. */
import { NetworkRequestError, NetworkSolveError, parseNetwork, parseUpgradeOptions, type Network, type Target, type UpgradeOptionsSet } from "@hushmark/acoustics";
import { InputError, UsageError } from "./errors.js";
import { issuesError, readJson } from "./json-file.js";
import type { CliIo } from "./io.js";
import { numberOption, type ParsedArgs } from "./args.js";

/** A network file, parsed and checked. */
export function loadNetwork(io: CliIo, path: string): Network {
  const p = parseNetwork(readJson(io, path));
  if (!p.ok) throw issuesError(path, p.issues, "network");
  return p.value;
}

/** An options file, parsed and checked against the network. */
export function loadOptions(io: CliIo, path: string, network: Network): UpgradeOptionsSet {
  const p = parseUpgradeOptions(readJson(io, path), network);
  if (!p.ok) throw issuesError(path, p.issues, "options");
  return p.value;
}

/** Run an engine call; its request and solve errors become InputErrors about the network file. */
export function withNetworkErrors<T>(path: string, fn: () => T): T {
  try {
    return fn();
  } catch (e) {
    if (e instanceof NetworkRequestError || e instanceof NetworkSolveError) throw new InputError(e.message, path);
    throw e;
  }
}

export const TARGET_OPTIONS = ["target-dba", "target-nc", "target-reduction"] as const;

/** The target from --target-dba, --target-nc or --target-reduction (at most one). */
export function targetFromArgs(args: ParsedArgs, command: string): Target | undefined {
  const given = TARGET_OPTIONS.filter((o) => args.options.has(o));
  if (given.length > 1) throw new UsageError(`give only one of ${given.map((g) => `--${g}`).join(", ")}`, command);
  const dba = numberOption(args, "target-dba", command);
  if (dba !== undefined) return { kind: "level", dba };
  const nc = numberOption(args, "target-nc", command, 15);
  if (nc !== undefined) {
    if (nc > 70) throw new UsageError(`--target-nc must be between 15 and 70, got ${nc}`, command);
    return { kind: "nc", nc };
  }
  const db = numberOption(args, "target-reduction", command, 0);
  return db === undefined ? undefined : { kind: "reduction", db };
}
