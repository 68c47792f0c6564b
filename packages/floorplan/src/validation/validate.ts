import type { Catalogue } from "../catalogue/types.js";
import type { Plan } from "../document/schema.js";
import { planWallPieces, type WallPiece } from "../geometry/walls.js";
import { geometryProblems } from "./check-geometry.js";
import { openingProblems } from "./check-openings.js";
import { catalogueProblems, connectionProblems } from "./check-references.js";
import type { Problem } from "./problem.js";

/** Every problem and assumption in a plan, errors first, then by element id (no unit). */
export function validatePlan(plan: Plan, catalogue: Catalogue, pieces: readonly WallPiece[] = planWallPieces(plan)): Problem[] {
  const all = [
    ...geometryProblems(plan),
    ...openingProblems(plan, pieces),
    ...catalogueProblems(plan, catalogue),
    ...connectionProblems(plan, pieces),
  ];
  return all.sort((a, b) =>
    a.severity !== b.severity ? (a.severity === "error" ? -1 : 1) : a.elementId < b.elementId ? -1 : a.elementId > b.elementId ? 1 : a.code < b.code ? -1 : a.code > b.code ? 1 : 0,
  );
}

/** Whether the plan can be analysed: no errors, warnings allowed (no unit). */
export function planIsAnalysable(problems: readonly Problem[]): boolean {
  return problems.every((p) => p.severity !== "error");
}
