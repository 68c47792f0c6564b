/** The shape of a command; the dispatcher lists them in commands/index.ts. */
import type { CliIo } from "../io.js";

export interface Command {
  readonly name: string;
  readonly summary: string;
  /** One usage line, without the program name. */
  readonly usage: string;
  /** Exit code (0 ok); throw InputError/UsageError for bad input. */
  run(argv: readonly string[], io: CliIo): Promise<number> | number;
}
