import { describe, expect, it } from "vitest";
import fernhollow from "../../../examples/fernhollow-studio.plan.json" with { type: "json" };
import cinema from "../../../examples/cinema-under-nursery.plan.json" with { type: "json" };
import { constructionCatalogue } from "../src/catalogue/catalogue.js";
import { demoPlans } from "../src/demo/demo-plans.js";
import { parsePlan } from "../src/document/parse.js";
import { serializePlan } from "../src/document/serialize.js";
import { validatePlan } from "../src/validation/validate.js";
import { buildNetwork } from "../src/builder/build-network.js";

const files: Record<string, unknown> = { "fernhollow-studio.plan.json": fernhollow, "cinema-under-nursery.plan.json": cinema };

describe("examples/ demo plans", () => {
  for (const demo of demoPlans()) {
    it(`${demo.file} parses, matches its generator and has no problems`, () => {
      const parsed = parsePlan(files[demo.file]);
      expect(parsed.ok ? [] : parsed.problems).toEqual([]);
      if (!parsed.ok) return;
      // Regenerate with: npx tsx examples/write-examples.ts
      expect(serializePlan(parsed.plan)).toBe(serializePlan(demo.plan));
      expect(validatePlan(parsed.plan, constructionCatalogue)).toEqual([]);
      const built = buildNetwork(parsed.plan, constructionCatalogue);
      expect(built.ok).toBe(true);
    });
  }
});
