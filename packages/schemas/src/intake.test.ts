import { describe, expect, it } from "vitest";
import { analysisTargetSchema } from "./analyses.js";
import { analysisTargetOfBrief, briefSchema, briefSaveSchema } from "./intake.js";

describe("brief", () => {
  it("fills an empty brief with defaults a form can start from", () => {
    const b = briefSchema.parse({});
    expect(b).toMatchObject({ noises: [], target: null, budget: { amount: null, currency: "EUR" }, accepts: { liningDepth: null, structuralWork: false, tenure: "unknown" } });
  });

  it("refuses impossible targets with messages a person can act on", () => {
    const r = briefSaveSchema.safeParse({ baseVersion: 0, brief: { target: { kind: "nc", nc: 12 } } });
    expect(r.success).toBe(false);
    expect(r.error!.issues[0]!.message).toMatch(/NC ratings start at 15/);
    expect(briefSchema.safeParse({ target: { kind: "level", levelDba: Number.NaN } }).success).toBe(false);
  });

  it("turns the brief's target into the analysis target, 'noticeably quieter' as a 5 dB reduction", () => {
    expect(analysisTargetOfBrief({ target: { kind: "nc", nc: 25 } })).toEqual({ kind: "nc", nc: 25 });
    expect(analysisTargetOfBrief({ target: { kind: "level", levelDba: 30 } })).toEqual({ kind: "dba", dba: 30 });
    expect(analysisTargetOfBrief({ target: { kind: "reduction", reductionDb: 12 } })).toEqual({ kind: "reduction", reductionDb: 12 });
    expect(analysisTargetOfBrief({ target: { kind: "noticeable" } })).toEqual({ kind: "reduction", reductionDb: 5 });
    expect(analysisTargetOfBrief({ target: null })).toBeUndefined();
    for (const kind of ["nc", "level", "reduction", "noticeable"] as const) {
      const target = briefSchema.parse({ target: { kind, nc: 30, levelDba: 35, reductionDb: 10 } }).target;
      expect(analysisTargetSchema.safeParse(analysisTargetOfBrief({ target })).success).toBe(true);
    }
  });
});
