import { elementsOfType } from "../document/elements.js";
import { edgeRefParts } from "../document/ids.js";
import type { Opening, Plan } from "../document/schema.js";
import { formatLength } from "../document/units.js";
import { openingPlacement } from "../geometry/openings.js";
import type { WallPiece } from "../geometry/walls.js";
import { called, problem } from "./make.js";
import type { Problem } from "./problem.js";

const KIND = { door: "Door", window: "Window", penetration: "Penetration" } as const;

/** The height of the wall hosting an opening, m, when it is known. */
export function hostHeightM(plan: Plan, opening: Opening, pieceId: string | undefined): number | undefined {
  const host = plan.elements[opening.wallRef];
  if (host?.type === "wall") {
    if (host.heightM !== undefined) return host.heightM;
    const level = plan.elements[host.levelId];
    return level?.type === "level" ? level.heightM : undefined;
  }
  if (pieceId) {
    const set = plan.wallSettings[pieceId];
    if (set?.heightM !== undefined) return set.heightM;
  }
  const parts = edgeRefParts(opening.wallRef);
  const room = parts ? plan.elements[parts.roomId] : undefined;
  const level = room?.type === "room" ? plan.elements[room.levelId] : undefined;
  return level?.type === "level" ? level.heightM : undefined;
}

/** Doors, windows and penetrations that do not fit on their wall. */
export function openingProblems(plan: Plan, pieces: readonly WallPiece[]): Problem[] {
  const out: Problem[] = [];
  const unit = plan.displayUnit;
  const tol = plan.defaults.wallToleranceM;
  const openings: Opening[] = [...elementsOfType(plan, "door"), ...elementsOfType(plan, "window"), ...elementsOfType(plan, "penetration")];
  for (const o of openings) {
    const name = called(o, KIND[o.type]);
    const place = openingPlacement(plan, pieces, o, tol);
    if (!place.ok) {
      if (place.reason === "no-wall") {
        out.push(problem("opening-on-missing-wall", o.id, `${name} is placed on a wall that is no longer in the plan.`, "Place it again on the wall it belongs to."));
      } else if (place.reason === "wider-than-wall") {
        out.push(problem("opening-wider-than-wall", o.id, `${name} is ${formatLength(o.widthM, unit)} wide but its wall is only ${formatLength(place.hostLengthM ?? 0, unit)} long.`, "Check the width you measured, or the length of the wall it is in."));
      } else {
        out.push(problem("opening-outside-wall", o.id, `${name} runs past the end of its wall (it starts ${formatLength(o.offsetM, unit)} along a wall ${formatLength(place.hostLengthM ?? 0, unit)} long, and is ${formatLength(o.widthM, unit)} wide).`, "Slide it back along the wall, or check where it starts."));
      }
      continue;
    }
    if (o.type === "penetration") {
      if (o.openAreaM2 <= 0) out.push(problem("penetration-no-area", o.id, `${name} has no open area, so it lets no sound through.`, "Enter its open area, or delete it if it has been sealed."));
      continue;
    }
    const wallH = hostHeightM(plan, o, place.hostId);
    const top = o.heightM + (o.type === "window" ? o.sillM : 0);
    if (wallH !== undefined && top > wallH + 1e-9) {
      out.push(problem("opening-taller-than-wall", o.id, `${name} reaches ${formatLength(top, unit)} above the floor but its wall is only ${formatLength(wallH, unit)} high.`, o.type === "window" ? "Check the window height and its sill height." : "Check the door height, or the ceiling height of the level."));
    }
  }
  return out;
}
