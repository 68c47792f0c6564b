import type { Catalogue, Construction } from "../catalogue/types.js";
import { elementsOfType, levelsByElevation } from "../document/elements.js";
import { OUTDOORS_ID } from "../document/ids.js";
import type { FreeWall, Level, Plan, Room } from "../document/schema.js";
import { collinearOverlap } from "../geometry/segments.js";
import type { WallPiece } from "../geometry/walls.js";

/** Look-ups the builder steps share, computed once per build. */
export interface BuildContext {
  plan: Plan;
  catalogue: Catalogue;
  pieces: WallPiece[];
  levels: Level[];
  rooms: Map<string, Room>;
  freeWalls: FreeWall[];
  /** Resolved settings per wall piece id: the walls and the flanking paths ask for the same pieces many times. */
  settings: Map<string, PieceSettings>;
}

/** A wall piece's construction, thickness and height (m). */
export interface PieceSettings {
  construction: Construction;
  thicknessM: number;
  heightM: number;
}

/** The shared look-ups of one build: levels by elevation, rooms by id, free walls (no unit). */
export function buildContext(plan: Plan, catalogue: Catalogue, pieces: WallPiece[]): BuildContext {
  return {
    plan,
    catalogue,
    pieces,
    levels: levelsByElevation(plan),
    rooms: new Map(elementsOfType(plan, "room").map((r) => [r.id, r])),
    freeWalls: [...elementsOfType(plan, "wall")],
    settings: new Map(),
  };
}

/** A catalogue construction that validation has already checked exists. */
export function constructionOf(ctx: BuildContext, id: string): Construction {
  const c = ctx.catalogue.constructions[id];
  if (!c) throw new Error(`construction ${id} is not in the catalogue (validate the plan before building)`);
  return c;
}

/** Floor-to-ceiling height of a level, m (validated to exist). */
export function levelHeightM(ctx: BuildContext, levelId: string): number {
  const level = ctx.plan.elements[levelId];
  return level?.type === "level" && level.heightM !== undefined ? level.heightM : 0;
}

/** The free-standing wall lying along at least half of a wall piece, if one was drawn there. */
export function freeWallAlong(ctx: BuildContext, piece: WallPiece): FreeWall | undefined {
  const tol = ctx.plan.defaults.wallToleranceM;
  return ctx.freeWalls.find((w) => {
    if (w.levelId !== piece.levelId) return false;
    const ov = collinearOverlap(piece.start, piece.end, w.start, w.end, tol);
    return ov !== null && ov.lengthM >= piece.lengthM / 2;
  });
}

/** Resolved settings of one wall piece: construction, thickness and height (m). */
export function pieceSettings(ctx: BuildContext, piece: WallPiece): PieceSettings {
  let hit = ctx.settings.get(piece.id);
  if (!hit) {
    hit = resolvePieceSettings(ctx, piece);
    ctx.settings.set(piece.id, hit);
  }
  return hit;
}

function resolvePieceSettings(ctx: BuildContext, piece: WallPiece): PieceSettings {
  const set = ctx.plan.wallSettings[piece.id] ?? {};
  const free = freeWallAlong(ctx, piece);
  const d = ctx.plan.defaults;
  const constructionId = set.constructionId ?? free?.constructionId ?? (piece.kind === "shared" ? d.interiorWallConstructionId : d.exteriorWallConstructionId);
  return {
    construction: constructionOf(ctx, constructionId),
    thicknessM: set.thicknessM ?? free?.thicknessM ?? d.wallThicknessM,
    heightM: set.heightM ?? free?.heightM ?? levelHeightM(ctx, piece.levelId),
  };
}

/** A space's display name: the room, void or neighbour name, or "outdoors" (no unit). */
export function spaceName(ctx: BuildContext, id: string): string {
  if (id === OUTDOORS_ID) return "outdoors";
  const el = ctx.plan.elements[id];
  return el && "name" in el && typeof el.name === "string" && el.name ? el.name : id;
}
