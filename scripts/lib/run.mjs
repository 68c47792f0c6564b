// Child-process helpers shared by start.mjs and test.mjs.
import { spawn, spawnSync } from "node:child_process";

/** Runs a command to completion with inherited output; throws with its exit code on failure. */
export function run(command, args, options = {}) {
  const result = spawnSync(command, args, { stdio: options.quiet ? "pipe" : "inherit", encoding: "utf8", ...options });
  if (result.error) throw new Error(`${command} could not start: ${result.error.message}`);
  if (result.status !== 0) {
    const output = options.quiet ? `\n${result.stdout ?? ""}${result.stderr ?? ""}` : "";
    const error = new Error(`${command} ${args.join(" ")} exited with ${result.status}${output}`);
    error.status = result.status;
    throw error;
  }
  return result.stdout ?? "";
}

/** Runs a command and answers its exit status instead of throwing. */
export function runStatus(command, args, options = {}) {
  const result = spawnSync(command, args, { stdio: "inherit", ...options });
  return result.status ?? 1;
}

/** True when `command` is on PATH. */
export function hasCommand(command) {
  return spawnSync("sh", ["-c", `command -v ${command}`], { stdio: "ignore" }).status === 0;
}

/** Starts a long-running child whose output lines are prefixed with a tag. */
export function startService(tag, command, args, options = {}) {
  const child = spawn(command, args, { stdio: ["ignore", "pipe", "pipe"], ...options });
  const prefix = (stream, out) => {
    let buffer = "";
    stream.on("data", (chunk) => {
      buffer += chunk.toString();
      const lines = buffer.split("\n");
      buffer = lines.pop() ?? "";
      for (const line of lines) if (!options.silent) out.write(`[${tag}] ${line}\n`);
      options.onLine?.(lines);
    });
  };
  prefix(child.stdout, process.stdout);
  prefix(child.stderr, process.stderr);
  return child;
}

/** Waits until `url` answers 2xx, or throws after `timeoutMs`. */
export async function waitForHttp(url, timeoutMs = 30_000, child) {
  const started = Date.now();
  let lastError = "";
  while (Date.now() - started < timeoutMs) {
    if (child && child.exitCode !== null) throw new Error(`the process for ${url} exited with ${child.exitCode}`);
    try {
      const res = await fetch(url);
      if (res.ok) return;
      lastError = `HTTP ${res.status}`;
    } catch (error) {
      lastError = error.message;
    }
    await new Promise((r) => setTimeout(r, 200));
  }
  throw new Error(`${url} did not answer within ${timeoutMs} ms (${lastError})`);
}

/** Stops a child with SIGTERM, then SIGKILL if it has not exited within `graceMs`. */
export async function stopChild(child, graceMs = 5000) {
  if (!child || child.exitCode !== null || child.signalCode !== null) return;
  const exited = new Promise((resolve) => child.once("exit", resolve));
  child.kill("SIGTERM");
  const timer = setTimeout(() => child.kill("SIGKILL"), graceMs);
  await exited;
  clearTimeout(timer);
}
