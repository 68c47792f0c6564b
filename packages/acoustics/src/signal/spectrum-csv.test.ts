import { describe, expect, it } from "vitest";
import { THIRD_OCTAVE } from "../bands/bands.js";
import { parseSpectrumCsv, spectrumToCsv } from "./spectrum-csv.js";

const ALL = THIRD_OCTAVE.nominalHz;
const idx = (hz: number) => ALL.indexOf(hz);

describe("spectrum CSV", () => {
  it("reads a plain file with every band", () => {
    const text = ["frequency (Hz),level (dB)", ...ALL.map((f, i) => `${f},${40 + i}.5`)].join("\n");
    const r = parseSpectrumCsv(text);
    expect(r.ok).toBe(true);
    expect(r.problems).toEqual([]);
    expect(r.missingBandsHz).toEqual([]);
    expect(r.leqDb[idx(1000)]).toBe(53.5);
    expect(r.lmaxDb).toBeNull();
    expect(r.rows[0]).toEqual({ line: 2, bandHz: 50, levelDb: 40.5, maxDb: null });
  });

  it("takes columns in any order, units in the header, semicolons and decimal commas", () => {
    const text = "\uFEFFLmax [dB];Level [dB];Frequency [kHz]\r\n61,2;55,4;1\r\n50,0;48,25;0,5\r\n";
    const r = parseSpectrumCsv(text);
    expect(r.separator).toBe(";");
    expect(r.decimalComma).toBe(true);
    expect(r.columns).toEqual({ frequency: "frequency", level: "level", max: "lmax" });
    expect(r.leqDb[idx(1000)]).toBe(55.4);
    expect(r.lmaxDb![idx(1000)]).toBe(61.2);
    expect(r.leqDb[idx(500)]).toBe(48.25);
    expect(r.missingBandsHz).toHaveLength(19);
  });

  it("accepts tabs, quoted cells, comment lines and exact mid-frequencies", () => {
    const text = "# site: back office\nHz\tLeq dB\n\"501.19\"\t\"42,0\"\n63.1\t50\n";
    const r = parseSpectrumCsv(text);
    expect(r.ok).toBe(true);
    expect(r.leqDb[idx(500)]).toBe(42);
    expect(r.leqDb[idx(63)]).toBe(50);
    expect(r.rows.map((x) => x.line)).toEqual([3, 4]);
  });

  it("lists each kind of bad row with its line number and reason", () => {
    const text = [
      "frequency_hz,leq_db,lmax_db",
      "100,45,50", // 2 good
      "125,abc,50", // 3 level not a number
      "160,,", // 4 level missing
      "170,40,45", // 5 not a band
      "100,46,50", // 6 duplicate
      "200,50,44", // 7 max below level
      "250,400,401", // 8 out of range
      "x,40,40", // 9 frequency not a number
      "8000,40,41", // 10 outside 50–5000
      "315,40,zz", // 11 max not a number
      "400,41,47", // 12 good
    ].join("\n");
    const r = parseSpectrumCsv(text);
    expect(r.ok).toBe(true);
    expect(r.rows.map((x) => x.bandHz)).toEqual([100, 400]);
    const byLine = Object.fromEntries(r.problems.map((p) => [p.line, p.reason]));
    expect(Object.keys(byLine).map(Number)).toEqual([3, 4, 5, 6, 7, 8, 9, 10, 11]);
    expect(byLine[3]).toMatch(/level “abc” at 125 Hz is not a number/);
    expect(byLine[4]).toMatch(/level at 160 Hz is missing/);
    expect(byLine[5]).toMatch(/170 Hz is not a one-third-octave band/);
    expect(byLine[6]).toMatch(/already appears on line 2/);
    expect(byLine[7]).toMatch(/below its level/);
    expect(byLine[8]).toMatch(/outside/);
    expect(byLine[9]).toMatch(/frequency “x” is not a number/);
    expect(byLine[10]).toMatch(/8000 Hz is not a one-third-octave band/);
    expect(byLine[11]).toMatch(/maximum “zz”/);
    expect(r.problems.find((p) => p.line === 3)!.text).toBe("125,abc,50");
  });

  it("lists the missing bands", () => {
    const r = parseSpectrumCsv("frequency,level\n500,40\n1000,38\n");
    expect(r.missingBandsHz).toEqual(ALL.filter((f) => f !== 500 && f !== 1000));
    expect(r.leqDb.filter((v) => v !== null)).toEqual([40, 38]);
  });

  it("refuses a file without a usable header, saying which column is missing", () => {
    const r = parseSpectrumCsv("500,40\n1000,38\n");
    expect(r.ok).toBe(false);
    expect(r.problems[0]!.line).toBe(1);
    expect(r.problems[0]!.reason).toMatch(/frequency column/);
    expect(parseSpectrumCsv("frequency,colour\n500,red").problems[0]!.reason).toMatch(/level column/);
    expect(parseSpectrumCsv("").ok).toBe(false);
    const allBad = parseSpectrumCsv("frequency,level\n500,loud\n");
    expect(allBad.ok).toBe(false);
    expect(allBad.problems.map((p) => p.line)).toEqual([2, 1]);
  });

  it("turns A-weighted band levels back into unweighted ones", () => {
    const r = parseSpectrumCsv("frequency (Hz),level (dBA)\n100,30.9\n1000,50\n");
    // IEC 61672-1:2013, Table 3: A-weighting −19.1 dB at 100 Hz, 0 at 1 kHz.
    expect(r.leqDb[idx(100)]).toBeCloseTo(50, 1);
    expect(r.leqDb[idx(1000)]).toBeCloseTo(50, 1);
    expect(r.notes[0]).toMatch(/A-weighted/);
  });

  it("exports a spectrum that reads back the same, with either separator", () => {
    const leq = ALL.map((_, i) => (i === 3 ? null : 30 + i * 1.5));
    const lmax = leq.map((v) => (v === null ? null : v + 6));
    for (const sep of [",", ";"] as const) {
      const text = spectrumToCsv({ leqDb: leq, lmaxDb: lmax }, sep);
      const back = parseSpectrumCsv(text);
      expect(back.problems).toEqual([]);
      expect(back.leqDb).toEqual(leq.map((v) => (v === null ? null : Math.round(v * 10) / 10)));
      expect(back.lmaxDb).toEqual(lmax.map((v) => (v === null ? null : Math.round(v * 10) / 10)));
      expect(back.missingBandsHz).toEqual([100]);
    }
  });
});
