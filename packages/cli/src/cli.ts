/**
 * The dispatcher: `hushmark <command> [arguments]`. Input problems print what and where and exit
 * 2; an unexpected failure prints one line and exits 1. No stack traces.
 */
import { COMMANDS } from "./commands/index.js";
import type { Command } from "./commands/command.js";
import { EXIT_INPUT, EXIT_INTERNAL, InputError, UsageError } from "./errors.js";
import type { CliIo } from "./io.js";

function usage(commands: readonly Command[]): string {
  const width = Math.max(...commands.map((c) => c.name.length));
  return [
    "usage: hushmark <command> [arguments]",
    "",
    "commands:",
    ...commands.map((c) => `  ${c.name.padEnd(width)}  ${c.summary}`),
    "",
    "hushmark <command> --help shows a command's arguments.",
    "",
  ].join("\n");
}

function report(e: unknown, io: CliIo, commands: readonly Command[]): number {
  if (e instanceof InputError) {
    const where = e.where !== undefined ? `${e.where}: ` : "";
    io.stderr(`hushmark: ${where}${e.message}\n`);
    for (const d of e.details) io.stderr(`  ${d}\n`);
    if (e instanceof UsageError) {
      const c = commands.find((k) => k.name === e.where);
      io.stderr(c ? `usage: hushmark ${c.usage}\n` : usage(commands));
    }
    return EXIT_INPUT;
  }
  io.stderr(`hushmark: internal error: ${e instanceof Error ? e.message : String(e)}\n`);
  return EXIT_INTERNAL;
}

/** Run the command line with `argv` (without node and the script) and the given io; resolves to the exit code. */
export async function run(argv: readonly string[], io: CliIo, commands: readonly Command[] = COMMANDS): Promise<number> {
  const [name, ...rest] = argv;
  if (name === undefined || name === "help" || name === "--help" || name === "-h") {
    (name === undefined ? io.stderr : io.stdout)(usage(commands));
    return name === undefined ? EXIT_INPUT : 0;
  }
  const command = commands.find((c) => c.name === name);
  if (command === undefined) return report(new UsageError(`unknown command "${name}"`), io, commands);
  if (rest.includes("--help") || rest.includes("-h")) {
    io.stdout(`usage: hushmark ${command.usage}\n${command.summary}\n`);
    return 0;
  }
  try {
    return await command.run(rest, io);
  } catch (e) {
    return report(e, io, commands);
  }
}
