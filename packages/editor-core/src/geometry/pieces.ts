import { planWallPieces, type Plan, type WallPiece } from "@hushmark/floorplan";

const cache = new WeakMap<object, { tolerance: number; pieces: WallPiece[]; byId: Map<string, WallPiece> }>();

/**
 * The plan's wall pieces, worked out once per elements record: deriving them walks every room
 * edge pair, too slow to repeat for each click, row or label on a large plan.
 */
export function wallPiecesOf(plan: Plan): WallPiece[] {
  return entry(plan).pieces;
}

export function wallPieceById(plan: Plan, id: string): WallPiece | undefined {
  return entry(plan).byId.get(id);
}

function entry(plan: Plan) {
  const hit = cache.get(plan.elements);
  if (hit && hit.tolerance === plan.defaults.wallToleranceM) return hit;
  const pieces = planWallPieces(plan);
  const e = { tolerance: plan.defaults.wallToleranceM, pieces, byId: new Map(pieces.map((p) => [p.id, p])) };
  cache.set(plan.elements, e);
  return e;
}
