// Writes the demo plan documents and their measurement files from TypeScript, so the JSON in
// examples/ always matches the current plan schema. `--check` only compares and fails on drift.
// Run from the repository root: npx tsx examples/write-examples.ts [--check]
import { mkdirSync, readFileSync, writeFileSync, existsSync } from "node:fs";
import { dirname, join } from "node:path";
import { fileURLToPath } from "node:url";
import { BANDS_HZ, demoPlans, seededRandom, serializePlan, sourceSpectrum } from "../packages/floorplan/src/index.js";

const here = dirname(fileURLToPath(import.meta.url));
const check = process.argv.includes("--check");

/** An invented measurement: a library spectrum moved to a level, with seeded scatter, and Lmax above Leq. */
function measurement(spectrumId: string, shiftDb: number, seed: number, peakDb: number, adjust: (hz: number) => number = () => 0): string {
  const base = sourceSpectrum(spectrumId);
  if (!base) throw new Error(`no spectrum ${spectrumId}`);
  const rand = seededRandom(seed);
  const rows = BANDS_HZ.map((hz, i) => {
    const leq = base.levelsDb[i]! + shiftDb + adjust(hz) + (rand() - 0.5) * 2;
    const lmax = leq + peakDb * (0.6 + 0.4 * rand());
    return `${hz},${leq.toFixed(1)},${lmax.toFixed(1)}`;
  });
  return ["frequency_hz,leq_db,lmax_db", ...rows].join("\n") + "\n";
}

const files: Record<string, string> = {};
for (const d of demoPlans()) files[d.file] = serializePlan(d.plan);
// Fernhollow: the café back room with the condenser running, the café at the morning rush, the
// pavement during a tram pass, and the recording room at night when only the condenser runs.
files["measurements/fernhollow-back-room-condenser.csv"] = measurement("machinery-hum", 0, 11, 4);
files["measurements/fernhollow-cafe-morning.csv"] = measurement("speech-raised", 14, 12, 12, (hz) => (hz >= 2000 ? 6 : 0));
files["measurements/fernhollow-pavement-tram.csv"] = measurement("tram-wheel-squeal", 0, 13, 9);
files["measurements/fernhollow-recording-room-night.csv"] = measurement("machinery-hum", -38, 14, 3, (hz) => (hz > 500 ? -Math.log2(hz / 500) * 8 : 0));
// Cinema: the cinema during a film, and the nursery above at the same time.
files["measurements/cinema-during-film.csv"] = measurement("cinema-bass", -4, 21, 10);
files["measurements/nursery-during-film.csv"] = measurement("cinema-bass", -52, 22, 8, (hz) => (hz > 125 ? -Math.log2(hz / 125) * 9 : 0));

let drift = 0;
for (const [name, text] of Object.entries(files)) {
  const path = join(here, name);
  if (check) {
    if (!existsSync(path) || readFileSync(path, "utf8") !== text) {
      console.error(`out of date: examples/${name}`);
      drift++;
    }
    continue;
  }
  mkdirSync(dirname(path), { recursive: true });
  writeFileSync(path, text);
  console.log(`wrote examples/${name}`);
}
if (drift > 0) {
  console.error(`${drift} example file(s) differ from the generator; run npx tsx examples/write-examples.ts`);
  process.exit(1);
}
