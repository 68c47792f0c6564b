/** Public API of @hushmark/cli: the dispatcher and the commands, for embedding and tests. */
export { run } from "./cli.js";
export { COMMANDS } from "./commands/index.js";
export type { Command } from "./commands/command.js";
export type { CliIo } from "./io.js";
export { processIo } from "./io.js";
export { InputError, UsageError, EXIT_OK, EXIT_INPUT, EXIT_INTERNAL } from "./errors.js";
export { parseArgs, numberOption, requiredOption } from "./args.js";
export type { ArgSpec, ParsedArgs } from "./args.js";
export { readJson, readText, issuesError } from "./json-file.js";
export { loadNetwork, loadOptions, withNetworkErrors, targetFromArgs } from "./load.js";
export { jsonText, num, dbText, table } from "./format.js";
export { solveJson } from "./commands/solve.js";
export { upgradesJson } from "./commands/upgrades.js";
