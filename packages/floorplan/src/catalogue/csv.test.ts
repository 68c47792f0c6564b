import { describe, expect, it } from "vitest";
import { BANDS_HZ } from "./bands.js";
import { constructionFromCsv, measurementFromCsv } from "./csv.js";

const meta = { id: "firm-wall-1", name: "Our lab-tested wall", category: "wall" as const, thicknessMm: 150, surfaceDensityKgM2: 45, sourceNote: "Lab report 17 (invented)." };
const csv = (rows: Array<[number, number]>) => ["frequency_hz,tl_db", ...rows.map(([f, v]) => `${f},${v}`)].join("\n");

describe("construction from a lab CSV", () => {
  it("accepts 100–4000 Hz and holds the outer bands, saying so", () => {
    const rows = BANDS_HZ.filter((f) => f >= 100 && f <= 4000).map((f, i) => [f, 30 + i] as [number, number]);
    const r = constructionFromCsv(csv(rows), meta);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.value.tlDb.slice(0, 4)).toEqual([30, 30, 30, 30]); // 50–80 held at 100 Hz
    expect(r.value.tlDb[20]).toBe(30 + 16); // 5000 held at 4000 Hz
    expect(r.notes[0]).toContain("50, 63, 80, 5000 Hz not measured");
  });

  it("names the line of a bad value and the missing bands", () => {
    const bad = constructionFromCsv("frequency_hz,tl_db\n100,30\n125,abc\n", meta);
    expect(bad.ok).toBe(false);
    if (!bad.ok) expect(bad.problems).toEqual([{ line: 3, message: "tl_db at 125 Hz is not a number." }]);
    const short = constructionFromCsv(csv([[100, 30], [125, 31]]), meta);
    expect(!short.ok && short.problems[0]!.message).toMatch(/^Bands 160, 200/);
    const odd = constructionFromCsv(csv([[110, 30]]), meta);
    expect(!odd.ok && odd.problems[0]!.message).toContain("110 Hz is not a one-third-octave band");
  });
});

describe("measurement CSV", () => {
  it("reads a measurement file and rejects Lmax below Leq", () => {
    const text = ["frequency_hz,leq_db,lmax_db", ...BANDS_HZ.map((f, i) => `${f},${40 - i * 0.5},${45 - i * 0.5}`)].join("\r\n");
    const r = measurementFromCsv(text);
    expect(r.ok).toBe(true);
    if (r.ok) {
      expect(r.value.leqDb.every((v) => v !== null)).toBe(true);
      expect(r.value.leqDb[0]).toBe(40);
      expect(r.value.lmaxDb[20]).toBe(35);
    }
    const wrong = measurementFromCsv("frequency_hz,leq_db,lmax_db\n100,50,45\n");
    expect(!wrong.ok && wrong.problems[0]!.message).toBe("At 100 Hz Lmax is below Leq.");
  });
});
