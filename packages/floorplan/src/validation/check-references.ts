import type { Catalogue, ConstructionCategory } from "../catalogue/types.js";
import { elementsOfType } from "../document/elements.js";
import { OUTDOORS_ID } from "../document/ids.js";
import type { Faces, Plan } from "../document/schema.js";
import { roomsCoveredByVoid } from "../geometry/stacking.js";
import type { WallPiece } from "../geometry/walls.js";
import { called, problem } from "./make.js";
import type { Problem } from "./problem.js";

interface ConstructionUse {
  elementId: string;
  /** Worded only when there is something to report. */
  what: () => string;
  id: string;
  expected: ConstructionCategory[];
}

function constructionUses(plan: Plan): ConstructionUse[] {
  const d = plan.defaults;
  const uses: ConstructionUse[] = [
    { elementId: "", what: () => "The plan's default interior wall", id: d.interiorWallConstructionId, expected: ["wall"] },
    { elementId: "", what: () => "The plan's default exterior wall", id: d.exteriorWallConstructionId, expected: ["wall", "window"] },
    { elementId: "", what: () => "The plan's default floor", id: d.floorConstructionId, expected: ["floor"] },
    { elementId: "", what: () => "The plan's default ceiling", id: d.ceilingConstructionId, expected: ["ceiling", "floor"] },
  ];
  for (const w of elementsOfType(plan, "wall")) uses.push({ elementId: w.id, what: () => called(w, "Wall"), id: w.constructionId, expected: ["wall"] });
  for (const o of elementsOfType(plan, "door")) uses.push({ elementId: o.id, what: () => called(o, "Door"), id: o.constructionId, expected: ["door"] });
  for (const o of elementsOfType(plan, "window")) uses.push({ elementId: o.id, what: () => called(o, "Window"), id: o.constructionId, expected: ["window"] });
  for (const r of elementsOfType(plan, "room")) {
    if (r.floor) uses.push({ elementId: r.id, what: () => `The floor of ${called(r, "room").toLowerCase()}`, id: r.floor.constructionId, expected: ["floor"] });
    if (r.ceiling) uses.push({ elementId: r.id, what: () => `The ceiling of ${called(r, "room").toLowerCase()}`, id: r.ceiling.constructionId, expected: ["ceiling", "floor"] });
  }
  for (const [wallId, s] of Object.entries(plan.wallSettings).sort(([a], [b]) => (a < b ? -1 : 1))) {
    if (s.constructionId) uses.push({ elementId: wallId, what: () => `Wall ${wallId}`, id: s.constructionId, expected: ["wall", "window"] });
  }
  return uses;
}

/** Constructions, coverings and silencers missing from the catalogue, or used where they do not belong. */
export function catalogueProblems(plan: Plan, catalogue: Catalogue): Problem[] {
  const out: Problem[] = [];
  for (const u of constructionUses(plan)) {
    const c = catalogue.constructions[u.id];
    if (!c) {
      out.push(problem("unknown-construction", u.elementId, `${u.what()} is set to construction “${u.id}”, which is not in the construction catalogue.`, "Pick a construction from the catalogue, or add this one to the firm's catalogue first."));
    } else if (!u.expected.includes(c.category)) {
      out.push(problem("construction-wrong-kind", u.elementId, `${u.what()} uses “${c.name}”, which is catalogued as a ${c.category}, not a ${u.expected.join(" or ")}.`, "Check that the right construction was picked."));
    }
  }
  for (const r of elementsOfType(plan, "room")) {
    for (const layer of [r.floor, r.ceiling]) {
      if (layer?.coveringId && !catalogue.coverings[layer.coveringId]) {
        out.push(problem("unknown-construction", r.id, `${called(r, "Room")} has floor covering “${layer.coveringId}”, which is not in the catalogue.`, "Pick a covering from the catalogue."));
      }
    }
  }
  for (const d of elementsOfType(plan, "duct")) {
    if (d.silencerId && !catalogue.silencers[d.silencerId]) {
      out.push(problem("unknown-construction", d.id, `${called(d, "Duct")} has silencer “${d.silencerId}”, which is not in the catalogue.`, "Pick a silencer from the catalogue, or remove it."));
    }
  }
  return out;
}

