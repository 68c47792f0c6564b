import type { Plan } from "@hushmark/floorplan";
import { wallPieceById } from "@hushmark/editor-core";

const typeNames: Record<string, string> = {
  room: "Room", wall: "Wall", door: "Door", window: "Window", penetration: "Gap", vent: "Vent", duct: "Duct link",
  void: "Void", pin: "Pin", note: "Note", level: "Level", neighbour: "Next door",
};
export const typeName = (type: string) => typeNames[type] ?? type;

/** A short human title for an element: its name if it has one, else its kind and a number. */
export function elementTitle(plan: Plan, id: string): string {
  const el = plan.elements[id];
  if (!el) {
    const piece = wallPieceById(plan, id);
    if (!piece) return id;
    const names = piece.sides.map((s) => { const r = plan.elements[s.roomId]; return r?.type === "room" ? r.name : s.roomId; });
    return piece.kind === "shared" ? `Wall between ${names.join(" and ")}` : `Outer wall of ${names[0]}`;
  }
  if (el.type === "pin") return `Pin ${el.label}`;
  if (el.type === "note") return el.text ? `Note: ${el.text.slice(0, 30)}` : "Note";
  const name = "name" in el && el.name ? el.name : null;
  return name ?? `${typeName(el.type)} ${el.id.replace(/^[a-z]+-/, "")}`;
}
