/** What a command may touch: output streams and file reading, injected so tests need no processes. */
import { readFileSync } from "node:fs";
import { resolve } from "node:path";

export interface CliIo {
  readonly stdout: (text: string) => void;
  readonly stderr: (text: string) => void;
  /** Read a text file (relative to the working directory); throws Node's error when it cannot. */
  readonly readFile: (path: string) => string;
}

/** The real process streams and file system. */
export function processIo(cwd = process.cwd()): CliIo {
  return {
    stdout: (t) => void process.stdout.write(t),
    stderr: (t) => void process.stderr.write(t),
    readFile: (p) => readFileSync(resolve(cwd, p), "utf8"),
  };
}
