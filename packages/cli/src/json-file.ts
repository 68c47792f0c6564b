/** Reading JSON input files with errors that say where: file, line and column, or a JSON path. */
import { InputError } from "./errors.js";
import type { CliIo } from "./io.js";
import { jsonErrorOffset } from "./json-locate.js";

/** The file's text; InputError naming the file when it cannot be read. */
export function readText(io: CliIo, path: string): string {
  try {
    return io.readFile(path);
  } catch (e) {
    const code = (e as NodeJS.ErrnoException).code;
    const why = code === "ENOENT" ? "no such file" : code === "EISDIR" ? "it is a folder" : code === "EACCES" ? "permission denied" : (e as Error).message;
    throw new InputError(`cannot read the file: ${why}`, path);
  }
}

/** Line and column (1-based) of a character offset. */
export function lineColumn(text: string, offset: number): { line: number; column: number } {
  const before = text.slice(0, offset);
  const line = before.split("\n").length;
  return { line, column: offset - before.lastIndexOf("\n") };
}

/** Parse a JSON file; InputError at `file:line:column` for a syntax error. */
export function readJson(io: CliIo, path: string): unknown {
  const text = readText(io, path).replace(/^\uFEFF/, "");
  if (text.trim() === "") throw new InputError("the file is empty (expected JSON)", path);
  try {
    return JSON.parse(text);
  } catch {
    const at = jsonErrorOffset(text) ?? text.length;
    const { line, column } = lineColumn(text, at);
    const found = at < text.length ? `unexpected ${JSON.stringify(text[at])}` : "unexpected end of the file";
    throw new InputError(`invalid JSON: ${found}`, `${path}:${line}:${column}`);
  }
}

/** InputError listing `$.path: message` issues of one file. */
export function issuesError(path: string, issues: readonly { path: string; message: string }[], what: string): InputError {
  const lines = issues.slice(0, 20).map((i) => `${path}: ${i.path}: ${i.message}`);
  if (issues.length > 20) lines.push(`… and ${issues.length - 20} more`);
  return new InputError(`${issues.length} problem${issues.length === 1 ? "" : "s"} in the ${what}`, path, lines);
}
