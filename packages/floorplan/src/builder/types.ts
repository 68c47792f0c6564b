import type { Network } from "@hushmark/acoustics";
import type { Point } from "../document/schema.js";
import type { Problem } from "../validation/problem.js";

/** What one network link stands for on the plan: its elements and a line to draw it along. */
export interface LinkTrace {
  linkId: string;
  kind: "wall" | "exterior-wall" | "floor" | "ceiling" | "vent" | "flanking";
  /** Plan element ids (wall piece, openings, duct, grilles, rooms) the link came from. */
  refs: string[];
  levelId: string;
  /** Plan coordinates, m, for drawing the link (a wall's length, a duct's run, a floor's centre). */
  polyline: Point[];
  /** The two spaces' plan ids. */
  spaces: [string, string];
  /** Where each element of the link sits (wall piece midpoint, opening centre), m. */
  points?: Record<string, Point>;
}

/** Where a network space sits on the plan. */
export interface SpaceTrace {
  spaceId: string;
  levelId: string | null;
  centre: Point | null;
}

// The builder writes the engine's parsed shape (every defaulted field set), so its network goes to
// the solver without a schema pass; tests check that parsing it changes nothing.
export type NetworkSourceInput = Network["sources"][number];
export type LinkInput = Network["links"][number];
export type SpaceInput = Network["spaces"][number];

export interface BuildOptions {
  /** Add simplified ISO 12354-1 flanking paths at wall junctions (default true). */
  flanking?: boolean;
  /** Leave out flanking paths weaker than the wall they flank by more than this in every band, dB (default 20; Infinity keeps all). */
  flankingPruneDb?: number;
  /** Fixed sources to put in the network (airborne spectra or impact on a room's floor). */
  sources?: Array<{ type: "airborne"; spaceId: string; levelsDb: number[] } | { type: "impact"; roomId: string; lnOffsetDb?: number }>;
}

export type BuildResult =
  | { ok: true; network: Network; links: Record<string, LinkTrace>; spaces: Record<string, SpaceTrace>; assumptions: Problem[] }
  | { ok: false; problems: Problem[] };
