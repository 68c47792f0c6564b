import type { Point } from "../document/schema.js";

/** The parts of an engine solve result the plan mapping reads (field names as the engine's). */
export interface SolveResultLike {
  readonly levelsDb: readonly number[];
  readonly links: ReadonlyArray<{ readonly id: string; readonly share: number; readonly shareByBand: readonly number[]; readonly gainIfPerfectDb?: number }>;
  readonly paths: ReadonlyArray<{ readonly rank: number; readonly kind: string; readonly spaces: readonly string[]; readonly links: readonly string[]; readonly share: number; readonly dba: number }>;
}

/** One plan element's part in what reaches the receiver. */
export interface ElementResult {
  /** Wall piece id, opening id, duct id, floor id `upper^lower`, or a flanking link id. */
  elementId: string;
  kind: "wall" | "door" | "window" | "penetration" | "floor" | "ceiling" | "vent" | "flanking";
  name: string;
  linkIds: string[];
  /** A-weighted share of the energy at the receiver (0…≈1). */
  share: number;
  shareByBand: number[];
  /** How many dB(A) the receiver would drop if this element let nothing through. */
  gainIfPerfectDb: number;
  /** True when the gain is the engine's exact figure; false when estimated from the element's share of its link. */
  gainExact: boolean;
}

/** A step of a path on the plan: a space, or the element a link crosses there. */
export type PathStep =
  | { kind: "space"; spaceId: string }
  | { kind: "element"; elementId: string; linkId: string; refs: string[] };

/** A point of a path's drawing line, on a level (null: off the drawn plan, e.g. outdoors). */
export interface PathPoint extends Point {
  levelId: string | null;
}

export interface PathOnPlan {
  rank: number;
  kind: string;
  share: number;
  dba: number;
  steps: PathStep[];
  polyline: PathPoint[];
}

export interface PlanResult {
  /** Every element with a share, largest first. */
  elements: ElementResult[];
  paths: PathOnPlan[];
}
