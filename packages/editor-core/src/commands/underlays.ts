import type { Underlay } from "@hushmark/floorplan";
import { command, type Command } from "../store/command.js";
import type { UnderlayPlacement } from "../underlays/placement.js";
import { normalDeg } from "../underlays/placement.js";

/** What a new underlay needs; the rest takes the document defaults. */
export type NewUnderlay = Pick<Underlay, "id" | "fileId" | "levelId" | "widthPx" | "heightPx" | "origin" | "scaleMPerPx"> & Partial<Pick<Underlay, "name" | "rotationDeg" | "opacity">>;

// A tenth of a millimetre and nine significant figures: below anything traced, and the same text every save.
const roundOrigin = (v: number) => Math.round(v * 10_000) / 10_000;
const roundScale = (v: number) => Number(v.toPrecision(9));

/** Places an uploaded drawing on a level, above any already there. */
export function addUnderlay(u: NewUnderlay): Command {
  return command("underlay.add", "add underlay", (draft) => {
    const list = (draft.underlays ??= []);
    if (list.some((x) => x.id === u.id)) return;
    list.push({
      id: u.id, fileId: u.fileId, levelId: u.levelId, name: u.name ?? "", widthPx: u.widthPx, heightPx: u.heightPx,
      origin: { x: roundOrigin(u.origin.x), y: roundOrigin(u.origin.y) }, scaleMPerPx: roundScale(u.scaleMPerPx),
      rotationDeg: normalDeg(u.rotationDeg ?? 0), opacity: u.opacity ?? 0.5, locked: false, visible: true, calibrated: false,
    });
  });
}

/**
 * Moves, scales or turns an underlay (`label` names the step for undo: "calibrate underlay").
 * A locked underlay stays where it is.
 */
export function setUnderlayPlacement(id: string, placement: Partial<UnderlayPlacement>, label = "move underlay", options: { calibrated?: boolean } = {}): Command {
  return command("underlay.place", label, (draft) => {
    const u = draft.underlays?.find((x) => x.id === id);
    if (!u || u.locked) return;
    if (placement.origin) u.origin = { x: roundOrigin(placement.origin.x), y: roundOrigin(placement.origin.y) };
    if (placement.scaleMPerPx !== undefined && placement.scaleMPerPx > 0 && Number.isFinite(placement.scaleMPerPx)) u.scaleMPerPx = roundScale(placement.scaleMPerPx);
    if (placement.rotationDeg !== undefined && Number.isFinite(placement.rotationDeg)) u.rotationDeg = normalDeg(placement.rotationDeg);
    if (options.calibrated) u.calibrated = true;
  });
}

/** Opacity, shown or hidden, locked or not, and the name: what does not move the drawing. */
export function setUnderlayLook(id: string, look: Partial<Pick<Underlay, "opacity" | "visible" | "locked" | "name">>): Command {
  const label = look.locked !== undefined ? (look.locked ? "lock underlay" : "unlock underlay") : look.visible !== undefined ? (look.visible ? "show underlay" : "hide underlay") : "change underlay";
  return command("underlay.look", label, (draft) => {
    const u = draft.underlays?.find((x) => x.id === id);
    if (!u) return;
    if (look.opacity !== undefined && Number.isFinite(look.opacity)) u.opacity = Math.round(Math.min(1, Math.max(0, look.opacity)) * 100) / 100;
    if (look.visible !== undefined) u.visible = look.visible;
    if (look.locked !== undefined) u.locked = look.locked;
    if (look.name !== undefined) u.name = look.name.slice(0, 200);
  });
}

/** Takes an underlay off the plan (the uploaded file stays with the project until deleted there). */
export function removeUnderlay(id: string): Command {
  return command("underlay.remove", "remove underlay", (draft) => {
    if (!draft.underlays) return;
    const i = draft.underlays.findIndex((x) => x.id === id);
    if (i < 0) return;
    draft.underlays.splice(i, 1);
    // An empty list is left out, so a plan that never had one and a plan that lost its last are the same text.
    if (draft.underlays.length === 0) delete draft.underlays;
  });
}
