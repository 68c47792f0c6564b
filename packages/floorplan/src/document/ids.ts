import { z } from "zod";

/** Reserved space id for the free field outside the building (no unit). */
export const OUTDOORS_ID = "outdoors";

/**
 * Element ids: letters, digits, `-`, `_` and `.` only, so that derived ids can join them with
 * `:` (room edge), `|` (wall piece) and `^` (floor) without ambiguity.
 */
export const elementIdSchema = z
  .string()
  .regex(/^[A-Za-z0-9_.-]+$/, "ids use letters, digits, '-', '_' and '.' only")
  .refine((id) => id !== OUTDOORS_ID, `"${OUTDOORS_ID}" is reserved for the outside`);

/** The stable id of one room edge: the room id and the id of the vertex the edge starts at (no unit). */
export function edgeRef(roomId: string, vertexId: string): string {
  return `${roomId}:${vertexId}`;
}

/** Splits an edge ref into its room id and start-vertex id, or null when it is not an edge ref (no unit). */
export function edgeRefParts(ref: string): { roomId: string; vertexId: string } | null {
  const i = ref.indexOf(":");
  if (i <= 0 || i === ref.length - 1 || ref.includes("|")) return null;
  return { roomId: ref.slice(0, i), vertexId: ref.slice(i + 1) };
}
