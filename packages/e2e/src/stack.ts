import { spawn, type ChildProcess } from "node:child_process";
import { createServer } from "node:net";
import { fileURLToPath } from "node:url";

export const ROOT = fileURLToPath(new URL("../../../", import.meta.url));

/** A free TCP port on 127.0.0.1. */
export function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = createServer();
    server.once("error", reject);
    server.listen(0, "127.0.0.1", () => {
      const address = server.address();
      server.close(() => resolve(typeof address === "object" && address ? address.port : 0));
    });
  });
}

/** Runs a node script to completion, throwing with its output when it fails. */
export function runNode(args: string[], env: NodeJS.ProcessEnv): Promise<void> {
  return new Promise((resolve, reject) => {
    const child = spawn("node", args, { cwd: ROOT, env, stdio: ["ignore", "pipe", "pipe"] });
    let output = "";
    child.stdout.on("data", (c) => (output += c));
    child.stderr.on("data", (c) => (output += c));
    child.once("exit", (code) => (code === 0 ? resolve() : reject(new Error(`node ${args.join(" ")} exited ${code}:\n${output}`))));
  });
}

/** Starts a long-running node process; its output is kept for error messages. */
export function startNode(args: string[], env: NodeJS.ProcessEnv): { child: ChildProcess; output: () => string } {
  const child = spawn("node", args, { cwd: ROOT, env, stdio: ["ignore", "pipe", "pipe"] });
  let output = "";
  child.stdout?.on("data", (c) => (output = (output + c).slice(-20_000)));
  child.stderr?.on("data", (c) => (output = (output + c).slice(-20_000)));
  return { child, output: () => output };
}

/** Waits for a URL to answer 2xx. */
export async function waitFor(url: string, timeoutMs: number, child?: ChildProcess, output?: () => string): Promise<void> {
  const start = Date.now();
  while (Date.now() - start < timeoutMs) {
    if (child && child.exitCode !== null) throw new Error(`process exited (${child.exitCode}) before ${url} answered:\n${output?.() ?? ""}`);
    try {
      if ((await fetch(url)).ok) return;
    } catch {
      // not up yet
    }
    await new Promise((r) => setTimeout(r, 150));
  }
  throw new Error(`${url} did not answer within ${timeoutMs} ms:\n${output?.() ?? ""}`);
}
