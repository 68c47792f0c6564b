/** Errors that end a command with exit code 2 and a message saying what is wrong and where. */

export const EXIT_OK = 0;
export const EXIT_INTERNAL = 1;
export const EXIT_INPUT = 2;

/** Bad input: a file, a JSON path, a CSV line or an argument. */
export class InputError extends Error {
  override readonly name: string = "InputError";
  constructor(
    message: string,
    /** Where: `file`, `file:line:column`, `file: $.path` … */
    readonly where?: string,
    /** More lines (several issues of one file). */
    readonly details: readonly string[] = [],
  ) {
    super(message);
  }
}

/** Bad command line (unknown command or option, missing argument). */
export class UsageError extends InputError {
  override readonly name: string = "UsageError";
}