function isSpace(plan: Plan, id: string): boolean {
  if (id === OUTDOORS_ID) return true;
  const el = plan.elements[id];
  return el?.type === "room" || el?.type === "void" || el?.type === "neighbour";
}

/** Vents, ducts, neighbours, finishes, voids and wall settings that point at nothing or rest on assumptions. */
export function connectionProblems(plan: Plan, pieces: readonly WallPiece[]): Problem[] {
  const out: Problem[] = [];
  const ducts = elementsOfType(plan, "duct");
  const joined = new Set<string>();
  for (const d of ducts) {
    for (const end of [d.fromVentId, d.toVentId]) {
      if (plan.elements[end]?.type === "vent") joined.add(end);
      else out.push(problem("duct-missing-vent", d.id, `${called(d, "Duct")} ends at grille “${end}”, which is not in the plan.`, "Join the duct to a grille at each end."));
    }
    if (d.fromVentId === d.toVentId) out.push(problem("duct-missing-vent", d.id, `${called(d, "Duct")} starts and ends at the same grille.`, "Join its other end to the grille it leads to."));
  }
  for (const v of elementsOfType(plan, "vent")) {
    if (!isSpace(plan, v.spaceId)) out.push(problem("vent-in-unknown-space", v.id, `${called(v, "Grille")} opens into “${v.spaceId}”, which is not a room, void or neighbour of this plan.`, "Place the grille in a room or void."));
    if (!joined.has(v.id)) out.push(problem("vent-unconnected", v.id, `${called(v, "Grille")} is not joined to any duct, so the path it opens cannot be traced.`, "Draw the duct from this grille to the grille it serves, or delete the grille."));
  }
  for (const n of elementsOfType(plan, "neighbour")) {
    if (n.volumeM3 === undefined || n.absorptionM2 === undefined) {
      out.push(problem("neighbour-unsurveyed", n.id, `${called(n, "Neighbouring space")} was not surveyed; it is assumed to be ${n.volumeM3 ?? 50} m³ with ${n.absorptionM2 ?? 10} m² of absorption, like a furnished room.`, "Survey the space, or enter its size if the neighbour can tell you."));
    }
  }
  for (const r of elementsOfType(plan, "room")) {
    if (!r.finish) out.push(problem("finish-assumed", r.id, `${called(r, "Room")} has no finish recorded; a furnished room (reverberation time about 0.5 s) is assumed.`, "Choose the finish that matches the room, or enter a measured reverberation time."));
  }
  const rooms = elementsOfType(plan, "room");
  for (const v of elementsOfType(plan, "void")) {
    if (v.outline.length >= 3 && roomsCoveredByVoid(plan, v, rooms).length === 0) {
      out.push(problem("void-covers-nothing", v.id, `${called(v, "Void")} does not lie over or under any room of its level, so it links nothing.`, "Check its outline and level."));
    }
  }
  const pieceIds = new Set(pieces.map((p) => p.id));
  const checkFaces = (faces: Faces | undefined, elementId: string) => {
    if (faces?.kind === "neighbour" && plan.elements[faces.neighbourId]?.type !== "neighbour") {
      out.push(problem("unknown-neighbour", elementId, `A wall faces neighbour “${faces.neighbourId}”, which is not in the plan.`, "Add the neighbouring space, or make the wall face outdoors."));
    }
  };
  checkFaces(plan.defaults.exteriorFaces, "");
  for (const [wallId, s] of Object.entries(plan.wallSettings).sort(([a], [b]) => (a < b ? -1 : 1))) {
    if (!pieceIds.has(wallId)) out.push(problem("wall-setting-orphaned", wallId, `Settings are kept for wall ${wallId}, but that wall is no longer in the plan (an outline was redrawn); they are ignored.`, "Set the construction again on the wall as it is now drawn."));
    checkFaces(s.faces, wallId);
  }
  return out;
}
