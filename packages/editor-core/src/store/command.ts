import type { Draft } from "immer";
import type { Plan } from "@hushmark/floorplan";

/** A named edit: an immer recipe over the plan with a label for the undo menu. */
export interface Command {
  /** Stable machine name, e.g. `room.add-rectangle`. */
  name: string;
  /** What the undo button says: "Undo add room". */
  label: string;
  recipe: (draft: Draft<Plan>) => void;
}

export function command(name: string, label: string, recipe: (draft: Draft<Plan>) => void): Command {
  return { name, label, recipe };
}
