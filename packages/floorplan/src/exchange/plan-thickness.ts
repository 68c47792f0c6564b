import type { Plan } from "../document/schema.js";
import { elementsOfType } from "../document/elements.js";
import { collinearOverlap } from "../geometry/segments.js";
import type { WallPiece } from "../geometry/walls.js";

/**
 * A wall piece's thickness, height and construction id as the builder resolves them (its
 * setting, a free-standing wall along at least half of it, then the plan defaults), m.
 */
export function pieceResolved(plan: Plan, piece: WallPiece): { thicknessM: number; heightM: number; constructionId: string } {
  const set = plan.wallSettings[piece.id] ?? {};
  const tol = plan.defaults.wallToleranceM;
  const free = elementsOfType(plan, "wall").find((w) => {
    if (w.levelId !== piece.levelId) return false;
    const ov = collinearOverlap(piece.start, piece.end, w.start, w.end, tol);
    return ov !== null && ov.lengthM >= piece.lengthM / 2;
  });
  const level = plan.elements[piece.levelId];
  const d = plan.defaults;
  return {
    thicknessM: set.thicknessM ?? free?.thicknessM ?? d.wallThicknessM,
    heightM: set.heightM ?? free?.heightM ?? (level?.type === "level" ? level.heightM ?? 0 : 0),
    constructionId: set.constructionId ?? free?.constructionId ?? (piece.kind === "shared" ? d.interiorWallConstructionId : d.exteriorWallConstructionId),
  };
}
