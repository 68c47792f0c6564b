/** `hushmark rate FILE [--json]`: every single-number rating a band CSV supports. */
import {
  MissingBandsError,
  ratingIic,
  ratingLnw,
  ratingOitc,
  ratingRw,
  ratingStc,
  type CurveRating,
} from "@hushmark/acoustics";
import { parseArgs } from "../args.js";
import { parseRatingCsv } from "../csv.js";
import { jsonText, num } from "../format.js";
import { readText } from "../json-file.js";
import type { Command } from "./command.js";

const SPEC = { positionals: ["FILE"], options: [], flags: ["json"] } as const;

interface Rated {
  values: Record<string, number>;
  notes: string[];
  details: Record<string, unknown>;
  lines: string[];
}

function detail(r: CurveRating) {
  return {
    standard: r.standard,
    frequencies_hz: r.frequenciesHz,
    curve_db: r.curveDb,
    deviations_db: r.deviationsDb.map((d) => num(d, 2)),
    deviation_sum_db: num(r.deviationSumDb, 2),
    max_deviation_db: num(r.maxDeviationDb, 2),
  };
}

/** Run one rating; a MissingBandsError becomes a note. */
function attempt(out: Rated, key: string, label: string, fn: () => void): void {
  try {
    fn();
  } catch (e) {
    if (!(e instanceof MissingBandsError)) throw e;
    out.notes.push(`${key}: not rated — ${label} needs data at ${e.missingHz.join(", ")} Hz`);
  }
}

function rateAirborne(t: ReadonlyMap<number, number>): Rated {
  const out: Rated = { values: {}, notes: [], details: {}, lines: [] };
  attempt(out, "stc", "STC (ASTM E413)", () => {
    const r = ratingStc(t);
    out.values.stc = r.value;
    out.details.stc = detail(r);
    out.notes.push(`stc: ${r.notes[0]}`);
    out.lines.push(`STC ${r.value}   ASTM E413; deficiency sum ${r.deviationSumDb.toFixed(1)} dB, largest ${r.maxDeviationDb.toFixed(1)} dB`);
  });
  attempt(out, "rw", "Rw (ISO 717-1)", () => {
    const r = ratingRw(t);
    Object.assign(out.values, { rw: r.value, c: r.c, ctr: r.ctr });
    out.details.rw = detail(r);
    out.lines.push(`Rw ${r.value} (C ${r.c}; Ctr ${r.ctr}) dB   ISO 717-1; unfavourable deviations ${r.deviationSumDb.toFixed(1)} dB`);
    if (r.c50_5000 !== undefined && r.ctr50_5000 !== undefined) {
      Object.assign(out.values, { c50_5000: r.c50_5000, ctr50_5000: r.ctr50_5000 });
      out.lines.push(`C50-5000 ${r.c50_5000} dB, Ctr,50-5000 ${r.ctr50_5000} dB   ISO 717-1 extended range (spectra from memory)`);
      out.notes.push("c50_5000: the extended-range spectra are as recalled in engine-notes (from memory)");
    } else {
      out.notes.push("c50_5000: not rated — needs one-third-octave data 50–5000 Hz");
    }
  });
  attempt(out, "oitc", "OITC (ASTM E1332)", () => {
    const r = ratingOitc(t);
    out.values.oitc = r.value;
    out.details.oitc = { standard: r.standard, frequencies_hz: r.frequenciesHz, transmitted_dba: r.transmittedDba.map((v) => num(v, 2)), exact: num(r.exact, 2) };
    out.lines.push(`OITC ${r.value}   ASTM E1332 (reference levels memory-grade)`);
  });
  return out;
}

function rateImpact(t: ReadonlyMap<number, number>): Rated {
  const out: Rated = { values: {}, notes: [], details: {}, lines: [] };
  attempt(out, "ln_w", "Ln,w (ISO 717-2)", () => {
    const r = ratingLnw(t);
    Object.assign(out.values, { ln_w: r.value, ci: r.ci });
    out.details.ln_w = detail(r);
    out.lines.push(`Ln,w ${r.value} dB (CI ${r.ci} dB)   ISO 717-2; unfavourable deviations ${r.deviationSumDb.toFixed(1)} dB`);
  });
  attempt(out, "iic", "IIC (ASTM E989)", () => {
    const r = ratingIic(t);
    out.values.iic = r.value;
    out.details.iic = detail(r);
    out.lines.push(`IIC ${r.value}   ASTM E989; deviation sum ${r.deviationSumDb.toFixed(1)} dB, largest ${r.maxDeviationDb.toFixed(1)} dB`);
  });
  return out;
}

export const rateCommand: Command = {
  name: "rate",
  summary: "single-number ratings (STC, Rw, C, Ctr, OITC; Ln,w, CI, IIC) of band data in a CSV file",
  usage: "rate FILE [--json]",
  run(argv, io) {
    const args = parseArgs(argv, SPEC, "rate");
    const file = args.positionals[0] as string;
    const csv = parseRatingCsv(readText(io, file), file);
    const r = csv.kind === "airborne" ? rateAirborne(csv.table) : rateImpact(csv.table);
    if (args.flags.has("json")) {
      io.stdout(jsonText({ file, kind: csv.kind, ...r.values, notes: r.notes, details: r.details }));
      return 0;
    }
    const text = [`${file}: ${csv.kind} data, ${csv.table.size} bands`, ...r.lines, ...r.notes.map((n) => `note: ${n}`)];
    io.stdout(text.join("\n") + "\n");
    return 0;
  },
};
