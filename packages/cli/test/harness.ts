/** Runs the command line in-process with in-memory files and captured output. */
import { run } from "../src/cli.js";
import type { Command } from "../src/commands/command.js";
import { COMMANDS } from "../src/commands/index.js";

export interface Outcome {
  readonly code: number;
  readonly stdout: string;
  readonly stderr: string;
}

export async function hushmark(argv: string[], files: Record<string, string> = {}, commands: readonly Command[] = COMMANDS): Promise<Outcome> {
  let stdout = "";
  let stderr = "";
  const code = await run(
    argv,
    {
      stdout: (t) => void (stdout += t),
      stderr: (t) => void (stderr += t),
      readFile: (p) => {
        if (p.endsWith("/")) throw Object.assign(new Error("EISDIR"), { code: "EISDIR" });
        const text = files[p];
        if (text === undefined) throw Object.assign(new Error(`ENOENT: ${p}`), { code: "ENOENT" });
        return text;
      },
    },
    commands,
  );
  return { code, stdout, stderr };
}

export const B21 = (f: (b: number) => number) => Array.from({ length: 21 }, (_, b) => f(b));

export const network = () => ({
  spaces: [
    { id: "cafe", kind: "room", volume_m3: 60, rt60_s: 0.6 },
    { id: "studio", kind: "room", volume_m3: 50, absorption_m2: 16 },
    { id: "void", kind: "void", volume_m3: 30, absorption_m2: 12 },
    { id: "street", kind: "outdoors" },
  ],
  links: [
    { id: "party-wall", between: ["cafe", "studio"], parts: [{ id: "wall", area_m2: 10, tl_db: B21((b) => 30 + b) }, { id: "gap", area_m2: 0.01, open: true }] },
    { id: "cafe-tiles", between: ["cafe", "void"], parts: [{ area_m2: 20, tl_db: B21((b) => 12 + 0.5 * b) }] },
    { id: "studio-tiles", between: ["void", "studio"], parts: [{ area_m2: 15, tl_db: B21((b) => 12 + 0.5 * b) }] },
  ],
  sources: [{ space: "cafe", levels_db: B21(() => 85) }],
});

export const options = () => [
  { id: "seal", link: "party-wall", action: { kind: "seal-leak", part: "gap" }, cost: { per_item: 20, items: 2 }, labour_h: 1 },
  { id: "lining", link: "party-wall", action: { kind: "add-layer", part: "wall", delta_tl_db: 10 }, cost: { fixed: 200, per_m2: 60 }, labour_h: 12 },
  { id: "barrier", link: "studio-tiles", action: { kind: "add-layer", delta_tl_db: 15 }, cost: { per_m2: 40 }, labour_h: 6 },
];

export const csv = (rows: [number, number][], col = "tl_db") => `frequency_hz,${col}\n${rows.map(([f, v]) => `${f},${v}`).join("\n")}\n`;
export const THIRDS = [50, 63, 80, 100, 125, 160, 200, 250, 315, 400, 500, 630, 800, 1000, 1250, 1600, 2000, 2500, 3150, 4000, 5000];
