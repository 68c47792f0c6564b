import { readFileSync } from "node:fs";
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { parseNetwork, parseSpectrumCsv } from "@hushmark/acoustics";
import { constructionFromCsv, parsePlan } from "@hushmark/floorplan";
import { planDocumentCheck } from "../src/plans/plan-documents.js";
import { priceBookFromCsv, priceBookToCsv } from "../src/price-book/price-book-csv.js";
import { DEMO_PRICE_BOOK } from "../src/price-book/demo-price-book.js";
import { priceBookItemInputSchema } from "@hushmark/schemas";
import { csvMutationOf, mutationOf, RawJson, toJsonText } from "./support/mutations.js";

/**
 * The file parsers on their own (plan documents, network files, the three CSV formats): spoiled
 * input never throws, and a refusal lists problems that each say something. Seeded like the
 * route properties (HUSHMARK_PROPERTY_SEED, HUSHMARK_PROPERTY_RUNS).
 */
const SEED = Number(process.env.HUSHMARK_PROPERTY_SEED ?? 20_261_201);
const RUNS = Number(process.env.HUSHMARK_PROPERTY_RUNS ?? 8) * 25;
const example = (name: string) => readFileSync(new URL(`../../../examples/${name}`, import.meta.url), "utf8");

/** The JSON a client would send for a spoiled value (RawJson numbers read back as JSON does). */
const asParsed = (v: unknown): unknown => {
  const text = toJsonText(v);
  try {
    return JSON.parse(text);
  } catch {
    return text;
  }
};

const plans = [JSON.parse(example("fernhollow-studio.plan.json")), JSON.parse(example("cinema-under-nursery.plan.json"))] as Record<string, unknown>[];
const network = JSON.parse(example("fernhollow-network.json")) as Record<string, unknown>;
const wallCsv = example("wall-tl.csv");
const spectrumCsv = example("measurements/fernhollow-cafe-morning.csv");
const bookCsv = priceBookToCsv(DEMO_PRICE_BOOK.map((i, k) => ({ ...priceBookItemInputSchema.parse(i), id: `00000000-0000-4000-8000-${String(k).padStart(12, "0")}`, updatedAt: "2026-01-01T00:00:00Z" })));

const meta = { id: "lab-wall", name: "Lab wall", category: "wall" as const, thicknessMm: 120, surfaceDensityKgM2: 25, sourceNote: "Lab report 12" };

describe("parsers under spoiled input", () => {
  it("reads the unspoiled examples", () => {
    for (const p of plans) expect(parsePlan(p).ok).toBe(true);
    expect(parseNetwork(network).ok).toBe(true);
    expect(constructionFromCsv(wallCsv, meta).ok).toBe(true);
    expect(parseSpectrumCsv(spectrumCsv).ok).toBe(true);
    expect(priceBookFromCsv(bookCsv).ok).toBe(true);
  });

  it("plan documents: the parser and the save check never throw, and every refusal says why", () => {
    const arb = fc.constantFrom(...plans).chain((p) => fc.tuple(fc.constant(p), mutationOf(p)));
    fc.assert(
      fc.property(arb, ([p, m]) => {
        const doc = asParsed(m.apply(p));
        const parsed = parsePlan(doc);
        if (!parsed.ok) {
          expect(parsed.problems.length, m.kind).toBeGreaterThan(0);
          for (const problem of parsed.problems) expect(problem.message.trim().length, m.kind).toBeGreaterThan(0);
        }
        if (doc && typeof doc === "object" && !Array.isArray(doc)) {
          const issues = planDocumentCheck(doc as Record<string, unknown>);
          expect(issues.length === 0, m.kind).toBe(parsed.ok);
        }
      }),
      { seed: SEED, numRuns: RUNS },
    );
  });

  it("network files: never throw, and every refusal names a JSON path and what is wrong", () => {
    fc.assert(
      fc.property(mutationOf(network), (m) => {
        const parsed = parseNetwork(asParsed(m.apply(network)));
        if (!parsed.ok) {
          expect(parsed.issues.length, m.kind).toBeGreaterThan(0);
          for (const issue of parsed.issues) {
            expect(issue.path, m.kind).toMatch(/^\$/);
            expect(issue.message.trim().length, m.kind).toBeGreaterThan(0);
          }
        }
      }),
      { seed: SEED, numRuns: RUNS },
    );
  });

  it("lab CSVs for firm constructions: never throw, problems carry a message", () => {
    fc.assert(
      fc.property(csvMutationOf(wallCsv), fc.constantFrom("wall", "floor", "door") as fc.Arbitrary<"wall" | "floor" | "door">, (m, category) => {
        const parsed = constructionFromCsv(m.text, { ...meta, category });
        if (!parsed.ok) for (const p of parsed.problems) expect(p.message.trim().length, m.kind).toBeGreaterThan(0);
        else for (const v of parsed.value.tlDb) expect(Number.isFinite(v), `${m.kind}: a TL that is not a number`).toBe(true);
      }),
      { seed: SEED, numRuns: RUNS },
    );
  });

  it("spectrum CSVs: never throw, and the levels read are numbers or gaps", () => {
    fc.assert(
      fc.property(csvMutationOf(spectrumCsv), (m) => {
        const parsed = parseSpectrumCsv(m.text);
        for (const p of parsed.problems) expect(p.reason.trim().length, m.kind).toBeGreaterThan(0);
        for (const v of parsed.leqDb) expect(v === null || Number.isFinite(v), `${m.kind}: ${v}`).toBe(true);
        expect(parsed.leqDb).toHaveLength(21);
      }),
      { seed: SEED, numRuns: RUNS },
    );
  });

  it("price book CSVs: never throw; a refusal names its row and column, an acceptance passes the item schema", () => {
    fc.assert(
      fc.property(csvMutationOf(bookCsv), (m) => {
        const parsed = priceBookFromCsv(m.text);
        if (!parsed.ok) {
          expect(parsed.problems.length, m.kind).toBeGreaterThan(0);
          for (const p of parsed.problems) {
            expect(p.row, m.kind).toBeGreaterThanOrEqual(1);
            expect(p.message.trim().length, m.kind).toBeGreaterThan(0);
          }
        } else for (const item of parsed.items) expect(priceBookItemInputSchema.safeParse(item).success, m.kind).toBe(true);
      }),
      { seed: SEED, numRuns: RUNS },
    );
  });

  it("keeps RawJson numbers as JSON reads them (1e999 is Infinity, which no schema may let through)", () => {
    expect(asParsed({ a: new RawJson("1e999") })).toEqual({ a: Infinity });
  });
});
